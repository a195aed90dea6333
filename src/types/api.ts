import { z } from 'zod';

/**
 * Shapes the server sends that more than one feature reads.
 * Endpoint-specific response shapes live next to their fetcher.
 */

export const roles = ['sewist', 'coach', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  /** How lengths are shown: inches with fractions, or centimetres. */
  units: z.enum(['in', 'cm']).default('in'),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const userResponseSchema = z.object({ user: userSchema });

export const roleLabels: Record<Role, string> = {
  sewist: 'Sewist',
  coach: 'Coach',
  admin: 'Admin',
};
