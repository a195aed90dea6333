import { z } from 'zod';
import { fabricSchema } from '../../../geometry/index.ts';

export const fabricNameSchema = z
  .string({ error: 'Enter a name for the fabric.' })
  .trim()
  .min(1, 'Enter a name for the fabric.')
  .max(120, 'Keep the name to 120 characters.');

/** The properties as geometry/fit reads them: stretch, recovery, weight, width, shrinkage. */
export const fabricPropertiesSchema = fabricSchema;

export const createFabricSchema = z.object({ name: fabricNameSchema, properties: z.unknown().default({}) }).strict();
export const updateFabricSchema = z
  .object({ name: fabricNameSchema.optional(), properties: z.unknown().optional() })
  .strict()
  .refine((v) => v.name !== undefined || v.properties !== undefined, { message: 'Send a name or properties.' });
