import type { SessionData } from 'express-session';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { SqliteSessionStore } from '../../server/session/sqlite-store';

const TTL = 30 * 60_000;

let db: Database;
let clock: { now: number };
let store: SqliteSessionStore;
beforeEach(() => {
  db = openDatabase(':memory:');
  migrateDatabase(db);
  clock = { now: Date.UTC(2026, 11, 1, 12) };
  store = new SqliteSessionStore(db.$client, TTL, 60_000, () => clock.now, 0);
});
afterEach(() => {
  // Real timers first, so close() clears the store's real interval rather than a fake one.
  vi.useRealTimers();
  store.close();
  db.$client.close();
});

/** A session as express-session hands it to the store: the cookie with an absolute expiry, plus our data. */
function sess(userId: number, expiresAt?: number, maxAge?: number): SessionData {
  return {
    cookie: {
      originalMaxAge: maxAge ?? null,
      ...(expiresAt !== undefined && { expires: new Date(expiresAt) }),
      ...(maxAge !== undefined && { maxAge }),
      httpOnly: true,
      path: '/',
    },
    userId,
  };
}

// Promise wrappers over the callback API the store implements.
const get = (sid: string) =>
  new Promise<SessionData | null | undefined>((resolve, reject) => store.get(sid, (err, value) => (err ? reject(err) : resolve(value))));
const set = (sid: string, data: SessionData) =>
  new Promise<void>((resolve, reject) => store.set(sid, data, (err) => (err ? reject(err) : resolve())));
const touch = (sid: string, data: SessionData) =>
  new Promise<void>((resolve, reject) => store.touch(sid, data, (err) => (err ? reject(err) : resolve())));
const destroy = (sid: string) => new Promise<void>((resolve, reject) => store.destroy(sid, (err) => (err ? reject(err) : resolve())));
const length = () => new Promise<number | undefined>((resolve, reject) => store.length((err, n) => (err ? reject(err) : resolve(n))));
const clear = () => new Promise<void>((resolve, reject) => store.clear((err) => (err ? reject(err) : resolve())));

const expiryRow = (sid: string) =>
  (db.$client.prepare('select expires_at as e from sessions where sid = ?').get(sid) as { e: number } | undefined)?.e;

describe('SqliteSessionStore', () => {
  it('gives back what was set, as JSON would carry it', async () => {
    const data = sess(7, clock.now + TTL);
    await set('sid-a', data);
    expect(await get('sid-a')).toEqual(JSON.parse(JSON.stringify(data)));
    expect((await get('sid-a'))?.userId).toBe(7);
  });

  it('answers null for a session it never had', async () => {
    expect(await get('nobody')).toBeNull();
  });

  it('overwrites the session and its expiry on a second set', async () => {
    await set('sid-a', sess(7, clock.now + 1000));
    await set('sid-a', sess(8, clock.now + 5000));
    expect((await get('sid-a'))?.userId).toBe(8);
    expect(expiryRow('sid-a')).toBe(clock.now + 5000);
    expect(await length()).toBe(1);
  });

  it('stores the cookie’s expiry, or now + maxAge, or now + the default TTL', async () => {
    await set('absolute', sess(1, clock.now + 1234));
    await set('relative', sess(2, undefined, 5000));
    await set('default', sess(3));
    expect(expiryRow('absolute')).toBe(clock.now + 1234);
    expect(expiryRow('relative')).toBe(clock.now + 5000);
    expect(expiryRow('default')).toBe(clock.now + TTL);
  });

  it('answers null once the session has expired, and keeps it until then', async () => {
    await set('sid-a', sess(7, clock.now + 1000));
    clock.now += 999;
    expect((await get('sid-a'))?.userId).toBe(7);
    clock.now += 1;
    expect(await get('sid-a')).toBeNull();
  });

  it('extends the expiry on touch without changing the data', async () => {
    await set('sid-a', sess(7, clock.now + 1000));
    clock.now += 900;
    await touch('sid-a', sess(99, clock.now + 1000));
    expect(expiryRow('sid-a')).toBe(clock.now + 1000);
    clock.now += 500;
    // Past the first expiry, within the extended one.
    expect((await get('sid-a'))?.userId).toBe(7);
  });

  it('writes a touch only when the expiry moves by the set step, so busy sessions cost no write per request', async () => {
    const throttled = new SqliteSessionStore(db.$client, TTL, 60_000, () => clock.now, 60_000);
    const touchThrottled = (sid: string, data: ReturnType<typeof sess>) =>
      new Promise<void>((resolve, reject) => throttled.touch(sid, data, (err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve) => throttled.set('sid-t', sess(7, clock.now + 600_000), () => resolve()));
    const first = expiryRow('sid-t');
    clock.now += 30_000;
    await touchThrottled('sid-t', sess(7, clock.now + 600_000));
    expect(expiryRow('sid-t')).toBe(first);
    clock.now += 31_000;
    await touchThrottled('sid-t', sess(7, clock.now + 600_000));
    expect(expiryRow('sid-t')).toBe(clock.now + 600_000);
    throttled.close();
  });

  it('does not create a session on touch', async () => {
    await touch('ghost', sess(1, clock.now + 1000));
    expect(await get('ghost')).toBeNull();
    expect(await length()).toBe(0);
  });

  it('forgets a destroyed session and leaves the others', async () => {
    await set('sid-a', sess(1, clock.now + 1000));
    await set('sid-b', sess(2, clock.now + 1000));
    await destroy('sid-a');
    expect(await get('sid-a')).toBeNull();
    expect((await get('sid-b'))?.userId).toBe(2);
    await expect(destroy('never-there')).resolves.toBeUndefined();
  });

  it('counts only live sessions in length', async () => {
    expect(await length()).toBe(0);
    await set('short', sess(1, clock.now + 1000));
    await set('long', sess(2, clock.now + 5000));
    expect(await length()).toBe(2);
    clock.now += 1000;
    expect(await length()).toBe(1);
  });

  it('clears every session', async () => {
    await set('sid-a', sess(1, clock.now + 1000));
    await set('sid-b', sess(2, clock.now + 1000));
    await clear();
    expect(await length()).toBe(0);
  });

  it('sweeps only the expired rows and says how many', async () => {
    await set('gone-1', sess(1, clock.now + 1000));
    await set('gone-2', sess(2, clock.now + 2000));
    await set('kept', sess(3, clock.now + 2001));
    clock.now += 2000;
    expect(store.sweep()).toBe(2);
    const sids = (db.$client.prepare('select sid from sessions').all() as { sid: string }[]).map((r) => r.sid);
    expect(sids).toEqual(['kept']);
    expect(store.sweep()).toBe(0);
  });

  it('passes database errors to the callback instead of throwing', async () => {
    db.$client.exec('drop table sessions');
    await expect(get('sid-a')).rejects.toThrow();
    await expect(set('sid-a', sess(1))).rejects.toThrow();
    await expect(touch('sid-a', sess(1))).rejects.toThrow();
    await expect(destroy('sid-a')).rejects.toThrow();
    await expect(length()).rejects.toThrow();
    await expect(clear()).rejects.toThrow();
  });
});

describe('SqliteSessionStore sweep timer', () => {
  it('sweeps on its interval until close() clears the timer', async () => {
    vi.useFakeTimers();
    const timed = new SqliteSessionStore(db.$client, TTL, 1000, () => clock.now);
    const sweep = vi.spyOn(timed, 'sweep');
    await new Promise<void>((resolve) => timed.set('old', sess(1, clock.now + 10), () => resolve()));
    clock.now += 10;
    vi.advanceTimersByTime(1000);
    expect(sweep).toHaveBeenCalledTimes(1);
    expect(sweep).toHaveLastReturnedWith(1);
    vi.advanceTimersByTime(2000);
    expect(sweep).toHaveBeenCalledTimes(3);
    timed.close();
    vi.advanceTimersByTime(10_000);
    expect(sweep).toHaveBeenCalledTimes(3);
  });

  it('close() leaves no timer behind', () => {
    vi.useFakeTimers();
    const before = vi.getTimerCount();
    const timed = new SqliteSessionStore(db.$client, TTL, 1000, () => clock.now);
    expect(vi.getTimerCount()).toBe(before + 1);
    timed.close();
    expect(vi.getTimerCount()).toBe(before);
  });

  it('does not keep the process alive: its timer is unref’d', () => {
    const setIntervalSpy = vi.spyOn(globalThis, 'setInterval');
    const timed = new SqliteSessionStore(db.$client, TTL, 1000, () => clock.now);
    try {
      expect(setIntervalSpy).toHaveBeenCalledTimes(1);
      const timer = setIntervalSpy.mock.results[0]!.value as NodeJS.Timeout;
      expect(timer.hasRef()).toBe(false);
    } finally {
      timed.close();
      setIntervalSpy.mockRestore();
    }
  });
});
