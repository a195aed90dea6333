import { Router } from 'express';
import { z } from 'zod';
import { AppError } from '../../errors/app-error.ts';
import { currentUser, requireUser } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import type { DataSource } from 'typeorm';
import { endSessionsOf } from '../auth/sessions.ts';
import { displayNameSchema, newPasswordSchema } from '../users/users.schemas.ts';
import type { UsersService } from '../users/users.service.ts';
import { UNITS } from '../users/user.entity.ts';
import { toUserDto } from '../users/users.mapper.ts';

const settingsSchema = z
  .object({
    displayName: displayNameSchema.optional(),
    units: z.enum(UNITS, { error: 'Units must be "in" or "cm".' }).optional(),
  })
  .refine((v) => v.displayName !== undefined || v.units !== undefined, { message: 'Send a display name or units.' });
const passwordSchema = z.object({
  currentPassword: z.string({ error: 'Enter your current password.' }).min(1, 'Enter your current password.').max(1024),
  newPassword: newPasswordSchema,
});

/** The signed-in user's own account. */
export function accountRouter(deps: { db: DataSource; users: UsersService }): Router {
  const router = Router();
  router.use(requireUser);

  router.patch('/', async (req, res) => {
    const changes = parseInput(settingsSchema, req.body, 'account');
    const user = await deps.users.updateSettings(currentUser(req).id, changes);
    res.json({ user: toUserDto(user) });
  });

  router.post('/password', async (req, res) => {
    const { currentPassword, newPassword } = parseInput(passwordSchema, req.body, 'password change');
    const me = await deps.users.findById(currentUser(req).id);
    if (!me || !(await deps.users.checkPassword(me, currentPassword)))
      throw new AppError('wrong_password', 'The current password is not right.', 400, {
        currentPassword: 'This is not your current password.',
      });
    await deps.users.setPassword(me.id, newPassword);
    await endSessionsOf(deps.db, me.id, req.sessionID);
    res.status(204).end();
  });

  return router;
}
