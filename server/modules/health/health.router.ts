import { Router } from 'express';
import type { DataSource } from 'typeorm';

/** Liveness with a real database round trip; 503 when PostgreSQL does not answer. */
export function healthRouter(deps: { db: DataSource }): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    try {
      await deps.db.query('SELECT 1');
      res.json({ status: 'ok', database: 'ok' });
    } catch (err) {
      req.log?.warn({ err }, 'health check: database unreachable');
      res.status(503).json({ status: 'degraded', database: 'unreachable' });
    }
  });
  return router;
}
