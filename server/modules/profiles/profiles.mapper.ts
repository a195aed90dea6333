import type { GirthAtHeight } from '../../../geometry/index.ts';
import type { ProfileMeasurementSetEntity } from './profile-measurement-set.entity.ts';
import type { ProfileEntity } from './profile.entity.ts';

export interface MeasurementSetDto {
  id: string;
  takenOn: string;
  measurements: Record<string, number>;
  girthsAtHeights: GirthAtHeight[];
  note: string;
  createdAt: string;
}

export interface ProfileDto {
  id: string;
  name: string;
  /** The current set: the newest by date. */
  measurements: Record<string, number>;
  girthsAtHeights: GirthAtHeight[];
  takenOn: string;
  createdAt: string;
  updatedAt: string;
  /** Every dated set, newest first (one profile only, not in lists). */
  history?: MeasurementSetDto[];
}

export const toMeasurementSetDto = (s: ProfileMeasurementSetEntity): MeasurementSetDto => ({
  id: s.id,
  takenOn: s.takenOn,
  measurements: s.measurements,
  girthsAtHeights: s.girthsAtHeights,
  note: s.note,
  createdAt: s.createdAt.toISOString(),
});

/** A profile, with `history` when the service loaded it. */
export const toProfileDto = (p: ProfileEntity & { history?: ProfileMeasurementSetEntity[] }): ProfileDto => ({
  id: p.id,
  name: p.name,
  measurements: p.measurements,
  girthsAtHeights: p.girthsAtHeights,
  takenOn: p.takenOn,
  createdAt: p.createdAt.toISOString(),
  updatedAt: p.updatedAt.toISOString(),
  ...(p.history ? { history: p.history.map(toMeasurementSetDto) } : {}),
});
