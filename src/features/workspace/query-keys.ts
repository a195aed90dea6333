/** Query keys of the make workspace. */
export const workspaceKeys = {
  all: ['workspace'] as const,
  make: (id: string) => [...workspaceKeys.all, 'make', id] as const,
  revisions: (id: string) => [...workspaceKeys.all, 'make', id, 'revisions'] as const,
  revision: (id: string, number: number) => [...workspaceKeys.all, 'make', id, 'revisions', number] as const,
  pattern: (id: string) => [...workspaceKeys.all, 'pattern', id] as const,
};
