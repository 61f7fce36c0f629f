import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { config } from '../core/config';
import { AppError } from '../core/errors';

/**
 * Tokens bound to a random cookie and signed with the session secret, so that fetching one stores
 * nothing: anonymous traffic cannot fill the sessions table. Once signed in, the token is bound to
 * the session id as well, so sign-in and sign-out (which regenerate the session) void old tokens.
 */
const cookieName = 'asepta.csrf';
const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

const csrfInvalid = () => new AppError(403, 'csrf-invalid', 'The form expired: reload the page and try again.');

function cookieValue(req: Request): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const [name, ...rest] = part.trim().split('=');
    if (name === cookieName) return rest.join('=');
  }
  return undefined;
}

function binding(req: Request): string {
  const signedIn = (req.session as { passport?: { user?: unknown } } | undefined)?.passport?.user != null;
  return signedIn ? `session:${req.sessionID}` : 'anonymous';
}

const sign = (nonce: string, req: Request) =>
  createHmac('sha256', config().SESSION_SECRET)
    .update(`${nonce}|${binding(req)}`)
    .digest('base64url');

/** The token for this browser; sets the nonce cookie on its first visit. */
export function generateToken(req: Request, res: Response): string {
  let nonce = cookieValue(req);
  if (!nonce || !/^[A-Za-z0-9_-]{32}$/.test(nonce)) {
    nonce = randomBytes(24).toString('base64url');
    res.cookie(cookieName, nonce, { httpOnly: true, sameSite: 'lax', secure: req.secure, path: '/' });
  }
  return sign(nonce, req);
}

export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method)) return next();
  const nonce = cookieValue(req);
  const given = Buffer.from(req.get('x-csrf-token') ?? '');
  if (!nonce) return next(csrfInvalid());
  const expected = Buffer.from(sign(nonce, req));
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return next(csrfInvalid());
  next();
};
