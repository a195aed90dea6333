import { z } from 'zod';

/** The shapes of measurement profiles as the API sends them (lengths in millimetres). */
export const girthAtHeightSchema = z.object({ offset: z.number(), girth: z.number() });

export const measurementSetSchema = z.object({
  id: z.string(),
  takenOn: z.string(),
  measurements: z.record(z.string(), z.number()),
  girthsAtHeights: z.array(girthAtHeightSchema),
  note: z.string().nullable(),
  createdAt: z.string(),
});
export type MeasurementSet = z.infer<typeof measurementSetSchema>;

/** A profile: its name and its current (newest) dated set. */
export const profileSchema = z.object({
  id: z.string(),
  name: z.string(),
  measurements: z.record(z.string(), z.number()),
  girthsAtHeights: z.array(girthAtHeightSchema),
  takenOn: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Profile = z.infer<typeof profileSchema>;

/** One profile with every dated set, newest first (history[0] is the current set). */
export const profileDetailSchema = profileSchema.extend({ history: z.array(measurementSetSchema) });
export type ProfileDetail = z.infer<typeof profileDetailSchema>;

export const profileResponseSchema = z.object({ profile: profileSchema });
export const profileDetailResponseSchema = z.object({ profile: profileDetailSchema });
export const profilesResponseSchema = z.object({ profiles: z.array(profileSchema) });
