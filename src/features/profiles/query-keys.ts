/**
 * Keys of the profiles feature: `all → list → detail(id)`. They sit under the same root as the
 * makes feature's short profile list (`['profiles', 'list']`), so invalidating `all` after a
 * change refreshes both; the fit planner's own entries are kept apart because they carry the
 * dated sets and girths at heights the makes list does not read.
 */
export const profileKeys = {
  all: ['profiles'] as const,
  planner: () => [...profileKeys.all, 'fit-planner'] as const,
  list: () => [...profileKeys.planner(), 'list'] as const,
  detail: (id: string) => [...profileKeys.planner(), 'detail', id] as const,
};
