import { PAYMENT_METHOD_LABELS } from '@shared/schemas/payment-methods';
import type { PaymentListItem, PaymentsQuery } from '@shared/schemas/payments';
import { chapterDay, chapterDaySpan, startOfDayNamed } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import { centsCell, textCell as text, toCsv, type CsvCell as Cell } from '../../lib/csv';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { listTabPayments } from '../stock/stock.reads';
import type { PaymentFilter } from './payments.service';

/** The query's chapter days as moments: from the start of the first day to the end of the last. */
function filterOf(query: PaymentsQuery, zone: string): PaymentFilter {
  return {
    from: query.from ? startOfDayNamed(query.from, zone) : undefined,
    to: query.to ? chapterDaySpan(query.to, query.to, zone).end : undefined,
    method: query.method,
  };
}

/** Cash and online payments together, newest first (quartermaster and lead). */
export function listPayments(ctx: ServiceContext, query: PaymentsQuery): PaymentListItem[] {
  return listTabPayments(ctx.db, filterOf(query, readChapterTimeZone(ctx.db)));
}

const CSV_FIELDS = ['payment_id', 'day', 'at_utc', 'member', 'method', 'amount', 'refunded', 'left_to_refund', 'recorded_by', 'note'];

/**
 * The payments as CSV, newest first: the day on the chapter's calendar (and the exact moment in
 * UTC), amounts in dollars with two places. The file is named for the days it covers: the days
 * asked, or from the oldest payment listed to today.
 */
export function paymentsCsv(ctx: ServiceContext, query: PaymentsQuery): { filename: string; csv: string } {
  const zone = readChapterTimeZone(ctx.db);
  const payments = listTabPayments(ctx.db, filterOf(query, zone));
  const dayOf = (iso: string) => chapterDay(new Date(iso), zone);
  const rows = payments.map((p): Cell[] => [
    p.id,
    dayOf(p.at),
    p.at,
    text(p.member.name),
    PAYMENT_METHOD_LABELS[p.method],
    centsCell(p.amountCents),
    centsCell(p.refundedCents),
    centsCell(p.refundableCents),
    text(p.recordedBy.name),
    text(p.note),
  ]);
  const today = chapterDay(ctx.now(), zone);
  const first = query.from ?? (payments.length > 0 ? dayOf(payments.at(-1)!.at) : today);
  const method = query.method ? `-${query.method}` : '';
  return { filename: `gripline-payments-${first}-to-${query.to ?? today}${method}.csv`, csv: toCsv(CSV_FIELDS, rows) };
}
