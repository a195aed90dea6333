import { Router } from 'express';
import type { Environment } from '../../config.ts';
import type { DemoAccount } from '../../seed/demo.ts';

/** What the client needs to know about this server. Demo passwords only in development. */
export function metaRouter(deps: { env: Environment; demoAccounts: readonly DemoAccount[] | null }): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.json({
      environment: deps.env,
      demoAccounts: deps.env === 'development' ? deps.demoAccounts : null,
    });
  });
  return router;
}
