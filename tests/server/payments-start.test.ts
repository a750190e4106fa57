import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readEnv } from '../../server/env';
import { startGripline } from '../../server/main';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signIn, type Member } from '../helpers/http-sign-in';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'gripline-payments-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const asMember = (who: Member, method: string, body?: object): RequestInit => ({
  method,
  headers: { cookie: who.cookie, 'x-csrf-token': who.csrf, 'content-type': 'application/json' },
  body: body && JSON.stringify(body),
});

describe('Gripline started without a payment key', () => {
  it('starts its own fake provider: a demo member settles the tab on its page, and the fake stops with the app', async () => {
    const running = await startGripline(readEnv({ DATABASE_PATH: join(dir, 'demo.db'), PORT: '0', HOST: '127.0.0.1', LOG_LEVEL: 'silent' }));
    let payPage = '';
    try {
      const member = await signIn(running.url, 'member@example.org', DEMO_PASSWORD);
      const balance = async () => ((await (await fetch(`${running.url}/api/stock/tab`, asMember(member, 'GET'))).json()) as { balanceCents: number }).balanceCents;
      const owed = await balance();
      expect(owed).toBeGreaterThanOrEqual(50);

      const res = await fetch(`${running.url}/api/payments/checkout`, asMember(member, 'POST', {}));
      expect(res.status).toBe(201);
      payPage = ((await res.json()) as { url: string }).url;
      expect(payPage).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_\w+$/);
      const shown = await (await fetch(payPage)).text();
      expect(shown).toContain('to the chapter');

      const paid = await fetch(payPage, { method: 'POST', body: new URLSearchParams({ choice: 'pay' }), redirect: 'manual' });
      expect(paid.headers.get('location')).toBe(`${running.url}/tab?payment=paid`);
      expect(await balance()).toBe(0);
    } finally {
      await running.close();
    }
    await expect(fetch(payPage)).rejects.toThrow();
  });

  it('refuses a real key without its webhook secret, naming the setting', () => {
    expect(() => readEnv({ PAYMENTS_SECRET_KEY: 'sk_live_x' })).toThrow(/PAYMENTS_WEBHOOK_SECRET: not set/);
    expect(readEnv({ PAYMENTS_SECRET_KEY: 'sk_live_x', PAYMENTS_WEBHOOK_SECRET: 'whsec_x' }).PAYMENTS_SECRET_KEY).toBe('sk_live_x');
  });
});
