import type { Alert } from '@shared/schemas/forecast';
import { valueAtCost } from '@shared/stock/money';
import { dayInWords, startOfDayNamed } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { OutgoingMail } from '../../mail/mailer';
import { plural, valueWords, type MailCalendar } from '../../mail/messages';
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
  const head = `- ${bin.code} ${bin.designation}${part}: ${bin.onHand} ${bin.unit} on hand`;
  if (a.state === 'ordered') {
    const ordered = a.orderedAt ? ` on ${dayInWords(new Date(a.orderedAt), calendar.zone, calendar.now)}` : '';
    const expected = a.expectedAt ? `, expected ${dayInWords(startOfDayNamed(a.expectedAt, calendar.zone), calendar.zone, calendar.now)}` : '';
    return `${head}; ordered ${a.orderedQty}${ordered}${expected}`;
  }
  const packs = Math.ceil(a.suggestedQty / bin.packSize);
  return `${head}; order ${a.suggestedQty} (${plural(packs, 'pack', 'packs')} of ${bin.packSize}, about ${valueWords(valueAtCost(a.suggestedQty, bin.unitCost))})\n  ${a.reason}`;
}

/** The quartermaster's morning list: alerts still to order and orders on their way, by supplier. */
export function alertDigestMail(to: string, name: string, alerts: Alert[], publicUrl: string, calendar: MailCalendar): OutgoingMail {
  const open = alerts.filter((a) => a.state === 'open').length;
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
 * The daily run: refreshes the alerts, then, when at least one is still to order, mails every
 * active quartermaster the digest. Each run is recorded in job_runs; a failed e-mail is noted in
 * the run's error and does not stop the others.
 */
export async function runAlertDigest(ctx: ServiceContext): Promise<AlertDigestResult> {
  const runId = startJobRun(ctx.db, ALERT_DIGEST_JOB, ctx.now());
  try {
    const { raised } = refreshAlerts(ctx);
    const alerts = listAlertsIn(ctx, 'active');
    const open = alerts.filter((a) => a.state === 'open').length;
    const failures: string[] = [];
    let digestsSent = 0;
    if (open > 0) {
      for (const qm of activeQuartermasters(ctx.db)) {
        try {
          await ctx.mailer.send(alertDigestMail(qm.email, qm.name, alerts, ctx.publicUrl, { zone: readChapterTimeZone(ctx.db), now: ctx.now() }));
          digestsSent++;
        } catch (err) {
          failures.push(`digest to ${qm.email}: ${(err as Error).message}`);
        }
      }
    }
    const summary = [
      `${plural(raised.length, 'alert', 'alerts')} raised`,
      open === 0 ? 'nothing to order, no digest' : `${plural(open, 'bin', 'bins')} to order, digest to ${plural(digestsSent, 'quartermaster', 'quartermasters')}`,
    ].join(', ');
    const error = failures.length ? `Could not send ${failures.join('; ')}` : null;
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary, error });
    return { summary, raised: raised.length, digestsSent, error };
  } catch (err) {
    finishJobRun(ctx.db, runId, { finishedAt: ctx.now(), summary: 'Stopped', error: (err as Error).message || String(err) });
    throw err;
  }
}
