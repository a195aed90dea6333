import type { DataSource } from 'typeorm';
import { createDataSource } from '../data-source.ts';

/** Connect, then bring the schema up to date with the pending migrations. */
export async function openDatabase(url: string): Promise<DataSource> {
  const db = createDataSource(url);
  await db.initialize();
  try {
    await db.runMigrations({ transaction: 'each' });
  } catch (err) {
    await db.destroy();
    throw err;
  }
  return db;
}
