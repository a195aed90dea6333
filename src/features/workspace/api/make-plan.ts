import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import type { AlterationOp } from '../../../../geometry/index.ts';
import { apiClient } from '../../../lib/api-client';

const planSchema = z.object({
  levels: z.array(
    z.object({ level: z.string(), body: z.number(), target: z.number(), size: z.string(), garmentAtSize: z.number(), reason: z.string(), confidence: z.string() }).passthrough(),
  ),
  // The engine checks each operation when the list is replayed and saved.
  steps: z.array(z.object({ op: z.custom<AlterationOp>((v) => typeof v === 'object' && v !== null && typeof (v as { op?: unknown }).op === 'string'), reason: z.string(), confidence: z.string() })),
  cautions: z.array(z.string()),
});
export type MakePlan = z.infer<typeof planSchema>;

export interface MakePlanInput {
  makeId: string;
  fit: 'close' | 'regular' | 'relaxed';
  /** Where the waistband will sit: mm above (+) or below (−) the natural waist. */
  waistOffset: number;
  /** Crosswise stretch of the cloth (%), when known. */
  stretchAcross?: number;
}

/** The fit plan of a make (nothing is saved until the person adds its alterations). */
export function makePlan({ makeId, fit, waistOffset, stretchAcross }: MakePlanInput): Promise<MakePlan> {
  return apiClient
    .post(`/makes/${encodeURIComponent(makeId)}/plan`, { options: { fit, waistOffset }, ...(stretchAcross !== undefined ? { fabric: { stretchAcross } } : {}) }, z.object({ plan: planSchema }))
    .then((r) => r.plan);
}

export const useMakePlan = () => useMutation({ mutationFn: makePlan });
