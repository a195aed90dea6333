import { z } from 'zod';
import { displayNameSchema, emailSchema, newPasswordSchema } from '../users/users.schemas.ts';

export const signUpSchema = z.object({
  email: emailSchema,
  displayName: displayNameSchema,
  password: newPasswordSchema,
});

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(1024),
});

export const resetRequestSchema = z.object({ email: emailSchema });

export const resetConfirmSchema = z.object({
  token: z.string({ error: 'The link has no token.' }).min(20, 'The link is not complete.').max(200),
  password: newPasswordSchema,
});
