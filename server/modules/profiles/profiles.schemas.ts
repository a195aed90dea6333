import { z } from 'zod';
import { BODY_MEASUREMENT_NAMES, type BodyMeasurementName } from '../../../geometry/index.ts';

/**
 * Body measurements a profile keeps, in millimetres. Names follow ISO 8559-1 (body dimensions
 * for clothing); the fit planner will add dated history and girths at chosen heights.
 */
export const MEASUREMENT_NAMES = BODY_MEASUREMENT_NAMES;
export type MeasurementName = BodyMeasurementName;

const measurement = z.number({ error: 'must be a number of millimetres' }).positive('must be more than 0 mm').max(3000, 'must be 3 m or less');

export const measurementsSchema = z.partialRecord(z.enum(MEASUREMENT_NAMES), measurement).default({});

export const profileNameSchema = z
  .string({ error: 'Enter a name for the profile.' })
  .trim()
  .min(1, 'Enter a name for the profile.')
  .max(80, 'Keep the name to 80 characters.');

export const createProfileSchema = z.object({ name: profileNameSchema, measurements: measurementsSchema }).strict();
export const updateProfileSchema = z
  .object({ name: profileNameSchema.optional(), measurements: measurementsSchema.optional() })
  .strict()
  .refine((v) => v.name !== undefined || v.measurements !== undefined, { message: 'Send a name or measurements.' });
