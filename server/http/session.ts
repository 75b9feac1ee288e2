import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Pool } from 'mysql2/promise';
import type { Config } from '../config';

declare module 'express-session' {
  interface SessionData {
    userId: string;
    /** When the user signed in (ms); sessions older than a password change are void. */
    authAt: number;
  }
}

export const SESSION_COOKIE = 'seedwake.sid';

/** Sessions live in MariaDB (the sessions table from our migrations), so restarts keep them. */
export function sessionMiddleware(config: Config, pool: Pool, secret: string) {
  const MySQLStore = MySQLStoreFactory(session as never);
  const store = new MySQLStore(
    {
      createDatabaseTable: false,
      clearExpired: true,
      checkExpirationInterval: 15 * 60_000,
      endConnectionOnClose: false,
    },
    pool as never,
  );
  const middleware = session({
    name: SESSION_COOKIE,
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: config.trustProxy,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.cookieSecure, maxAge: 14 * 24 * 3600_000 },
  });
  return { middleware, store };
}
