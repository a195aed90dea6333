export const metaKeys = {
  all: ['meta'] as const,
  detail: () => [...metaKeys.all, 'detail'] as const,
};
