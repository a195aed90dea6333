import express, { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireUser } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import { PATTERN_BODY_LIMIT } from '../../http/upload.ts';
import { idParamsSchema } from '../users/users.schemas.ts';
import { toPrintJobDto } from './prints.mapper.ts';
import type { PrintsService } from './prints.service.ts';

const createSchema = z.union(
  [
    z.object({
      pattern: z.unknown().refine((v) => typeof v === 'object' && v !== null, 'Send the pattern as a JSON object.'),
      options: z.record(z.string(), z.unknown()).default({}),
    }),
    /** A make's newest revision, replayed on the server. */
    z.object({ makeId: z.uuid({ error: 'Not a valid make id.' }), options: z.record(z.string(), z.unknown()).default({}) }),
  ],
  { error: 'Send either a pattern or a makeId, with options.' },
);

/** `?makeId=` lists the prints of that make only. */
const listQuerySchema = z.object({ makeId: z.uuid({ error: 'Not a valid make id.' }).optional() });

const safeFileName = (title: string) => title.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'pattern';

/** Prints of the signed-in user: queue one, follow its progress, download the file again later. */
export function printsRouter(deps: { prints: PrintsService }): Router {
  const router = Router();
  router.use(requireUser);

  router.post('/', express.json({ limit: PATTERN_BODY_LIMIT }), async (req, res) => {
    const input = parseInput(createSchema, req.body, 'print request');
    const job = await deps.prints.create(currentUser(req), input);
    res.status(202).location(`/api/prints/${job.id}`).json({ print: toPrintJobDto(job) });
  });

  router.get('/', async (req, res) => {
    const filter = parseInput(listQuerySchema, req.query, 'query');
    const jobs = await deps.prints.list(currentUser(req).id, filter);
    res.json({ prints: jobs.map(toPrintJobDto) });
  });

  router.get('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    res.json({ print: toPrintJobDto(await deps.prints.get(currentUser(req).id, id)) });
  });

  router.get('/:id/file', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const { job, file } = await deps.prints.file(currentUser(req).id, id);
    res
      .type(job.format === 'pdf' ? 'application/pdf' : 'image/svg+xml')
      .attachment(`${safeFileName(job.title)}.${job.format}`)
      .set('Cache-Control', 'private, no-store')
      .send(file);
  });

  return router;
}
