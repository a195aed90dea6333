import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient, isApiError } from '../../../lib/api-client';
import { outboxKeys } from '../query-keys';

const messageSchema = z.object({
  id: z.string(),
  to: z.array(z.string()),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  receivedAt: z.string(),
});
export type OutboxMessage = z.infer<typeof messageSchema>;

const outboxResponseSchema = z.object({ messages: z.array(messageSchema) });

/**
 * The messages the built-in fake mail server kept, newest first.
 * `null` when the server sends real e-mail and so keeps no outbox (it answers 404).
 */
export async function getOutbox(): Promise<OutboxMessage[] | null> {
  try {
    const { messages } = await apiClient.get('/admin/outbox', outboxResponseSchema);
    return [...messages].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
  } catch (error) {
    if (isApiError(error) && error.status === 404) return null;
    throw error;
  }
}

// Mail arrives while the admin watches: the loader's fetch serves the first render, and any
// later visit fetches again.
export const outboxQueryOptions = () =>
  queryOptions({ queryKey: outboxKeys.list(), queryFn: getOutbox, staleTime: 5_000 });

export const useOutbox = () => useQuery(outboxQueryOptions());
