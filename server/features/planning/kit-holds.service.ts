import type { KitHoldsResult } from '@shared/schemas/builds';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { assemblyToChange } from './assemblies.service';
import { assemblyKit } from './assembly-estimate.service';
import { HELD_FOR_YOU } from './crib-kit';

/** The crib's own hold rule, passed in by the app so this feature does not reach into the tools feature. */
export type PlaceHold = (ctx: ServiceContext, user: UserRow, code: string) => unknown;

/**
 * Holds each tool of the assembly's kit: a tool on the shelf is set aside for the person for the
 * chapter's hold time, one someone else has is queued for; a hold the crib refuses (you have it
 * already, you are queued already, it is out of use) is skipped with the crib's own reason.
 */
export function holdKit(ctx: ServiceContext, user: UserRow, assemblyId: number, placeHold: PlaceHold): KitHoldsResult {
  const kit = assemblyKit(ctx.db, assemblyToChange(ctx, user, assemblyId));
  const toolsInKit = new Map(kit.flatMap((k) => (k.tool ? [[k.tool.code, k.tool] as const] : [])));
  const result: KitHoldsResult = { placed: [], skipped: [] };
  for (const tool of toolsInKit.values()) {
    if (tool.status === HELD_FOR_YOU) {
      result.skipped.push({ code: tool.code, reason: `Already held for you: ${tool.code}.` });
      continue;
    }
    try {
      placeHold(ctx, user, tool.code);
      result.placed.push({ code: tool.code, name: tool.name });
    } catch (err) {
      if (!(err instanceof HttpError)) throw err;
      result.skipped.push({ code: tool.code, reason: err.message });
    }
  }
  return result;
}
