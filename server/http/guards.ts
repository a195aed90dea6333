import type { Request, RequestHandler } from 'express';
import { forbidden, unauthenticated } from '../errors/app-error.ts';
import type { Role } from '../modules/users/user.entity.ts';

/** 401 unless signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthenticated());
};

/** 401 unless signed in, 403 unless the account has one of the roles. */
export const requireRole =
  (...roles: Role[]): RequestHandler =>
  (req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    next(roles.includes(req.user.role) ? undefined : forbidden());
  };

/** The signed-in user, for handlers behind `requireUser`. */
export function currentUser(req: Request): Express.User {
  if (!req.user) throw unauthenticated();
  return req.user;
}
