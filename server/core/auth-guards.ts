import type { RequestHandler } from 'express';
import type { Role } from '../../shared/enums';
import { forbidden, unauthenticated } from './errors';

export interface SessionUser {
  id: number;
  username: string;
  displayName: string;
  email: string | null;
  role: Role;
  mustChangePassword: boolean;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express declares its User type in this global namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- declaration merging needs an interface, not a type alias
    interface User extends SessionUser {}
  }
}

export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthenticated());
};

export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    next(roles.includes(req.user.role) ? undefined : forbidden());
  };
}

/** The signed-in user; only call behind requireUser/requireRole. */
export function currentUser(req: Express.Request): SessionUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}
