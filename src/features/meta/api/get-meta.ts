import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { roleSchema } from '../../../types/api';
import { metaKeys } from '../query-keys';

const demoAccountSchema = z.object({
  email: z.string(),
  password: z.string(),
  displayName: z.string(),
  role: roleSchema,
  about: z.string(),
});
export type DemoAccount = z.infer<typeof demoAccountSchema>;

const metaSchema = z.object({
  environment: z.enum(['development', 'production', 'test']),
  /** Present only when the server runs in development. */
  demoAccounts: z.array(demoAccountSchema).nullable(),
});
export type Meta = z.infer<typeof metaSchema>;

export const getMeta = (): Promise<Meta> => apiClient.get('/meta', metaSchema);

export const metaQueryOptions = () =>
  queryOptions({ queryKey: metaKeys.detail(), queryFn: getMeta, staleTime: Infinity });

export const useMeta = () => useQuery(metaQueryOptions());
