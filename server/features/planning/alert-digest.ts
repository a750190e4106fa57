import type { Alert } from '@shared/schemas/forecast';
import { valueAtCost } from '@shared/stock/money';
import { countWords, quantityWords } from '@shared/stock/quantity-words';
import { dayInWords, startOfDayNamed } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { OutgoingMail } from '../../mail/mailer';
import { plural, valueWords, type MailCalendar } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { finishJobRun, startJobRun } from '../../jobs/job-runs.repo';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { activeQuartermasters } from './alerts.repo';
import { listAlertsIn, refreshAlerts } from './alerts.service';

export const ALERT_DIGEST_JOB = 'alert-digest';

export interface AlertDigestResult {
  summary: string;
  raised: number;
  digestsSent: number;
  error: string | null;
}

function alertLine(a: Alert, calendar: MailCalendar): string {
  const { bin } = a;
  const part = bin.supplierPart ? `, part ${bin.supplierPart}` : '';
  const head = `- ${bin.code} ${bin.designation}${part}: ${quantityWords(bin.onHand, bin.unit)} on hand`;
  const ordered = a.orderedAt ? ` on ${dayInWords(new Date(a.orderedAt), calendar.zone, calendar.now)}` : '';
  const expected = a.expectedAt ? `, expected ${dayInWords(startOfDayNamed(a.expectedAt, calendar.zone), calendar.zone, calendar.now)}` : '';
  const onOrder = a.state === 'ordered' ? `; ordered ${quantityWords(a.orderedQty ?? 0, bin.unit)}${ordered}, ${quantityWords(a.onOrder, bin.unit)} still to come${expected}` : '';
  if (a.toOrder === 0) return `${head}${onOrder}`;
  // The quantity is the one reorder rule's, as on Restock and the purchase list.
  const packs = a.toOrder / bin.packSize;
  return `${head}${onOrder}; order ${a.state === 'ordered' ? 'another ' : ''}${quantityWords(a.toOrder, bin.unit)} (${plural(packs, 'pack', 'packs')} of ${countWords(bin.packSize)}, about ${valueWords(valueAtCost(a.toOrder, bin.unitCost))})\n  ${a.reason}`;
}

/** The quartermaster's morning list: alerts still to order and orders on their way, by supplier. */
export function alertDigestMail(to: string, name: string, alerts: Alert[], publicUrl: string, calendar: MailCalendar): OutgoingMail {
  const open = alerts.filter((a) => a.toOrder > 0).length;
  const bySupplier = new Map<string, Alert[]>();
  for (const a of alerts) bySupplier.set(a.bin.supplier, [...(bySupplier.get(a.bin.supplier) ?? []), a]);
  const suppliers = [...bySupplier.keys()].sort((a, b) => a.localeCompare(b));
  return {
    to,
    subject: `Reorder: ${plural(open, 'bin needs', 'bins need')} ordering`,
    text: [
      `Hello ${name},`,
      ``,
      `These bins are at or near their reorder point, by supplier. Suggested quantities are in whole packs.`,
      ...suppliers.flatMap((s) => [``, `${s || 'No supplier set'}:`, ...bySupplier.get(s)!.sort((x, y) => x.bin.code.localeCompare(y.bin.code)).map((a) => alertLine(a, calendar))]),
      ``,
      `Mark each one ordered (with the expected day) or dismiss it on the Alerts page, where the`,
      `purchase list groups them by supplier and exports a CSV:`,
      `${publicUrl.replace(/\/$/, '')}/alerts`,
    ].join('\n'),
  };
}

/**
 * The daily run: refreshes the alerts, then, when at least one is still to order, writes every
 * active quartermaster the digest (to the outbox, which sends it). Each run is recorded in job_runs.
 */
export function runAlertDigest(ctx: ServiceContext): AlertDigestResult {
  const runId = startJobRun(ctx.db, ALERT_DIGEST_JOB, ctx.now());
  try {
    const { raised, plan } = refreshAlerts(ctx);
    const alerts = listAlertsIn(ctx, 'active', plan);
    const open = alerts.filter((a) => a.toOrder > 0).length;
    let digestsSent = 0;
    if (open > 0) {
      const now = ctx.now();
      const calendar = { zone: readChapterTimeZone(ctx.db), now };
      ctx.db.transaction((db) => {
        for (const qm of activeQuartermasters(db)) {
          queueMail(db, alertDigestMail(qm.email, qm.name, alerts, ctx.publicUrl, calendar), now);
          digestsSent++;
        }
      });
    }
    const summary = [
      `${plural(raised.length, 'alert', 'alerts')} raised`,
      open === 0 ? 'nothing to order, no digest' : `${plural(open, 'bin', 'bins')} to order, digest to ${plural(digestsSent, 'quartermaster', 'quartermasters')}`,
    ].join(', ');
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary, error: null });
    return { summary, raised: raised.length, digestsSent, error: null };
  } catch (err) {
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary: 'Stopped', error: (err as Error).message || String(err) });
    throw err;
  }
}
