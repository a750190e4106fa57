import { findUserByEmail } from '../accounts/users.repo';
import type { ServiceContext } from '../context';
import type { Database } from '../db/client';
import { listAlertsIn, markOrdered, refreshAlerts } from '../features/planning/alerts.service';
import { addChapterDays, chapterDay, startOfChapterDay } from '@shared/time/chapter-time';
import { HOUR_MS } from '@shared/time/durations';
import { readChapterTimeZone } from '../settings/chapter-time-zone';

/**
 * Orders placed four days ago through the alerts, as the quartermaster would: the first bin the
 * reorder rule asked for (by code) was due yesterday and is late, the second comes in three days.
 * The other alerts stay open for the purchase list. Returns how many were ordered.
 */
export function seedDemoOrders(db: Database, now: Date = new Date()): number {
  const zone = readChapterTimeZone(db);
  const today = startOfChapterDay(now, zone);
  const ordering = new Date(addChapterDays(today, -4, zone).getTime() + 10 * HOUR_MS);
  const ctx: ServiceContext = { db, publicUrl: 'http://localhost', now: () => ordering };
  const ruth = findUserByEmail(db, 'quartermaster@example.org')!;
  const day = (offset: number) => chapterDay(addChapterDays(today, offset, zone), zone);
  const { plan } = refreshAlerts(ctx);
  const open = listAlertsIn(ctx, 'open', plan)
    .filter((a) => a.toOrder > 0)
    .sort((a, b) => a.bin.code.localeCompare(b.bin.code));
  const orders = [
    { expectedAt: day(-1), note: 'Supplier said Monday' },
    { expectedAt: day(3), note: 'Confirmed by phone' },
  ];
  orders.forEach((o, i) => {
    const alert = open[i];
    if (alert) markOrdered(ctx, ruth, alert.id, { quantity: alert.toOrder, expectedAt: o.expectedAt, note: o.note });
  });
  return Math.min(orders.length, open.length);
}
