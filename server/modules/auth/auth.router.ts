import { Router, type NextFunction, type Request, type Response } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import type passport from 'passport';
import { AppError } from '../../errors/app-error.ts';
import { csrf } from '../../http/csrf.ts';
import { requireUser, currentUser } from '../../http/guards.ts';
import { parseInput } from '../../http/parse.ts';
import type { UsersService } from '../users/users.service.ts';
import { toUserDto } from '../users/users.mapper.ts';
import type { PasswordResetService } from './password-reset.service.ts';
import { resetConfirmSchema, resetRequestSchema, signInSchema, signUpSchema } from './auth.schemas.ts';

export interface AuthRouterDeps {
  users: UsersService;
  passport: passport.Authenticator;
  passwordReset: PasswordResetService;
  /** Failed sign-ins allowed per address and e-mail in `attemptWindowMs`. */
  signInAttempts: number;
  attemptWindowMs?: number;
}

const tooMany = () =>
  new AppError('too_many_attempts', 'Too many attempts: wait a few minutes and try again.', 429);

function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

function logOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
}

/** Run the local strategy; resolves with the user or false. */
function authenticateLocal(p: passport.Authenticator, req: Request, res: Response, next: NextFunction) {
  return new Promise<Express.User | false>((resolve, reject) => {
    p.authenticate('local', { session: false }, (err: unknown, user: Express.User | false) =>
      err ? reject(err) : resolve(user),
    )(req, res, next);
  });
}

export function authRouter(deps: AuthRouterDeps): Router {
  const router = Router();
  const windowMs = deps.attemptWindowMs ?? 15 * 60 * 1000;
  const signInLimiter = rateLimit({
    windowMs,
    limit: deps.signInAttempts,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // The body is not parsed yet: only a string e-mail joins the key (an object's own toString may throw).
    keyGenerator: (req) => {
      const email: unknown = req.body?.email;
      return `${ipKeyGenerator(req.ip ?? '')}|${typeof email === 'string' ? email.toLowerCase() : ''}`;
    },
    handler: (_req, _res, next) => next(tooMany()),
  });
  const resetLimiter = rateLimit({
    windowMs,
    limit: 5,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
    handler: (_req, _res, next) => next(tooMany()),
  });

  router.get('/csrf', (req, res) => {
    res.json({ csrfToken: csrf.generateToken(req) });
  });

  router.get('/me', requireUser, (req, res) => {
    res.json({ user: toUserDto(currentUser(req)) });
  });

  router.post('/sign-up', async (req, res) => {
    const input = parseInput(signUpSchema, req.body, 'sign-up');
    const user = await deps.users.create(input);
    await logIn(req, user);
    res.status(201).json({ user: toUserDto(user) });
  });

  router.post('/sign-in', signInLimiter, async (req, res, next) => {
    // passport-local reads req.body: hand it the normalised input (trimmed, lower-cased e-mail).
    req.body = parseInput(signInSchema, req.body, 'sign-in');
    const user = await authenticateLocal(deps.passport, req, res, next);
    if (!user) throw new AppError('invalid_credentials', 'The e-mail address or password is not right.', 401);
    await logIn(req, user);
    res.json({ user: toUserDto(user) });
  });

  router.post('/sign-out', async (req, res) => {
    await logOut(req);
    res.status(204).end();
  });

  router.post('/password-reset', resetLimiter, async (req, res) => {
    const { email } = parseInput(resetRequestSchema, req.body, 'reset request');
    await deps.passwordReset.request(email);
    res.status(202).json({ ok: true });
  });

  router.post('/password-reset/confirm', async (req, res) => {
    const { token, password } = parseInput(resetConfirmSchema, req.body, 'new password');
    await deps.passwordReset.confirm(token, password);
    res.status(204).end();
  });

  return router;
}
