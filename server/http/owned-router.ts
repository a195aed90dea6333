import { Router } from 'express';
import type { ZodType } from 'zod';
import { currentUser, requireUser } from './guards.ts';
import { parseInput } from './parse.ts';
import { idParamsSchema } from '../modules/users/users.schemas.ts';

/** What a resource private to its owner offers: the owner's list, one by id (403 for others), create, change, delete. */
export interface OwnedService<E, C, U> {
  list(ownerId: string): Promise<E[]>;
  get(ownerId: string, id: string): Promise<E>;
  create(ownerId: string, input: C): Promise<E>;
  update(ownerId: string, id: string, input: U): Promise<E>;
  remove(ownerId: string, id: string): Promise<void>;
}

/**
 * The routes of a resource private to its owner (profiles, fabrics): `GET /`, `POST /` (201),
 * `GET /:id`, `PATCH /:id`, `DELETE /:id` (204); bodies parsed with zod; answers
 * `{ [plural]: [...] }` or `{ [singular]: {...} }`.
 */
export function ownedRouter<E, D, C, U>(options: {
  singular: string;
  plural: string;
  service: OwnedService<E, C, U>;
  toDto: (e: E) => D & { id: string };
  createSchema: ZodType<C>;
  updateSchema: ZodType<U>;
}): Router {
  const { singular, plural, service, toDto } = options;
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    res.json({ [plural]: (await service.list(currentUser(req).id)).map(toDto) });
  });

  router.post('/', async (req, res) => {
    const input = parseInput(options.createSchema, req.body, singular);
    const dto = toDto(await service.create(currentUser(req).id, input));
    res.status(201).location(`${req.baseUrl}/${dto.id}`).json({ [singular]: dto });
  });

  router.get('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    res.json({ [singular]: toDto(await service.get(currentUser(req).id, id)) });
  });

  router.patch('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const input = parseInput(options.updateSchema, req.body, `${singular} change`);
    res.json({ [singular]: toDto(await service.update(currentUser(req).id, id, input)) });
  });

  router.delete('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    await service.remove(currentUser(req).id, id);
    res.status(204).end();
  });

  return router;
}
