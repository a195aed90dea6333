import { Router } from 'express';
import { z } from 'zod';
import { notFound } from '../../errors/app-error.ts';
import { requireRole } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import type { Mailer } from '../mail/mailer.ts';
import { idParamsSchema, roleSchema } from '../users/users.schemas.ts';
import type { UsersService } from '../users/users.service.ts';
import { toUserDto } from '../users/users.mapper.ts';

const roleChangeSchema = z.object({ role: roleSchema });

/** Accounts and roles, and the local outbox: admins only. */
export function adminRouter(deps: { users: UsersService; mailer: Mailer }): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/users', async (_req, res) => {
    const users = await deps.users.list();
    res.json({ users: users.map(toUserDto) });
  });

  router.patch('/users/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const { role } = parseInput(roleChangeSchema, req.body, 'role change');
    const user = await deps.users.setRole(id, role);
    res.json({ user: toUserDto(user) });
  });

  router.get('/outbox', (_req, res) => {
    if (!deps.mailer.outbox) throw notFound('The local outbox (mail goes to a real SMTP server)');
    res.json({ messages: deps.mailer.outbox.list() });
  });

  return router;
}
