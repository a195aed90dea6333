import { createHash, randomBytes } from 'node:crypto';
import { IsNull, MoreThan, type DataSource } from 'typeorm';
import { AppError } from '../../errors/app-error.ts';
import type { Mailer } from '../mail/mailer.ts';
import type { UsersService } from '../users/users.service.ts';
import { PasswordResetTokenEntity } from './password-reset-token.entity.ts';
import { endSessionsOf } from './sessions.ts';

/** How long a reset link works (OWASP forgot-password guidance: short-lived, single use). */
export const RESET_TOKEN_TTL_MS = 60 * 60 * 1000;

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export class PasswordResetService {
  constructor(
    private readonly db: DataSource,
    private readonly users: UsersService,
    private readonly mailer: Mailer,
    private readonly publicUrl: string,
  ) {}

  /** Mail a one-time link when the account exists; says nothing either way to the caller. */
  async request(email: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user) return;
    const token = randomBytes(32).toString('base64url');
    await this.db.getRepository(PasswordResetTokenEntity).save({
      userId: user.id,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MS),
      usedAt: null,
    });
    const link = `${this.publicUrl}/reset-password?token=${token}`;
    await this.mailer.send({
      to: user.email,
      subject: 'Reset your Blockwright password',
      text: [
        `Hello ${user.displayName},`,
        '',
        'Someone (we hope you) asked to reset the password of your Blockwright account.',
        `Open this link within an hour to choose a new one:`,
        link,
        '',
        'If it was not you, ignore this message: your password stays as it is.',
      ].join('\n'),
    });
  }

  /** Set a new password from a valid, unused, unexpired token, and end every session of that account. */
  async confirm(token: string, password: string): Promise<void> {
    const userId = await this.db.transaction(async (tx) => {
      const repo = tx.getRepository(PasswordResetTokenEntity);
      const row = await repo.findOne({
        where: { tokenHash: hashToken(token), usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
        lock: { mode: 'pessimistic_write' },
      });
      if (!row)
        throw new AppError('invalid_token', 'This reset link is not valid any more: ask for a new one.', 400, {
          token: 'The link has expired or was used already.',
        });
      await repo.update({ userId: row.userId, usedAt: IsNull() }, { usedAt: new Date() });
      return row.userId;
    });
    await this.users.setPassword(userId, password);
    await endSessionsOf(this.db, userId);
  }
}
