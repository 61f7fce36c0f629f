import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { loadSessionUser, verifyLogin } from './auth.service';

passport.use(
  new LocalStrategy({ passReqToCallback: true }, (req, username, password, done) => {
    verifyLogin(username, password, req.ip ?? 'unknown').then(
      (user) => done(null, user),
      (err: unknown) => done(err),
    );
  }),
);

passport.serializeUser<number>((user, done) => done(null, user.id));

// A deactivated account loses its sessions at the next request.
passport.deserializeUser<number>((id, done) => {
  loadSessionUser(id).then(
    (user) => done(null, user ?? false),
    (err: unknown) => done(err),
  );
});

export { passport };
