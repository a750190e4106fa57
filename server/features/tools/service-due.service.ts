import {
  SERVICE_DUE_WITHIN_DAYS,
  SERVICE_URGENCIES,
  serviceDueWords,
  serviceKindOf,
  type ServiceDueItem,
  type ServiceDueList,
  type ServiceUrgency,
} from '@shared/schemas/overdue';
import type { MissingAccessory } from '@shared/schemas/tools';
import { chapterDaysBetween, daysLate } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { openMissingAccessories } from './missing-accessories';
import { listServiceCandidates } from './service-due.repo';
import { serviceDueAt, toolIdentity } from './tool-dto';
import type { ToolRow } from './tools.repo';

/** Chapter days left (0: due today); once the moment has passed, chapter days overdue as a negative, at least 1. */
function chapterDaysUntil(dueAt: Date, now: Date, zone: string): number {
  return dueAt.getTime() > now.getTime() ? chapterDaysBetween(now, dueAt, zone) : -daysLate(dueAt, now, zone);
}

function urgencyOf(row: ToolRow, daysUntilDue: number | null, missing: readonly MissingAccessory[]): ServiceUrgency | undefined {
  if (daysUntilDue !== null && daysUntilDue < 0) return 'overdue';
  if (row.status === 'out_of_service') return 'out_of_service';
  if (missing.length > 0) return 'accessory_missing';
  if (daysUntilDue !== null && daysUntilDue <= SERVICE_DUE_WITHIN_DAYS) return 'due_soon';
  return undefined;
}

function toItem(row: ToolRow, now: Date, zone: string, missing: readonly MissingAccessory[]): ServiceDueItem | undefined {
  const dueAt = serviceDueAt(row);
  const daysUntilDue = dueAt ? chapterDaysUntil(dueAt, now, zone) : null;
  const urgency = urgencyOf(row, daysUntilDue, missing);
  if (!urgency) return undefined;
  const kind = serviceKindOf(row.category);
  const outOfService = row.status === 'out_of_service';
  const words = [
    outOfService ? `Out of service: ${row.statusNote ?? 'no reason given'}` : undefined,
    daysUntilDue !== null && daysUntilDue <= SERVICE_DUE_WITHIN_DAYS ? serviceDueWords(kind, daysUntilDue) : undefined,
    ...missing.map((m) => `Missing: ${m.accessory} (not back from ${m.lastHolder.name})`),
  ].filter(Boolean);
  return {
    ...toolIdentity(row),
    outOfServiceReason: outOfService ? row.statusNote : null,
    serviceKind: kind,
    serviceIntervalDays: row.serviceIntervalDays,
    lastServiceAt: row.lastServiceAt?.toISOString() ?? null,
    serviceDueAt: dueAt?.toISOString() ?? null,
    daysUntilDue,
    urgency,
    missingAccessories: missing.map((m) => m.accessory),
    words: words.join('; '),
  };
}

/**
 * The quartermaster's service list, most urgent first: tools past their service or calibration
 * date (they may still be lent out), then tools out of service, then tools missing an accessory
 * that did not come back with a loan, then those due within 14 days.
 */
export function listServiceDue(ctx: ServiceContext): ServiceDueList {
  const now = ctx.now();
  const zone = readChapterTimeZone(ctx.db);
  const rank = (u: ServiceUrgency) => SERVICE_URGENCIES.indexOf(u);
  const rows = listServiceCandidates(ctx.db);
  const missing = openMissingAccessories(ctx.db, rows.map((r) => r.id));
  const data = rows
    .map((row) => toItem(row, now, zone, missing.get(row.id) ?? []))
    .filter((item): item is ServiceDueItem => item !== undefined)
    .sort((a, b) => rank(a.urgency) - rank(b.urgency) || (a.daysUntilDue ?? Infinity) - (b.daysUntilDue ?? Infinity) || a.code.localeCompare(b.code));
  return { data, meta: { dueWithinDays: SERVICE_DUE_WITHIN_DAYS } };
}
