import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import { inject } from 'vitest';
import { createDataSource } from '../../server/data-source.ts';

export interface TestDatabase {
  url: string;
  db: DataSource;
  drop(): Promise<void>;
}

async function onMaintenance<T>(fn: (c: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: inject('pgUrlBase') });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** A database of this test file's own, cloned from the migrated template. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const name = `t_${randomBytes(6).toString('hex')}`;
  await onMaintenance((c) => c.query(`CREATE DATABASE "${name}" TEMPLATE "${inject('pgTemplate')}"`));
  const base = new URL(inject('pgUrlBase'));
  base.pathname = `/${name}`;
  const url = base.toString();
  const db = createDataSource(url);
  await db.initialize();
  return {
    url,
    db,
    async drop() {
      await db.destroy();
      await onMaintenance((c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
    },
  };
}
