import { Router } from 'express';
import { currentUser, requireUser } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import { idParamsSchema } from '../users/users.schemas.ts';
import { toProfileDto } from './profiles.mapper.ts';
import { createProfileSchema, updateProfileSchema } from './profiles.schemas.ts';
import type { ProfilesService } from './profiles.service.ts';

/** The signed-in user's measurement profiles. */
export function profilesRouter(deps: { profiles: ProfilesService }): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    res.json({ profiles: (await deps.profiles.list(currentUser(req).id)).map(toProfileDto) });
  });

  router.post('/', async (req, res) => {
    const input = parseInput(createProfileSchema, req.body, 'profile');
    const profile = await deps.profiles.create(currentUser(req).id, input);
    res.status(201).location(`/api/profiles/${profile.id}`).json({ profile: toProfileDto(profile) });
  });

  router.get('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    res.json({ profile: toProfileDto(await deps.profiles.get(currentUser(req).id, id)) });
  });

  router.patch('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const input = parseInput(updateProfileSchema, req.body, 'profile change');
    res.json({ profile: toProfileDto(await deps.profiles.update(currentUser(req).id, id, input)) });
  });

  router.delete('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    await deps.profiles.remove(currentUser(req).id, id);
    res.status(204).end();
  });

  return router;
}
