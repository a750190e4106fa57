import { desc } from 'drizzle-orm';
import { pino } from 'pino';
import request from 'supertest';
import type { Role } from '@shared/roles';
import { createApp, type App } from '../../server/app';
import { hashPassword } from '../../server/accounts/passwords';
import { insertUser } from '../../server/accounts/users.repo';
import type { AppConfig } from '../../server/config';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { caughtMail } from '../../server/db/schema/mail';
import type { UserRow } from '../../server/db/schema/users';
import { startMailCatcher, type MailCatcher } from '../../server/mail/mail-catcher';
import { createSmtpMailer, type Mailer } from '../../server/mail/mailer';
import { deliverDueMail, type OutboxRun } from '../../server/mail/outbox';

export const PASSWORD = 'correct horse battery';
let passwordHash: Promise<string> | undefined;

export interface TestApp {
  app: App;
  db: Database;
  catcher: MailCatcher;
  /** A working mailer to the catcher. */
  mailer: Mailer;
  clock: { now: Date };
  addUser(values: { email: string; name?: string; role?: Role; password?: string }): Promise<UserRow>;
  /** One person per role: lead@, member@ and qm@example.org, all with PASSWORD. */
  addCrew(): Promise<Crew>;
  signIn(email: string, password?: string): Promise<SignedInAgent>;
  anonymous(): Promise<SignedInAgent>;
  /** Runs the outbox worker once at the test's clock (with the working mailer unless another is given). */
  deliverMail(mailer?: Mailer): Promise<OutboxRun>;
  /** Delivers the outbox, then reads the newest message the catcher holds for an address. */
  lastMailTo(address: string): Promise<{ subject: string; text: string; links: string[] } | undefined>;
  close(): Promise<void>;
}

export interface Crew {
  lead: UserRow;
  member: UserRow;
  quartermaster: UserRow;
}

export interface SignedInAgent {
  agent: ReturnType<typeof request.agent>;
  csrf: string;
}

/** A fresh app on a fresh in-memory database with the real migrations and the real mail catcher. */
export async function buildTestApp(overrides: Partial<AppConfig> = {}): Promise<TestApp> {
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  const catcher = await startMailCatcher(db);
  const mailer = createSmtpMailer(catcher.url, 'Gripline test <test@example.org>');
  const clock = { now: new Date('2026-12-01T12:00:00Z') };
  const app = createApp({
    db,
    sessionSecret: 'test-secret-that-is-long-enough-for-the-check',
    secureCookies: false,
    sessionIdleMs: 30 * 60_000,
    publicUrl: 'http://gripline.test',
    catchingMail: true,
    logger: pino({ level: 'silent' }),
    rateLimit: { windowMs: 60_000, perIp: 100, perAccount: 100 },
    trustProxyHops: 0,
    now: () => clock.now,
    ...overrides,
  });

  const deliverMail = (via: Mailer = mailer) => deliverDueMail({ db, mailer: via, now: () => clock.now });

  const anonymous = async (): Promise<SignedInAgent> => {
    const agent = request.agent(app);
    const res = await agent.get('/api/auth/csrf').expect(200);
    return { agent, csrf: (res.body as { token: string }).token };
  };

  const addUser: TestApp['addUser'] = async ({ email, name = email.split('@')[0]!, role = 'member', password }) => {
    const hash = password ? await hashPassword(password) : await (passwordHash ??= hashPassword(PASSWORD));
    return insertUser(db, { email, name, role, passwordHash: hash });
  };

  return {
    app,
    db,
    catcher,
    mailer,
    clock,
    addUser,
    async addCrew() {
      return {
        lead: await addUser({ email: 'lead@example.org', name: 'Lee Lead', role: 'lead' }),
        member: await addUser({ email: 'member@example.org', name: 'Mia Member', role: 'member' }),
        quartermaster: await addUser({ email: 'qm@example.org', name: 'Quinn Quartermaster', role: 'quartermaster' }),
      };
    },
    anonymous,
    async signIn(email, password = PASSWORD) {
      const { agent, csrf } = await anonymous();
      const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email, password });
      if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`);
      return { agent, csrf: (res.body as { csrfToken: string }).csrfToken };
    },
    deliverMail,
    async lastMailTo(address) {
      await deliverMail();
      const rows = db.select().from(caughtMail).orderBy(desc(caughtMail.id)).all();
      const row = rows.find((r) => (JSON.parse(r.toAddresses) as string[]).includes(address));
      return row && { subject: row.subject, text: row.textBody, links: JSON.parse(row.links) as string[] };
    },
    async close() {
      app.sessionStore.close();
      mailer.close();
      await catcher.close();
      db.$client.close();
    },
  };
}

/** The token at the end of an e-mailed link such as http://gripline.test/invite/<token>. */
export function tokenFromLink(link: string): string {
  return link.split('/').pop()!;
}
