import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { AppError, notFound } from '../../errors/app-error.ts';
import { UserEntity, type Role, type Units } from './user.entity.ts';

/** bcrypt cost; 12 is ≈ 0.2 s per hash here (OWASP asks for at least 10). */
export const BCRYPT_COST = 12;

export class UsersService {
  constructor(private readonly db: DataSource) {}

  private get repo() {
    return this.db.getRepository(UserEntity);
  }

  findById(id: string): Promise<UserEntity | null> {
    return this.repo.findOneBy({ id });
  }

  findByEmail(email: string): Promise<UserEntity | null> {
    return this.repo.findOneBy({ email: email.toLowerCase() });
  }

  list(): Promise<UserEntity[]> {
    return this.repo.find({ order: { createdAt: 'ASC', email: 'ASC' } });
  }

  count(): Promise<number> {
    return this.repo.count();
  }

  async create(input: { email: string; displayName: string; password: string; role?: Role }): Promise<UserEntity> {
    const email = input.email.toLowerCase();
    if (await this.findByEmail(email))
      throw new AppError('email_taken', 'An account with this e-mail address exists already.', 409, {
        email: 'This e-mail address is taken.',
      });
    const passwordHash = await bcrypt.hash(input.password, BCRYPT_COST);
    try {
      return await this.repo.save(
        this.repo.create({ email, displayName: input.displayName, passwordHash, role: input.role ?? 'sewist' }),
      );
    } catch (err) {
      if ((err as { code?: string }).code === '23505')
        throw new AppError('email_taken', 'An account with this e-mail address exists already.', 409, {
          email: 'This e-mail address is taken.',
        });
      throw err;
    }
  }

  /** The user when the password matches, else null. Always runs one bcrypt compare, to keep timing flat. */
  async verify(email: string, password: string): Promise<UserEntity | null> {
    const user = await this.findByEmail(email);
    const ok = await bcrypt.compare(password, user?.passwordHash ?? (await dummyHash()));
    return user && ok ? user : null;
  }

  async checkPassword(user: UserEntity, password: string): Promise<boolean> {
    return bcrypt.compare(password, user.passwordHash);
  }

  async setPassword(userId: string, password: string): Promise<void> {
    const passwordHash = await bcrypt.hash(password, BCRYPT_COST);
    await this.repo.update({ id: userId }, { passwordHash });
  }

  async updateSettings(userId: string, changes: { displayName?: string; units?: Units }): Promise<UserEntity> {
    if (changes.displayName !== undefined || changes.units !== undefined) await this.repo.update({ id: userId }, changes);
    const user = await this.findById(userId);
    if (!user) throw notFound('The account');
    return user;
  }

  /** Change a global role; the last admin cannot be demoted, so the service always has one. */
  async setRole(userId: string, role: Role): Promise<UserEntity> {
    return this.db.transaction(async (tx) => {
      const repo = tx.getRepository(UserEntity);
      const user = await repo.findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw notFound('The account');
      if (user.role === 'admin' && role !== 'admin') {
        const admins = await repo.find({ where: { role: 'admin' }, select: { id: true }, lock: { mode: 'pessimistic_write' } });
        if (admins.length <= 1) throw new AppError('last_admin', 'This is the last admin account: make another admin first.', 409);
      }
      user.role = role;
      return repo.save(user);
    });
  }
}

/** A hash of a random string at the same cost, compared against when the e-mail is unknown. */
let dummy: Promise<string> | undefined;
const dummyHash = () => (dummy ??= bcrypt.hash(randomUUID(), BCRYPT_COST));
