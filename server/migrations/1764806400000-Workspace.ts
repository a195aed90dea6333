import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The workspace: uploaded patterns (private or published to the shared library), simple
 * measurement profiles, makes, and each make's append-only alteration revisions. Also each
 * user's choice of units.
 */
export class Workspace1764806400000 implements MigrationInterface {
  name = 'Workspace1764806400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN units text NOT NULL DEFAULT 'in' CHECK (units IN ('in', 'cm'))`);
    await q.query(`
      CREATE TABLE patterns (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        source_format text NOT NULL CHECK (source_format IN ('svg', 'dxf', 'json', 'demo')),
        source_name text NOT NULL,
        data jsonb NOT NULL,
        piece_count integer NOT NULL,
        sizes jsonb NOT NULL,
        import_notes jsonb NOT NULL DEFAULT '[]',
        published_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query('CREATE INDEX patterns_owner_idx ON patterns (owner_id, created_at DESC)');
    await q.query('CREATE INDEX patterns_published_idx ON patterns (published_at DESC) WHERE published_at IS NOT NULL');
    await q.query(`
      CREATE TABLE profiles (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        measurements jsonb NOT NULL DEFAULT '{}',
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query('CREATE INDEX profiles_owner_idx ON profiles (owner_id)');
    await q.query(`
      CREATE TABLE makes (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        pattern_id uuid NOT NULL REFERENCES patterns (id) ON DELETE RESTRICT,
        profile_id uuid REFERENCES profiles (id) ON DELETE SET NULL,
        fabric_note text NOT NULL DEFAULT '',
        source_make_id uuid REFERENCES makes (id) ON DELETE SET NULL,
        latest_revision integer NOT NULL DEFAULT 0 CHECK (latest_revision >= 0),
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query('CREATE INDEX makes_owner_idx ON makes (owner_id, updated_at DESC)');
    await q.query('CREATE INDEX makes_pattern_idx ON makes (pattern_id)');
    await q.query(`
      CREATE TABLE make_revisions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        make_id uuid NOT NULL REFERENCES makes (id) ON DELETE CASCADE,
        number integer NOT NULL CHECK (number >= 1),
        alterations jsonb NOT NULL,
        summary text NOT NULL,
        author_id uuid REFERENCES users (id) ON DELETE SET NULL,
        restored_from integer,
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (make_id, number)
      )`);
    // Append-only: a revision, once written, is never changed.
    await q.query(`
      CREATE FUNCTION make_revisions_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION 'make revisions are append-only';
      END $$`);
    await q.query(`
      CREATE TRIGGER make_revisions_no_update BEFORE UPDATE ON make_revisions
      FOR EACH ROW EXECUTE FUNCTION make_revisions_append_only()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE make_revisions');
    await q.query('DROP FUNCTION make_revisions_append_only');
    await q.query('DROP TABLE makes');
    await q.query('DROP TABLE profiles');
    await q.query('DROP TABLE patterns');
    await q.query('ALTER TABLE users DROP COLUMN units');
  }
}
