import { test } from 'vitest';
import { buildTestApp, type Crew, type SignedInAgent, type TestApp } from './test-app';

export interface CrewFixtures {
  /** A fresh test app on its own in-memory database, closed after the test. */
  t: TestApp;
  /** The test app's clock; move `clock.now` to move the app's time. */
  clock: TestApp['clock'];
  /** One person per role (see TestApp.addCrew). */
  crew: Crew;
  /** The crew's lead, signed in. */
  lead: SignedInAgent;
  /** The crew's quartermaster, signed in. */
  qm: SignedInAgent;
  /** The crew's member, signed in. */
  member: SignedInAgent;
}

/**
 * `it` with the usual server-test setup as fixtures. Each is built only when a test names it:
 * `crewTest('…', async ({ qm, member }) => …)` gets a fresh app, its crew and two signed-in agents.
 */
export const crewTest = test.extend<CrewFixtures>({
  t: async ({}, use) => {
    const t = await buildTestApp();
    await use(t);
    await t.close();
  },
  clock: async ({ t }, use) => use(t.clock),
  crew: async ({ t }, use) => use(await t.addCrew()),
  lead: async ({ t, crew }, use) => use(await t.signIn(crew.lead.email)),
  qm: async ({ t, crew }, use) => use(await t.signIn(crew.quartermaster.email)),
  member: async ({ t, crew }, use) => use(await t.signIn(crew.member.email)),
});
