import session from 'express-session';
import type { AppConfig } from '../config';
import { SqliteSessionStore } from '../session/sqlite-store';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
    /** Set for a station session: the station it was opened at, and its last request (epoch ms). */
    stationId?: number;
    stationActiveAt?: number;
  }
}

export const SESSION_COOKIE = 'gripline.sid';

/** Cookie sessions in the app's own database; the cookie's life is renewed on every request (idle expiry). */
export function sessionMiddleware(config: AppConfig) {
  const store = new SqliteSessionStore(config.db.$client, config.sessionIdleMs);
  const middleware = session({
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.secureCookies,
      path: '/',
      maxAge: config.sessionIdleMs,
    },
  });
  return { middleware, store };
}
