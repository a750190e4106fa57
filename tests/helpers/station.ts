import request from 'supertest';
import { STATION_TOKEN_HEADER } from '@shared/schemas/stations';
import { replaceBadge } from '../../server/accounts/badges.repo';
import { hashLinkToken, newLinkToken } from '../../server/accounts/link-tokens';
import { hashPassword } from '../../server/accounts/passwords';
import { setPinHash } from '../../server/accounts/users.repo';
import { post } from './crib';
import { crewTest } from './crew-test';
import type { SignedInAgent, TestApp } from './test-app';

/** Gives a person a badge and (unless `pin` is null) a PIN, straight through the accounts repositories. */
export async function issueBadge(t: TestApp, userId: number, issuedById: number, pin: string | null = '4827'): Promise<string> {
  const badge = newLinkToken();
  replaceBadge(t.db, { userId, tokenHash: hashLinkToken(badge), issuedById, at: t.clock.now });
  if (pin !== null) setPinHash(t.db, userId, await hashPassword(pin));
  return badge;
}

/** Enrols a station as `who` (quartermaster or lead) over the API. */
export async function enrolStation(who: SignedInAgent, name: string): Promise<{ id: number; name: string; stationToken: string }> {
  const res = await post(who, '/api/stations', { name });
  if (res.status !== 201) throw new Error(`could not enrol: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; name: string; stationToken: string };
}

/** A browser at a station: every request carries the station's token (and the CSRF token it holds). */
export interface StationBrowser {
  agent: ReturnType<typeof request.agent>;
  csrf: string;
  get(path: string): request.Test;
  post(path: string, body?: unknown): request.Test;
  del(path: string): request.Test;
  signIn(badge: string, pin: string): Promise<request.Response>;
  /** Opens a replay session for the badge (no PIN), as the station does once it is back online. */
  replaySignIn(badge: string): Promise<request.Response>;
}

export function stationBrowser(t: TestApp, stationToken: string): StationBrowser {
  const agent = request.agent(t.app);
  const browser: StationBrowser = {
    agent,
    csrf: '',
    get: (path) => agent.get(path).set(STATION_TOKEN_HEADER, stationToken),
    post: (path, body = {}) => agent.post(path).set(STATION_TOKEN_HEADER, stationToken).set('X-CSRF-Token', browser.csrf).send(body as object),
    del: (path) => agent.delete(path).set(STATION_TOKEN_HEADER, stationToken).set('X-CSRF-Token', browser.csrf),
    async signIn(badge, pin) {
      browser.csrf = ((await browser.get('/api/auth/csrf')).body as { token: string }).token;
      const res = await browser.post('/api/station/sign-in', { badge, pin });
      if (res.status === 200) browser.csrf = ((await browser.get('/api/auth/csrf')).body as { token: string }).token;
      return res;
    },
    async replaySignIn(badge) {
      browser.csrf = ((await browser.get('/api/auth/csrf')).body as { token: string }).token;
      const res = await browser.post('/api/station/replay-sign-in', { badge });
      if (res.status === 200) browser.csrf = res.headers['x-csrf-token'] as string;
      return res;
    },
  };
  return browser;
}

/**
 * The crew fixture with a station: `advance(ms)` moves the app clock on, and `door` is a station named
 * Crib door, enrolled by the quartermaster, with the member's badge (PIN 4827) and a browser for it.
 */
export const stationTest = crewTest
  .extend('advance', ({ clock }) => (ms: number) => {
    clock.now = new Date(clock.now.getTime() + ms);
  })
  .extend('door', async ({ t, qm, crew }) => {
    const station = await enrolStation(qm, 'Crib door');
    const badge = await issueBadge(t, crew.member.id, crew.quartermaster.id);
    return { station, badge, browser: stationBrowser(t, station.stationToken) };
  });
