import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Which make a print was made from, so that a make lists its own earlier prints. */
export class PrintMakes1765065600000 implements MigrationInterface {
  name = 'PrintMakes1765065600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE print_jobs ADD COLUMN make_id uuid REFERENCES makes (id) ON DELETE SET NULL');
    await q.query('CREATE INDEX print_jobs_owner_make_created_idx ON print_jobs (owner_id, make_id, created_at DESC)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP INDEX print_jobs_owner_make_created_idx');
    await q.query('ALTER TABLE print_jobs DROP COLUMN make_id');
  }
}
