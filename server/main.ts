/**
 * `npm start`: the whole app on one port. Starts the project's own PostgreSQL (unless
 * DATABASE_URL is set), runs the migrations, seeds the demo studio into an empty database,
 * starts the local outbox (unless SMTP_HOST is set), and serves the API and the built client.
 * Ctrl+C (SIGINT) or SIGTERM stops everything in order, PostgreSQL last.
 */
import fs from 'node:fs';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import type { Server } from 'node:http';
import pg from 'pg';
import { pino } from 'pino';
import { createApp } from './app.ts';
import { loadConfig, projectRoot, type Config } from './config.ts';
import { openDatabase } from './db/database.ts';
import { startCluster, type Cluster } from './db/postgres.ts';
import { startJobs } from './jobs/jobs.ts';
import { createMailer } from './modules/mail/mailer.ts';
import { PrintsService, startPrintWorker } from './modules/prints/prints.service.ts';
import { DEMO_ACCOUNTS, seedDemo } from './seed/demo.ts';

const DATABASE_NAME = 'blockwright';

/** The session secret from the environment, or one generated once and kept in the data folder. */
function sessionSecretFor(dataDir: string, given: string | undefined): string {
  if (given) return given;
  const file = path.join(dataDir, 'session-secret');
  if (!fs.existsSync(file)) {
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}

async function main(): Promise<void> {
  let config: Config;
  try {
    config = loadConfig();
  } catch (err) {
    process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  }
  // Readable lines in a terminal; JSON lines otherwise (for log collectors).
  const pretty = process.stdout.isTTY && config.env !== 'production';
  const logger = pino({
    level: config.logLevel,
    ...(pretty ? { transport: { target: 'pino-pretty', options: { ignore: 'pid,hostname', translateTime: 'SYS:HH:MM:ss' } } } : {}),
  });
  const say = (line: string) => logger.info(line);
  const cleanups: Array<() => Promise<void> | void> = [];

  let stopping = false;
  async function stop(code: number): Promise<never> {
    if (stopping) process.exit(code);
    stopping = true;
    for (const cleanup of cleanups.reverse()) {
      try {
        await cleanup();
      } catch (err) {
        logger.error({ err }, 'while stopping');
      }
    }
    process.exit(code);
  }
  process.once('SIGINT', () => void stop(0));
  process.once('SIGTERM', () => void stop(0));

  try {
    let databaseUrl = config.databaseUrl;
    if (!databaseUrl) {
      const cluster: Cluster = await startCluster({ dir: config.dataDir, port: config.pgPort, log: say });
      cleanups.push(() => cluster.stop());
      await cluster.createDatabase(DATABASE_NAME);
      databaseUrl = cluster.url(DATABASE_NAME);
    }

    const db = await openDatabase(databaseUrl);
    cleanups.push(() => db.destroy());
    const sessionPool = new pg.Pool({ connectionString: databaseUrl, max: 5 });
    cleanups.push(() => sessionPool.end());

    if (config.seedDemo && (await seedDemo(db))) say('Seeded the demo studio (Loomhollow Sewing Studio).');

    const mailer = await createMailer(config);
    cleanups.push(() => mailer.close());
    if (mailer.outbox) say(`Mail goes to the local outbox (SMTP on 127.0.0.1:${mailer.outbox.port}); admins read it at /admin/outbox.`);

    const boss = await startJobs(databaseUrl);
    cleanups.push(() => boss.stop({ graceful: true, timeout: 10_000 }));
    await startPrintWorker(boss, new PrintsService(db, boss));

    const app = createApp({
      config,
      db,
      sessionPool,
      sessionSecret: sessionSecretFor(config.dataDir, config.sessionSecret),
      mailer,
      jobs: boss,
      logger,
      demoAccounts: config.seedDemo ? DEMO_ACCOUNTS : null,
      clientDir: path.join(projectRoot, 'dist'),
    });
    const server: Server = await new Promise((resolve, reject) => {
      const s = app.listen(config.port, config.host, () => resolve(s));
      s.once('error', reject);
    });
    cleanups.push(
      () =>
        new Promise<void>((resolve) => {
          server.close(() => resolve());
          server.closeAllConnections();
        }),
    );
    say(`Blockwright is serving on ${config.publicUrl} (${config.env}). Ctrl+C stops it and its PostgreSQL.`);
  } catch (err) {
    logger.fatal(err instanceof Error ? err.message : String(err));
    await stop(1);
  }
}

void main();
