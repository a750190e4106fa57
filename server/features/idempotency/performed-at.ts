import { OLDEST_PERFORMED_AT_DAYS } from '@shared/schemas/offline';
import { DAY_MS } from '@shared/time/durations';


/**
 * When a queued action is recorded as done: the phone's time, but never after the request arrived
 * (phone clocks run fast), never before the catalogue copy it was made from (the member saw that
 * state, so they acted after it), and never more than OLDEST_PERFORMED_AT_DAYS before arrival (a
 * phone clock years off, or a queue older than its keys are kept). Without a time, it is arrival.
 */
export function recordedPerformedAt(arrival: Date, performedAt?: string, catalogueAt?: string): Date {
  if (performedAt === undefined) return arrival;
  const at = arrival.getTime();
  const floors = [at - OLDEST_PERFORMED_AT_DAYS * DAY_MS];
  if (catalogueAt !== undefined) floors.push(Math.min(new Date(catalogueAt).getTime(), at));
  return new Date(Math.max(Math.min(new Date(performedAt).getTime(), at), ...floors));
}
