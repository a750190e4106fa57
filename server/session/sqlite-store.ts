import type BetterSqlite3 from 'better-sqlite3';
import session from 'express-session';

type Callback<T = void> = (err?: unknown, value?: T) => void;

/**
 * An express-session store on the app's own SQLite database. No well-kept store package uses
 * better-sqlite3, so this is ours: get/set/destroy/touch with prepared statements and an
 * unref'd sweep that deletes expired rows without keeping the process alive.
 */
export class SqliteSessionStore extends session.Store {
  private readonly statements;
  private readonly sweepTimer: NodeJS.Timeout;
  /** The expiry last written per session id, so touch can skip writes that change little. */
  private readonly touchedAt = new Map<string, number>();

  constructor(
    sqlite: BetterSqlite3.Database,
    private readonly defaultTtlMs: number,
    sweepEveryMs = 15 * 60 * 1000,
    private readonly now: () => number = Date.now,
    private readonly touchEveryMs = 60_000,
  ) {
    super();
    this.statements = {
      get: sqlite.prepare<[string, number], { sess: string }>(
        'select sess from sessions where sid = ? and expires_at > ?',
      ),
      set: sqlite.prepare<[string, string, number]>(
        'insert into sessions (sid, sess, expires_at) values (?, ?, ?) ' +
          'on conflict(sid) do update set sess = excluded.sess, expires_at = excluded.expires_at',
      ),
      touch: sqlite.prepare<[number, string]>('update sessions set expires_at = ? where sid = ?'),
      destroy: sqlite.prepare<[string]>('delete from sessions where sid = ?'),
      sweep: sqlite.prepare<[number]>('delete from sessions where expires_at <= ?'),
      clear: sqlite.prepare('delete from sessions'),
      length: sqlite.prepare<[number], { n: number }>('select count(*) as n from sessions where expires_at > ?'),
    };
    this.sweepTimer = setInterval(() => this.sweep(), sweepEveryMs);
    this.sweepTimer.unref();
  }

  private expiryOf(sess: session.SessionData): number {
    const expires = sess.cookie?.expires;
    if (expires) return new Date(expires).getTime();
    return this.now() + (sess.cookie?.maxAge ?? this.defaultTtlMs);
  }

  get(sid: string, cb: Callback<session.SessionData | null>): void {
    try {
      const row = this.statements.get.get(sid, this.now());
      cb(null, row ? (JSON.parse(row.sess) as session.SessionData) : null);
    } catch (err) {
      cb(err);
    }
  }

  set(sid: string, sess: session.SessionData, cb?: Callback): void {
    try {
      const expiry = this.expiryOf(sess);
      this.statements.set.run(sid, JSON.stringify(sess), expiry);
      this.touchedAt.set(sid, expiry);
      cb?.();
    } catch (err) {
      cb?.(err);
    }
  }

  /**
   * Extends a session's life. Every request touches its session; writing the row each time would
   * cost a write per scan, so the expiry is written only when it moves by more than touchEveryMs.
   */
  touch(sid: string, sess: session.SessionData, cb?: Callback): void {
    try {
      const expiry = this.expiryOf(sess);
      const written = this.touchedAt.get(sid);
      if (written === undefined || expiry - written >= this.touchEveryMs) {
        this.statements.touch.run(expiry, sid);
        this.touchedAt.set(sid, expiry);
      }
      cb?.();
    } catch (err) {
      cb?.(err);
    }
  }

  destroy(sid: string, cb?: Callback): void {
    try {
      this.touchedAt.delete(sid);
      this.statements.destroy.run(sid);
      cb?.();
    } catch (err) {
      cb?.(err);
    }
  }

  clear(cb?: Callback): void {
    try {
      this.touchedAt.clear();
      this.statements.clear.run();
      cb?.();
    } catch (err) {
      cb?.(err);
    }
  }

  length(cb: Callback<number>): void {
    try {
      cb(null, this.statements.length.get(this.now())?.n ?? 0);
    } catch (err) {
      cb(err);
    }
  }

  /** Deletes expired sessions; returns how many. */
  sweep(): number {
    const now = this.now();
    for (const [sid, expiry] of this.touchedAt) if (expiry <= now) this.touchedAt.delete(sid);
    return this.statements.sweep.run(now).changes;
  }

  close(): void {
    clearInterval(this.sweepTimer);
  }
}
