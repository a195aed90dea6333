import type { Server } from 'node:http';
import path from 'node:path';
import type { Express } from 'express';
import pg from 'pg';
import { pino } from 'pino';
import { createApp, type AppDeps } from '../../server/app.ts';
import { projectRoot } from '../../server/config.ts';
import { freePort } from '../../server/db/postgres.ts';
import type PgBoss from 'pg-boss';
import { startJobs } from '../../server/jobs/jobs.ts';
import { createMailer, type Mailer } from '../../server/modules/mail/mailer.ts';
import { PrintsService, startPrintWorker } from '../../server/modules/prints/prints.service.ts';
import { UsersService } from '../../server/modules/users/users.service.ts';
import { DEMO_ACCOUNTS } from '../../server/seed/demo.ts';
import { createTestDatabase, type TestDatabase } from './database.ts';

export interface TestApp {
  app: Express;
  database: TestDatabase;
  mailer: Mailer;
  users: UsersService;
  boss: PgBoss;
  close(): Promise<void>;
}

export interface TestAppOptions {
  env?: AppDeps['config']['env'];
  signInAttempts?: number;
  publicUrl?: string;
  serveClient?: boolean;
  importLimits?: AppDeps['importLimits'];
}

/** The real app on a fresh database of its own (the demo studio seeded), with the local outbox; no port yet. */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const users = new UsersService(database.db);
  const mailer = await createMailer({ smtp: undefined, mailFrom: 'Blockwright <no-reply@blockwright.localhost>' });
  const sessionPool = new pg.Pool({ connectionString: database.url, max: 3 });
  const boss = await startJobs(database.url, { supervise: false });
  await startPrintWorker(boss, new PrintsService(database.db, boss), 0.5);
  const app = createApp({
    config: {
      env: options.env ?? 'test',
      publicUrl: options.publicUrl ?? 'http://127.0.0.1',
      cookieSecure: false,
      signInAttempts: options.signInAttempts ?? 10,
    },
    db: database.db,
    sessionPool,
    sessionSecret: 'test-secret-that-is-long-enough-for-sessions',
    mailer,
    jobs: boss,
    logger: pino({ level: 'silent' }),
    demoAccounts: DEMO_ACCOUNTS,
    ...(options.serveClient ? { clientDir: path.join(projectRoot, 'dist') } : {}),
    ...(options.importLimits ? { importLimits: options.importLimits } : {}),
  });
  return {
    app,
    database,
    mailer,
    users,
    boss,
    async close() {
      await boss.stop({ graceful: false, wait: true });
      await mailer.close();
      await sessionPool.end();
      await database.drop();
    },
  };
}

/** The real app, demo studio seeded, serving the built client on an ephemeral loopback port. */
export async function startTestApp(options: TestAppOptions = {}): Promise<{ url: string; close(): Promise<void> }> {
  // The port is chosen first so that e-mailed links carry the real address.
  const url = `http://127.0.0.1:${await freePort()}`;
  const t = await createTestApp({ publicUrl: url, ...options, serveClient: true });
  const server: Server = await new Promise((resolve, reject) => {
    const s = t.app.listen(Number(new URL(url).port), '127.0.0.1', () => resolve(s));
    s.once('error', reject);
  });
  return {
    url,
    async close() {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
      await t.close();
    },
  };
}
