import { z } from 'zod';
import type { FabricProperties } from '../model';

/** The shapes of fabrics as the API sends them (lengths in millimetres, stretch and shrinkage in percent). */
const mm = z.number();
const stretchSchema = z.union([z.number(), z.object({ relaxed: mm, stretched: mm })]);
const shrinkageSchema = z.union([z.number(), z.object({ before: mm, after: mm })]);

/** The properties as geometry/fit/body.ts fabricSchema keeps them; unknown keys are ignored here. */
export const fabricPropertiesSchema = z.object({
  stretchAcross: stretchSchema.optional(),
  stretchAlong: stretchSchema.optional(),
  recovery: z.number().optional(),
  weightGsm: z.number().optional(),
  weightOzPerSqYd: z.number().optional(),
  width: mm.optional(),
  shrinkage: z.object({ warp: shrinkageSchema.optional(), weft: shrinkageSchema.optional() }).optional(),
  prewashed: z.boolean().optional(),
}) satisfies z.ZodType<FabricProperties>;

export const fabricSchema = z.object({
  id: z.string(),
  name: z.string(),
  properties: fabricPropertiesSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Fabric = z.infer<typeof fabricSchema>;

export const fabricResponseSchema = z.object({ fabric: fabricSchema });
export const fabricsResponseSchema = z.object({ fabrics: z.array(fabricSchema) });
