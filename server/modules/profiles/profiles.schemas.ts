import { z } from 'zod';
import { BODY_MEASUREMENT_NAMES, type BodyMeasurementName, girthsAtHeightsSchema } from '../../../geometry/index.ts';

/**
 * Body measurements a profile keeps, in millimetres. Names follow ISO 8559-1 (body dimensions
 * for clothing); girths at heights above and below the waist are kept beside them, and every
 * change is a new dated set.
 */
export const MEASUREMENT_NAMES = BODY_MEASUREMENT_NAMES;
export type MeasurementName = BodyMeasurementName;

const measurement = z.number({ error: 'must be a number of millimetres' }).positive('must be more than 0 mm').max(3000, 'must be 3 m or less');

const measurementRecord = z.partialRecord(z.enum(MEASUREMENT_NAMES), measurement);
export const measurementsSchema = measurementRecord.default({});

/** Today as `YYYY-MM-DD` (UTC). */
export const today = (): string => new Date().toISOString().slice(0, 10);

/** A day on or before tomorrow (UTC), so a sewist ahead of UTC can date today's measurements. */
export const takenOnSchema = z.iso
  .date({ error: 'Give the date as YYYY-MM-DD.' })
  .refine((d) => d >= '1900-01-01', 'The date is too early.')
  .refine((d) => d <= new Date(Date.now() + 86_400_000).toISOString().slice(0, 10), 'The measurements cannot be taken in the future.');

const noteSchema = z.string({ error: 'The note must be text.' }).trim().max(500, 'Keep the note to 500 characters.');

export const profileNameSchema = z
  .string({ error: 'Enter a name for the profile.' })
  .trim()
  .min(1, 'Enter a name for the profile.')
  .max(80, 'Keep the name to 80 characters.');

export const createProfileSchema = z
  .object({
    name: profileNameSchema,
    measurements: measurementsSchema,
    girthsAtHeights: girthsAtHeightsSchema.default([]),
    takenOn: takenOnSchema.optional(),
    note: noteSchema.default(''),
  })
  .strict();

export const updateProfileSchema = z
  .object({
    name: profileNameSchema.optional(),
    // no default here: leaving measurements out must mean "unchanged", not "none"
    measurements: measurementRecord.optional(),
    girthsAtHeights: girthsAtHeightsSchema.optional(),
    takenOn: takenOnSchema.optional(),
    note: noteSchema.optional(),
  })
  .strict()
  .refine((v) => v.name !== undefined || v.measurements !== undefined || v.girthsAtHeights !== undefined, { message: 'Send a name or measurements.' })
  .refine((v) => (v.takenOn === undefined && v.note === undefined) || v.measurements !== undefined || v.girthsAtHeights !== undefined, {
    message: 'A date or note belongs to a set of measurements: send the measurements with it.',
    path: ['takenOn'],
  });

export type CreateProfileInput = z.input<typeof createProfileSchema>;
export type UpdateProfileInput = z.output<typeof updateProfileSchema>;
