import type { Role } from '@shared/roles';
import { DAY_MS } from '@shared/time/durations';
import { hashPassword } from '../accounts/passwords';
import { countUsers, insertUser } from '../accounts/users.repo';
import type { Database } from '../db/client';
import { refreshAlerts } from '../features/planning/alerts.service';
import { installReactions } from '../events/reactions';
import { deliverDueMail } from '../mail/outbox';
import { seedDemoBuilds } from './demo-builds';
import { seedDemoCrib } from './demo-crib';
import { seedDemoOrders } from './demo-orders';
import { seedDemoPayments } from './demo-payments';
import { seedDemoStock } from './demo-stock';

export const DEMO_PASSWORD = 'gripline-demo';
/**
 * An invented chapter ("Larkspur Field Builders, Chapter 417"): every person here is made up. Each
 * joined before anything the demo's history has them do (sign-offs 400 days ago, loans, draws).
 */
export const DEMO_PEOPLE: { email: string; name: string; role: Role; phone: string; joinedDaysAgo: number }[] = [
  { email: 'lead@example.org', name: 'Dana Okafor', role: 'lead', phone: '555-0140', joinedDaysAgo: 1480 },
  { email: 'quartermaster@example.org', name: 'Ruth Lindqvist', role: 'quartermaster', phone: '555-0141', joinedDaysAgo: 1210 },
  { email: 'member@example.org', name: 'Marco Bellweather', role: 'member', phone: '555-0142', joinedDaysAgo: 860 },
  { email: 'ines.parra@example.org', name: 'Ines Parra', role: 'member', phone: '555-0143', joinedDaysAgo: 615 },
  { email: 'tomasz.wren@example.org', name: 'Tomasz Wren', role: 'member', phone: '555-0144', joinedDaysAgo: 472 },
  { email: 'kelechi.obi@example.org', name: 'Kelechi Obi', role: 'member', phone: '555-0145', joinedDaysAgo: 236 },
];

/** Seeds the demo chapter into an empty database; returns false (and does nothing) otherwise. */
export async function seedDemoChapter(db: Database): Promise<boolean> {
  if (countUsers(db) > 0) return false;
  installReactions();
  const hashes = await Promise.all(DEMO_PEOPLE.map(() => hashPassword(DEMO_PASSWORD)));
  const now = Date.now();
  db.transaction((tx) => {
    DEMO_PEOPLE.forEach(({ joinedDaysAgo, ...p }, i) => insertUser(tx, { ...p, passwordHash: hashes[i]!, createdAt: new Date(now - joinedDaysAgo * DAY_MS) }));
  });
  seedDemoCrib(db);
  seedDemoStock(db);
  seedDemoPayments(db);
  seedDemoBuilds(db);
  seedDemoOrders(db);
  // This morning's reorder check has run, as the daily job would have: the bins running low have their alerts.
  refreshAlerts({ db, publicUrl: 'http://localhost', now: () => new Date() });
  // The mail of the invented past counts as sent long ago: it must not reach the mail catcher or a real server.
  await deliverDueMail({ db, mailer: { send: async () => {}, close: () => {} }, now: () => new Date() });
  return true;
}
