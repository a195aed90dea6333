export const outboxKeys = {
  all: ['admin-outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
};
