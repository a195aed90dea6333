import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';

/** The person's kept fabrics, as the plan panel offers them (name and the properties it mentions). */
const fabricChoiceSchema = z.object({
  id: z.string(),
  name: z.string(),
  properties: z.object({ stretchAcross: z.union([z.number(), z.object({ relaxed: z.number(), stretched: z.number() })]).optional() }).passthrough(),
});
export type FabricChoice = z.infer<typeof fabricChoiceSchema>;

export const fabricChoicesQueryOptions = () =>
  queryOptions({ queryKey: [...workspaceKeys.all, 'fabrics'] as const, queryFn: () => apiClient.get('/fabrics', z.object({ fabrics: z.array(fabricChoiceSchema) })).then((r) => r.fabrics) });

export const useFabricChoices = () => useQuery(fabricChoicesQueryOptions());
