import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Prints made in the background: the pattern and options asked for, progress, and the file kept for download. */
export class PrintJobs1764720000000 implements MigrationInterface {
  name = 'PrintJobs1764720000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE print_jobs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        status text NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'running', 'done', 'failed')),
        progress integer NOT NULL DEFAULT 0 CHECK (progress BETWEEN 0 AND 100),
        format text NOT NULL CHECK (format IN ('pdf', 'svg')),
        title text NOT NULL,
        options jsonb NOT NULL,
        pattern jsonb NOT NULL,
        file bytea,
        file_size integer,
        page_count integer,
        empty_pages jsonb,
        error text,
        created_at timestamptz NOT NULL DEFAULT now(),
        finished_at timestamptz
      )`);
    await q.query('CREATE INDEX print_jobs_owner_created_idx ON print_jobs (owner_id, created_at DESC)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE print_jobs');
  }
}
