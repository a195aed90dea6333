import { Router } from 'express';
import { currentUser, requireUser } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import { idParamsSchema } from '../users/users.schemas.ts';
import {
  createMakeSchema,
  duplicateMakeSchema,
  fitNoteRequestSchema,
  listMakesQuerySchema,
  planRequestSchema,
  revisionParamsSchema,
  saveRevisionSchema,
  updateMakeSchema,
} from './makes.schemas.ts';
import type { MakesService } from './makes.service.ts';

/** Makes: create, list, rename, duplicate, archive; revisions appended with a stale-revision check. */
export function makesRouter(deps: { makes: MakesService }): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    const { archived } = parseInput(listMakesQuerySchema, req.query, 'query');
    res.json({ makes: await deps.makes.list(currentUser(req), archived) });
  });

  router.post('/', async (req, res) => {
    const input = parseInput(createMakeSchema, req.body, 'make');
    const make = await deps.makes.create(currentUser(req), input);
    res.status(201).location(`/api/makes/${make.id}`).json({ make });
  });

  router.get('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    res.json({ make: await deps.makes.detail(currentUser(req), id) });
  });

  router.patch('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const input = parseInput(updateMakeSchema, req.body, 'make change');
    res.json({ make: await deps.makes.update(currentUser(req), id, input) });
  });

  router.post('/:id/duplicate', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const { name } = parseInput(duplicateMakeSchema, req.body, 'duplicate');
    const make = await deps.makes.duplicate(currentUser(req), id, name);
    res.status(201).location(`/api/makes/${make.id}`).json({ make });
  });

  router.post('/:id/plan', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const input = parseInput(planRequestSchema, req.body, 'plan request');
    res.json(await deps.makes.plan(currentUser(req), id, input));
  });

  router.put('/:id/fit-note', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const note = parseInput(fitNoteRequestSchema, req.body, 'fit note');
    res.json({ fitNote: await deps.makes.setFitNote(currentUser(req), id, note) });
  });

  router.delete('/:id/fit-note', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    await deps.makes.setFitNote(currentUser(req), id, null);
    res.status(204).end();
  });

  router.get('/:id/revisions', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    res.json({ revisions: await deps.makes.revisions(currentUser(req), id) });
  });

  router.post('/:id/revisions', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const input = parseInput(saveRevisionSchema, req.body, 'revision');
    const revision = await deps.makes.saveRevision(currentUser(req), id, input);
    res.status(201).location(`/api/makes/${id}/revisions/${revision.number}`).json({ revision });
  });

  router.get('/:id/revisions/:number', async (req, res) => {
    const { id, number } = parseInput(revisionParamsSchema, req.params, 'address');
    res.json({ revision: await deps.makes.revision(currentUser(req), id, number) });
  });

  return router;
}
