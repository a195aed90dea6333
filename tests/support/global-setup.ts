/**
 * Once per `vitest run`: a fresh, throw-away PostgreSQL cluster (fsync off) on a free loopback
 * port, with a template database migrated to the current schema, pg-boss's schema installed and
 * the demo studio seeded. Each test file clones the
 * template into a database of its own (see database.ts), so files run in parallel without
 * sharing rows.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { freePort, startCluster } from '../../server/db/postgres.ts';
import { openDatabase } from '../../server/db/database.ts';
import { startJobs } from '../../server/jobs/jobs.ts';
import { seedDemo } from '../../server/seed/demo.ts';

const TEMPLATE_DATABASE = 'bw_template';

declare module 'vitest' {
  export interface ProvidedContext {
    pgUrlBase: string;
    pgTemplate: string;
  }
}

export default async function setup(project: TestProject) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'blockwright-test-'));
  // mkdtemp makes it private to us; as root, the postgres user must be able to reach the cluster inside.
  fs.chmodSync(dir, 0o755);
  const cluster = await startCluster({ dir, port: await freePort(), ephemeral: true });
  await cluster.createDatabase(TEMPLATE_DATABASE);
  const db = await openDatabase(cluster.url(TEMPLATE_DATABASE));
  await seedDemo(db);
  await db.destroy();
  // pg-boss installs its schema once here, so each cloned database starts with it.
  const boss = await startJobs(cluster.url(TEMPLATE_DATABASE), { supervise: false });
  await boss.stop({ graceful: false, wait: true });
  // The URL of the cluster's maintenance database; test files swap the database name.
  project.provide('pgUrlBase', cluster.url('postgres'));
  project.provide('pgTemplate', TEMPLATE_DATABASE);
  return () => {
    cluster.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  };
}
