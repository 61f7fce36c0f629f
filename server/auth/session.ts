import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { RequestHandler } from 'express';
import { config } from '../core/config';

const MySQLStore = MySQLStoreFactory(session as never);

export type SessionStore = InstanceType<typeof MySQLStore>;

/** Sessions live in MariaDB so a restart or a second instance signs nobody out. */
export function createSessionStore(): SessionStore {
  const c = config();
  return new MySQLStore({
    host: c.DB_HOST,
    port: c.DB_PORT,
    user: c.DB_USER,
    password: c.DB_PASSWORD,
    database: c.DB_NAME,
    createDatabaseTable: false,
    expiration: c.SESSION_MAX_AGE_HOURS * 3600_000,
    // Our own sweep (auth-maintenance.ts) catches its errors; the store's would reject unhandled.
    clearExpired: false,
  });
}

export function sessionMiddleware(store: SessionStore): RequestHandler {
  const c = config();
  return session({
    name: 'asepta.sid',
    secret: c.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: c.TRUST_PROXY,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      // Secure only over HTTPS; 'auto' reads req.secure, which honours trust proxy.
      secure: 'auto',
      maxAge: c.SESSION_MAX_AGE_HOURS * 3600_000,
    },
  });
}
