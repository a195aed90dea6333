import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { profileKeys } from '../query-keys';

export { MEASUREMENT_NAMES, type MeasurementName } from '../../../types/measurement-names';
import type { MeasurementName } from '../../../types/measurement-names';
export type Measurements = Partial<Record<MeasurementName, number>>;

export const profileSchema = z.object({
  id: z.string(),
  name: z.string(),
  measurements: z.record(z.string(), z.number()),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Profile = z.infer<typeof profileSchema>;

const profilesResponseSchema = z.object({ profiles: z.array(profileSchema) });

export async function getProfiles(): Promise<Profile[]> {
  const { profiles } = await apiClient.get('/profiles', profilesResponseSchema);
  return profiles;
}

export const profilesQueryOptions = () =>
  queryOptions({ queryKey: profileKeys.list(), queryFn: getProfiles });

export const useProfiles = () => useQuery(profilesQueryOptions());
