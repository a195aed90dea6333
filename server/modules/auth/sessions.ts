import type { DataSource } from 'typeorm';

/** End the stored sessions of an account, all but `keepSid` when given (passport keeps the id at sess.passport.user). */
export async function endSessionsOf(db: DataSource, userId: string, keepSid?: string): Promise<void> {
  await db.query(
    `DELETE FROM user_sessions WHERE sess -> 'passport' ->> 'user' = $1 AND ($2::text IS NULL OR sid <> $2)`,
    [userId, keepSid ?? null],
  );
}
