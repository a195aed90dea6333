import type { Role, Units } from '../modules/users/user.entity.ts';

declare global {
  namespace Express {
    /** What passport puts on `req.user`: the signed-in account, loaded fresh per request. */
    interface User {
      id: string;
      email: string;
      displayName: string;
      role: Role;
      units: Units;
      createdAt: Date;
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export {};
