export const printKeys = {
  all: ['prints'] as const,
  lists: () => [...printKeys.all, 'list'] as const,
  list: (params: { makeId?: string } = {}) => [...printKeys.lists(), params] as const,
  details: () => [...printKeys.all, 'detail'] as const,
  detail: (id: string) => [...printKeys.details(), id] as const,
};
