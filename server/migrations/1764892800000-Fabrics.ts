import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Fabrics a sewist keeps: stretch, recovery, weight, width, shrinkage from a wash test (geometry/fit/body.ts). */
export class Fabrics1764892800000 implements MigrationInterface {
  name = 'Fabrics1764892800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE fabrics (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        properties jsonb NOT NULL DEFAULT '{}',
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query('CREATE INDEX fabrics_owner_idx ON fabrics (owner_id)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE fabrics');
  }
}
