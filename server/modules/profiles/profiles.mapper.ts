import type { ProfileEntity } from './profile.entity.ts';

export interface ProfileDto {
  id: string;
  name: string;
  measurements: Record<string, number>;
  createdAt: string;
  updatedAt: string;
}

export const toProfileDto = (p: ProfileEntity): ProfileDto => ({
  id: p.id,
  name: p.name,
  measurements: p.measurements,
  createdAt: p.createdAt.toISOString(),
  updatedAt: p.updatedAt.toISOString(),
});
