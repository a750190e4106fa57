import { test } from 'vitest';
import type { ServiceContext } from '../../server/context';
import type { PaymentsApp, PaymentsAppOptions } from './payments-app';
import { buildTestApp } from './test-app';

/**
 * `it` with the usual server-test setup as fixtures, each built only when a test (or a
 * `crewTest.beforeEach`) names it:
 * - `t`: a fresh test app on its own in-memory database, closed after the test;
 * - `clock`: that app's clock (move `clock.now` to move the app's time);
 * - `crew`: one person per role (TestApp.addCrew);
 * - `lead`, `qm`, `member`: those people, signed in;
 * - `ctx`: the context the server gives a job or service (the app's database, public URL and clock; mail goes
 *   to the outbox);
 * - `otherMember`: a second member, added after the crew and signed in: `otherMemberPerson`, Ines Other
 *   (ines@example.org) unless a file overrides it (`crewTest.override('otherMemberPerson', { … })`).
 *
 * `crewTest('…', async ({ qm, member }) => …)` gets an app, its crew and two signed-in agents.
 */
export const crewTest = test
  .extend('t', async ({}, { onCleanup }) => {
    const t = await buildTestApp();
    onCleanup(() => t.close());
    return t;
  })
  .extend('clock', ({ t }) => t.clock)
  .extend('crew', ({ t }) => t.addCrew())
  .extend('lead', async ({ t, crew }) => t.signIn(crew.lead.email))
  .extend('qm', async ({ t, crew }) => t.signIn(crew.quartermaster.email))
  .extend('member', async ({ t, crew }) => t.signIn(crew.member.email))
  .extend('ctx', ({ t }): ServiceContext => ({ db: t.db, publicUrl: 'http://gripline.test', now: () => t.clock.now }))
  .extend('otherMemberPerson', { email: 'ines@example.org', name: 'Ines Other' })
  .extend('otherMember', async ({ t, crew: _crew, otherMemberPerson }) => {
    const person = await t.addUser({ ...otherMemberPerson, role: 'member' });
    return t.signIn(person.email);
  });

/**
 * `crewTest` for tests that use the crew's accounts by address with nobody signed in (sign-in, password
 * reset, response contracts): the crew is added before every test, named or not.
 */
export const accountsTest = crewTest.extend('accounts', { auto: true }, ({ crew }) => crew);

/**
 * `crewTest` with `payments`, the payments app (a listening test app with the local fake provider, see
 * payments-app.ts), closed after the test, started with `paymentsOptions` (none by default; a test that
 * needs others runs on `paymentsTest.extend('paymentsOptions', { webhooksLost: true })`). A file using it
 * makes that app the crew's: `paymentsTest.override('t', ({ payments }) => payments.t)`.
 */
export const paymentsTest = crewTest.extend('paymentsOptions', {} as PaymentsAppOptions).extend('payments', async ({ paymentsOptions }, { onCleanup }): Promise<PaymentsApp> => {
  const { startPaymentsApp } = await import('./payments-app');
  const payments = await startPaymentsApp(paymentsOptions);
  onCleanup(() => payments.close());
  return payments;
});
