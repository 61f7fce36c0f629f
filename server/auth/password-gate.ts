import type { RequestHandler } from 'express';
import { AppError } from '../core/errors';

// What a person with a reset password may still do: see who they are, change it, or sign out.
const open = new Set(['GET /auth/me', 'GET /auth/csrf', 'POST /auth/password', 'POST /auth/logout']);

/** After an admin's reset, every other route answers 403 until the person sets their own password. */
export const passwordGate: RequestHandler = (req, _res, next) => {
  if (!req.user?.mustChangePassword || open.has(`${req.method} ${req.path}`)) return next();
  next(
    new AppError(
      403,
      'password-change-required',
      'Your password was reset by an administrator: set a new password before going on.',
    ),
  );
};
