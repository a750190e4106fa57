import session from 'express-session';
import type { AppConfig } from '../config';
import { SqliteSessionStore } from '../session/sqlite-store';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
    /** Set for a station session: the station it was opened at, and its last request (epoch ms). */
    stationId?: number;
    stationActiveAt?: number;
    /**
     * A replay session (POST /api/station/replay-sign-in): opened with the station token and a badge,
     * no PIN, to send what the station queued offline; it may make only the queued actions.
     */
    stationReplay?: boolean;
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
