import { Router } from 'express';
import { currentUser, requireUser } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import { singlePatternFile } from '../../http/upload.ts';
import { idParamsSchema } from '../users/users.schemas.ts';
import { listQuerySchema, putSizeChartSchema, sizeChartQuerySchema, updatePatternSchema, uploadFieldsSchema } from './patterns.schemas.ts';
import type { PatternsService } from './patterns.service.ts';

/** Patterns: upload (multipart field `file`), list mine or the shared library, read, label, publish, delete. */
export function patternsRouter(deps: { patterns: PatternsService }): Router {
  const router = Router();
  router.use(requireUser);

  router.post('/', singlePatternFile, async (req, res) => {
    const { name } = parseInput(uploadFieldsSchema, req.body, 'upload');
    const pattern = await deps.patterns.upload(currentUser(req).id, req.file, name);
    res.status(201).location(`/api/patterns/${pattern.id}`).json({ pattern });
  });

  router.get('/', async (req, res) => {
    const { scope } = parseInput(listQuerySchema, req.query, 'query');
    res.json({ patterns: await deps.patterns.list(currentUser(req), scope) });
  });

  router.get('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    res.json({ pattern: await deps.patterns.detail(currentUser(req), id) });
  });

  router.patch('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const input = parseInput(updatePatternSchema, req.body, 'pattern change');
    res.json({ pattern: await deps.patterns.update(currentUser(req), id, input) });
  });

  router.get('/:id/size-chart', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const { seamAllowance } = parseInput(sizeChartQuerySchema, req.query, 'query');
    res.json(await deps.patterns.sizeCharts(currentUser(req), id, seamAllowance));
  });

  router.put('/:id/size-chart', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    const { chart } = parseInput(putSizeChartSchema, req.body, 'size table');
    res.json({ printed: await deps.patterns.setSizeChart(currentUser(req), id, chart) });
  });

  router.delete('/:id/size-chart', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    await deps.patterns.setSizeChart(currentUser(req), id, null);
    res.status(204).end();
  });

  router.delete('/:id', async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'address');
    await deps.patterns.remove(currentUser(req), id);
    res.status(204).end();
  });

  return router;
}
