/** Keys of the fabrics feature: `all → list → detail(id)`. */
export const fabricKeys = {
  all: ['fabrics'] as const,
  list: () => [...fabricKeys.all, 'list'] as const,
  detail: (id: string) => [...fabricKeys.all, 'detail', id] as const,
};
