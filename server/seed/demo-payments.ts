import { addChapterDays, startOfChapterDay } from '@shared/time/chapter-time';
import { HOUR_MS } from '@shared/time/durations';
import { findUserByEmail } from '../accounts/users.repo';
import type { ServiceContext } from '../context';
import type { Database } from '../db/client';
import { recordPayment, tabBalanceCents } from '../features/stock/money.service';
import { readChapterTimeZone } from '../settings/chapter-time-zone';

/** Who handed cash to the quartermaster, how many days ago, and what share of what they owe today. */
const CASH_PAYMENTS = [
  { email: 'kelechi.obi@example.org', daysAgo: 58, share: 0.4, note: 'Cash at the crib' },
  { email: 'ines.parra@example.org', daysAgo: 34, share: 0.5, note: 'Cash at the chapter meeting' },
  { email: 'tomasz.wren@example.org', daysAgo: 12, share: 0.6, note: 'Cash at the crib' },
] as const;

/**
 * A few members have settled part of their tab in cash with the quartermaster, as the Consumables
 * page records it, so the Payments list and the tabs show money paid as well as owed. Whole dollars,
 * never more than is owed; Marco's tab stays unpaid for the online payment walk-through.
 */
export function seedDemoPayments(db: Database, now: Date = new Date()): number {
  const zone = readChapterTimeZone(db);
  const today = startOfChapterDay(now, zone);
  let clock = now;
  const ctx: ServiceContext = { db, publicUrl: 'http://localhost', now: () => clock };
  const quartermaster = findUserByEmail(db, 'quartermaster@example.org')!;
  let recorded = 0;
  for (const p of CASH_PAYMENTS) {
    const member = findUserByEmail(db, p.email)!;
    const amountCents = Math.floor((tabBalanceCents(db, member.id) * p.share) / 100) * 100;
    if (amountCents <= 0) continue;
    clock = new Date(addChapterDays(today, -p.daysAgo, zone).getTime() + 18 * HOUR_MS);
    recordPayment(ctx, quartermaster, { userId: member.id, amountCents, note: p.note });
    recorded++;
  }
  return recorded;
}
