import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import type { AlterationOp } from '../../../../geometry/index.ts';
import { apiClient } from '../../../lib/api-client';
import { fitNoteSchema } from './fit-note';

const measuresSchema = z.record(z.string(), z.number());
const garmentSideSchema = z.object({ label: z.string(), measures: measuresSchema }).nullable();

const planSchema = z.object({
  levels: z.array(
    z
      .object({ level: z.string(), body: z.number(), comfort: z.number().optional(), target: z.number(), ease: z.number().optional(), size: z.string(), bodyChartSize: z.string().optional(), garmentAtSize: z.number(), change: z.number().optional(), reason: z.string(), confidence: z.string(), fromNote: z.number().optional() })
      .passthrough(),
  ),
  // The engine checks each operation when the list is replayed and saved.
  steps: z.array(
    z
      .object({ op: z.custom<AlterationOp>((v) => typeof v === 'object' && v !== null && typeof (v as { op?: unknown }).op === 'string'), reason: z.string(), confidence: z.string(), fromNote: z.literal(true).optional() })
      .passthrough(),
  ),
  cautions: z.array(z.string()),
  chart: z.object({ name: z.string().optional(), source: z.string() }).passthrough().optional(),
  /** Finished girths of the pattern before the plan (the make's list) and after it (contract #6). */
  garment: z.object({ before: garmentSideSchema, after: garmentSideSchema }).optional(),
  /** What the earlier make's fit note changed in this plan, one line each. */
  fromPrevious: z.array(z.string()).optional(),
});
export type FitPlan = z.infer<typeof planSchema>;

const previousSchema = z.object({ makeId: z.string(), makeName: z.string(), fitNote: fitNoteSchema.nullable() }).nullable();
export type PreviousMake = NonNullable<z.infer<typeof previousSchema>>;

const planResponseSchema = z.object({ plan: planSchema, previous: previousSchema.optional().transform((p) => p ?? null) });
export type PlanResponse = z.infer<typeof planResponseSchema>;

export type ChartSource = 'printed' | 'measured';

export interface PlanFitInput {
  makeId: string;
  fit: 'close' | 'regular' | 'relaxed';
  /** Where the waistband will sit: mm above (+) or below (−) the natural waist. */
  waistOffset: number;
  /** Crosswise stretch of the cloth (%), typed here: used in place of the make's fabric. */
  stretchAcross?: number;
  /** The size table to plan against; the server's default when left out. */
  chart?: ChartSource;
  /** Reasons in the person's unit. */
  unit: 'in' | 'cm';
}

/**
 * The fit plan of a make (nothing is saved until the person adds its alterations). The cloth is
 * the stretch typed here when given, else the make's fabric (PATCH /makes/:id { fabricId }).
 */
export function planFit({ makeId, fit, waistOffset, stretchAcross, chart, unit }: PlanFitInput): Promise<PlanResponse> {
  return apiClient.post(
    `/makes/${encodeURIComponent(makeId)}/plan`,
    { options: { fit, waistOffset, unit }, ...(stretchAcross !== undefined ? { fabric: { stretchAcross } } : {}), ...(chart ? { chart } : {}) },
    planResponseSchema,
  );
}

export const usePlanFit = () => useMutation({ mutationFn: planFit });
