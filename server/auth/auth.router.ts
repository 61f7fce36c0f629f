import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import { changePasswordSchema, loginSchema } from '../../shared/schemas/auth';
import { currentUser, requireUser, type SessionUser } from '../core/auth-guards';
import { validate, validated } from '../core/validate';
import { changePassword } from './auth.service';
import { generateToken } from './csrf';
import { passport } from './passport';

export const authRouter = Router();

authRouter.get('/csrf', (req, res) => {
  res.json({ token: generateToken(req, res) });
});

authRouter.post('/login', validate({ body: loginSchema }), (req: Request, res: Response, next: NextFunction) => {
  // @types/passport types the middleware it makes as any.
  const authenticate = passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) => {
    if (err) return next(err);
    if (!user) return next(new Error('local strategy returned no user'));
    // passport regenerates the session here, so a token fetched before sign-in is void.
    req.login(user, (loginErr) => (loginErr ? next(loginErr) : res.json(user)));
  }) as RequestHandler;
  void authenticate(req, res, next);
});

authRouter.post('/logout', (req, res, next) => {
  req.logout((err) => {
    if (err) return next(err);
    res.status(204).end();
  });
});

authRouter.get('/me', requireUser, (req, res) => {
  res.json(currentUser(req));
});

authRouter.post('/password', requireUser, validate({ body: changePasswordSchema }), async (req, res) => {
  await changePassword(currentUser(req), validated(req, changePasswordSchema), {
    address: req.ip ?? 'unknown',
    sessionId: req.sessionID,
  });
  res.status(204).end();
});
