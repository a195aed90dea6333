/**
 * Keys of the makes feature: makes (`all → list(params) → detail(id)`, revisions under a make),
 * and the two lists the new-make form chooses from (measurement profiles, patterns).
 */
export type MakesListParams = { archived: boolean };

export const makeKeys = {
  all: ['makes'] as const,
  lists: () => [...makeKeys.all, 'list'] as const,
  list: (params: MakesListParams) => [...makeKeys.lists(), params] as const,
  details: () => [...makeKeys.all, 'detail'] as const,
  detail: (id: string) => [...makeKeys.details(), id] as const,
  revisions: (id: string) => [...makeKeys.detail(id), 'revisions'] as const,
  revision: (id: string, number: number) => [...makeKeys.revisions(id), number] as const,
};

export const profileKeys = {
  all: ['profiles'] as const,
  list: () => [...profileKeys.all, 'list'] as const,
};

export type PatternScope = 'mine' | 'library';

/** The patterns a make can start from, as the makes feature reads them (summaries only). */
export const patternChoiceKeys = {
  all: ['pattern-choices'] as const,
  list: (scope: PatternScope) => [...patternChoiceKeys.all, scope] as const,
};
