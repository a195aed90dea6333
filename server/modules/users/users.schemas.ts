import { z } from 'zod';
import { ROLES } from './user.entity.ts';

export const emailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }).max(254));
export const displayNameSchema = z
  .string({ error: 'Enter a display name.' })
  .trim()
  .min(1, 'Enter a display name.')
  .max(80, 'Keep the display name to 80 characters.');
/** Length over composition rules (NIST SP 800-63B: at least 8; we ask 10), capped for bcrypt's 72 bytes. */
export const newPasswordSchema = z
  .string({ error: 'Enter a password.' })
  .min(10, 'Use at least 10 characters.')
  .refine((p) => Buffer.byteLength(p, 'utf8') <= 72, 'Keep the password under 72 bytes.');
export const roleSchema = z.enum(ROLES, { error: `Role must be one of ${ROLES.join(', ')}.` });
export const idParamsSchema = z.object({ id: z.uuid({ error: 'Not a valid id.' }) });
