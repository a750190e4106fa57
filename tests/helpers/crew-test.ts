import { test } from 'vitest';
import { buildTestApp } from './test-app';

/**
 * `it` with the usual server-test setup as fixtures, each built only when a test (or a
 * `crewTest.beforeEach`) names it:
 * - `t`: a fresh test app on its own in-memory database, closed after the test;
 * - `clock`: that app's clock (move `clock.now` to move the app's time);
 * - `crew`: one person per role (TestApp.addCrew);
 * - `lead`, `qm`, `member`: those people, signed in;
 * - `otherMember`: a second member, Ines Other (ines@example.org), added after the crew and signed in.
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
  .extend('otherMember', async ({ t, crew: _crew }) => {
    const ines = await t.addUser({ email: 'ines@example.org', name: 'Ines Other', role: 'member' });
    return t.signIn(ines.email);
  });

/**
 * `crewTest` for tests that use the crew's accounts by address with nobody signed in (sign-in, password
 * reset, response contracts): the crew is added before every test, named or not.
 */
export const accountsTest = crewTest.extend('accounts', { auto: true }, ({ crew }) => crew);
