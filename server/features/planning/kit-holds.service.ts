import type { KitHoldsResult } from '@shared/schemas/builds';
import { startOfDayNamed } from '@shared/time/chapter-time';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { assemblyToChange } from './assemblies.service';
import { assemblyKit } from './assembly-estimate.service';
import { HELD_FOR_YOU } from './crib-kit';
import { dateToDay } from './planning-dto';

/**
 * The crib's own hold rule, passed in by the app so this feature does not reach into the tools
 * feature. `from`: the hold begins then (the tool is not set aside before).
 */
export type PlaceHold = (ctx: ServiceContext, user: UserRow, code: string, options: { from?: Date }) => unknown;

/**
 * Holds each tool of the assembly's kit from the assembly's planned start: a builder planning five
 * weeks ahead joins each queue now, and the tools are set aside for them from the morning of the
 * planned start (or at once when it has come, or has no date). A hold the crib refuses (you have
 * it already, you are queued already, you lack its sign-off, it is out of use) is skipped with the
 * crib's own reason.
 */
export function holdKit(ctx: ServiceContext, user: UserRow, assemblyId: number, placeHold: PlaceHold): KitHoldsResult {
  const found = assemblyToChange(ctx, user, assemblyId);
  const kit = assemblyKit(ctx.db, found);
  const startDay = dateToDay(found.assembly.plannedStart);
  const start = startDay ? startOfDayNamed(startDay, readChapterTimeZone(ctx.db)) : undefined;
  const from = start && start > ctx.now() ? start : undefined;
  const toolsInKit = new Map(kit.flatMap((k) => (k.tool ? [[k.tool.code, k.tool] as const] : [])));
  const result: KitHoldsResult = { placed: [], skipped: [], holdsFrom: from ? startDay : null };
  for (const tool of toolsInKit.values()) {
    if (tool.status === HELD_FOR_YOU) {
      result.skipped.push({ code: tool.code, reason: `Already held for you: ${tool.code}.` });
      continue;
    }
    try {
      placeHold(ctx, user, tool.code, { from });
      result.placed.push({ code: tool.code, name: tool.name });
    } catch (err) {
      if (!(err instanceof HttpError)) throw err;
      result.skipped.push({ code: tool.code, reason: err.message });
    }
  }
  return result;
}
