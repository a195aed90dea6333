import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The fit planner: dated measurement sets behind each profile (history is never rewritten),
 * girths at heights above/below the waist, a make's fabric and fit note, a pattern's printed
 * size table.
 */
export class FitPlanner1764979200000 implements MigrationInterface {
  name = 'FitPlanner1764979200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE profiles ADD COLUMN girths_at_heights jsonb NOT NULL DEFAULT '[]'`);
    await q.query(`ALTER TABLE profiles ADD COLUMN taken_on date NOT NULL DEFAULT CURRENT_DATE`);
    await q.query(`UPDATE profiles SET taken_on = created_at::date`);
    await q.query(`
      CREATE TABLE profile_measurement_sets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        profile_id uuid NOT NULL REFERENCES profiles (id) ON DELETE CASCADE,
        taken_on date NOT NULL,
        measurements jsonb NOT NULL DEFAULT '{}',
        girths_at_heights jsonb NOT NULL DEFAULT '[]',
        note text NOT NULL DEFAULT '',
        created_at timestamptz NOT NULL DEFAULT clock_timestamp()
      )`);
    await q.query('CREATE INDEX profile_measurement_sets_profile_idx ON profile_measurement_sets (profile_id, taken_on DESC, created_at DESC)');
    // History is kept, never rewritten.
    await q.query(`
      CREATE FUNCTION profile_measurement_sets_append_only() RETURNS trigger AS $$
      BEGIN
        RAISE EXCEPTION 'profile measurement sets are append-only';
      END $$ LANGUAGE plpgsql`);
    await q.query(`
      CREATE TRIGGER profile_measurement_sets_no_update BEFORE UPDATE ON profile_measurement_sets
      FOR EACH ROW EXECUTE FUNCTION profile_measurement_sets_append_only()`);
    await q.query(`
      INSERT INTO profile_measurement_sets (profile_id, taken_on, measurements, created_at)
      SELECT id, created_at::date, measurements, created_at FROM profiles`);

    await q.query('ALTER TABLE makes ADD COLUMN fabric_id uuid REFERENCES fabrics (id) ON DELETE SET NULL');
    await q.query('ALTER TABLE makes ADD COLUMN fit_note jsonb');
    await q.query('ALTER TABLE patterns ADD COLUMN size_chart jsonb');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE patterns DROP COLUMN size_chart');
    await q.query('ALTER TABLE makes DROP COLUMN fit_note');
    await q.query('ALTER TABLE makes DROP COLUMN fabric_id');
    await q.query('DROP TABLE profile_measurement_sets');
    await q.query('DROP FUNCTION profile_measurement_sets_append_only');
    await q.query('ALTER TABLE profiles DROP COLUMN taken_on');
    await q.query('ALTER TABLE profiles DROP COLUMN girths_at_heights');
  }
}
