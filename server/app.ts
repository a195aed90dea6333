import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import type pg from 'pg';
import type PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import type { Config } from './config.ts';
import { apiNotFound, errorHandler } from './errors/error-handler.ts';
import { csrf } from './http/csrf.ts';
import { PATTERN_BODY_LIMIT } from './http/upload.ts';
import { accountRouter } from './modules/account/account.router.ts';
import { adminRouter } from './modules/admin/admin.router.ts';
import { authRouter } from './modules/auth/auth.router.ts';
import { createPassport } from './modules/auth/passport.ts';
import { PasswordResetService } from './modules/auth/password-reset.service.ts';
import { healthRouter } from './modules/health/health.router.ts';
import type { Mailer } from './modules/mail/mailer.ts';
import { metaRouter } from './modules/meta/meta.router.ts';
import { makesRouter } from './modules/makes/makes.router.ts';
import { MakesService } from './modules/makes/makes.service.ts';
import { type ImportLimits, ImportRunner } from './modules/patterns/import-runner.ts';
import { patternsRouter } from './modules/patterns/patterns.router.ts';
import { PatternsService } from './modules/patterns/patterns.service.ts';
import { printsRouter } from './modules/prints/prints.router.ts';
import { fabricsRouter } from './modules/fabrics/fabrics.router.ts';
import { FabricsService } from './modules/fabrics/fabrics.service.ts';
import { profilesRouter } from './modules/profiles/profiles.router.ts';
import { ProfilesService } from './modules/profiles/profiles.service.ts';
import { PrintsService } from './modules/prints/prints.service.ts';
import { UsersService } from './modules/users/users.service.ts';
import type { DemoAccount } from './seed/demo.ts';

export interface AppDeps {
  config: Pick<Config, 'env' | 'publicUrl' | 'cookieSecure' | 'signInAttempts'>;
  db: DataSource;
  /** A pg pool for the session store. */
  sessionPool: pg.Pool;
  sessionSecret: string;
  mailer: Mailer;
  /** Background jobs: the app only queues; main.ts (or a test) runs the workers. */
  jobs: Pick<PgBoss, 'send'>;
  logger: Logger;
  demoAccounts: readonly DemoAccount[] | null;
  /** The built client (vite build output); when missing, only the API is served. */
  clientDir?: string;
  /** Time and memory limits for reading an uploaded pattern file (DEFAULT_IMPORT_LIMITS). */
  importLimits?: ImportLimits;
}

const SESSION_MAX_AGE_MS = 14 * 24 * 60 * 60 * 1000;

/** The whole Express app, without listening: main.ts and the tests call `listen` themselves. */
export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  const users = new UsersService(deps.db);
  const passport = createPassport(users);
  const passwordReset = new PasswordResetService(deps.db, users, deps.mailer, deps.config.publicUrl);
  const PgStore = connectPgSimple(session);

  app.use(pinoHttp({ logger: deps.logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } }));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Served over plain http on loopback in development: do not ask for https upgrades.
          upgradeInsecureRequests: deps.config.cookieSecure ? [] : null,
          // The workspace draws on canvas and offers downloads as blob: URLs.
          imgSrc: ["'self'", 'data:', 'blob:'],
        },
      },
      // HSTS only means something over https.
      strictTransportSecurity: deps.config.cookieSecure,
    }),
  );

  const api = express.Router();
  const json = express.json({ limit: '1mb' });
  // A labelled pattern with all its size lines can be a few MB of path data.
  const patternJson = express.json({ limit: PATTERN_BODY_LIMIT });
  // Print requests carry a whole pattern and parse their own, larger bodies.
  api.use((req, res, next) =>
    req.path.startsWith('/prints') ? next() : req.path.startsWith('/patterns') ? patternJson(req, res, next) : json(req, res, next),
  );
  api.use(
    session({
      name: 'bw.sid',
      store: new PgStore({ pool: deps.sessionPool, tableName: 'user_sessions', createTableIfMissing: false }),
      secret: deps.sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: deps.config.cookieSecure,
        maxAge: SESSION_MAX_AGE_MS,
      },
    }),
  );
  api.use(passport.initialize());
  api.use(passport.session());
  api.use(csrf.csrfSynchronisedProtection);

  api.use('/health', healthRouter({ db: deps.db }));
  api.use('/meta', metaRouter({ env: deps.config.env, demoAccounts: deps.demoAccounts }));
  api.use(
    '/auth',
    authRouter({ users, passport, passwordReset, signInAttempts: deps.config.signInAttempts }),
  );
  api.use('/account', accountRouter({ db: deps.db, users }));
  api.use('/admin', adminRouter({ users, mailer: deps.mailer }));
  const patterns = new PatternsService(deps.db, new ImportRunner(deps.importLimits));
  const makes = new MakesService(deps.db, patterns);
  api.use('/patterns', patternsRouter({ patterns }));
  api.use('/profiles', profilesRouter({ profiles: new ProfilesService(deps.db) }));
  api.use('/fabrics', fabricsRouter({ fabrics: new FabricsService(deps.db) }));
  api.use('/makes', makesRouter({ makes }));
  api.use('/prints', printsRouter({ prints: new PrintsService(deps.db, deps.jobs, makes) }));
  api.use(apiNotFound);
  app.use('/api', api);

  const clientDir = deps.clientDir;
  if (clientDir && fs.existsSync(path.join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client-side routes: every other GET gets the app's page.
    app.get('/{*splat}', (_req, res) => {
      res.sendFile(path.join(clientDir, 'index.html'), { headers: { 'Cache-Control': 'no-cache' } });
    });
  } else {
    app.get('/{*splat}', (_req, res) => {
      res.status(404).type('text').send('The client is not built: run `npm run build`, or `npm start`, which builds it.');
    });
  }

  app.use(errorHandler);
  return app;
}
