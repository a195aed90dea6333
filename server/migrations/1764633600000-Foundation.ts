import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Users with a global role, password-reset tokens, and the session table of connect-pg-simple. */
export class Foundation1764633600000 implements MigrationInterface {
  name = 'Foundation1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email text NOT NULL,
        display_name text NOT NULL,
        password_hash text NOT NULL,
        role text NOT NULL CHECK (role IN ('sewist', 'coach', 'admin')),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT users_email_key UNIQUE (email),
        CONSTRAINT users_email_lower CHECK (email = lower(email))
      )`);
    await q.query(`
      CREATE TABLE password_reset_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        token_hash text NOT NULL,
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT password_reset_tokens_token_hash_key UNIQUE (token_hash)
      )`);
    await q.query('CREATE INDEX password_reset_tokens_user_id_idx ON password_reset_tokens (user_id)');
    // The shape connect-pg-simple expects (its table.sql), under our own table name.
    await q.query(`
      CREATE TABLE user_sessions (
        sid varchar NOT NULL PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query('CREATE INDEX user_sessions_expire_idx ON user_sessions (expire)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE user_sessions');
    await q.query('DROP TABLE password_reset_tokens');
    await q.query('DROP TABLE users');
  }
}
