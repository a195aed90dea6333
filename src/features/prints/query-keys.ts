export const printKeys = {
  all: ['prints'] as const,
  list: () => [...printKeys.all, 'list'] as const,
  details: () => [...printKeys.all, 'detail'] as const,
  detail: (id: string) => [...printKeys.details(), id] as const,
};
