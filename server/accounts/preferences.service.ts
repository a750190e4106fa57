import type { LengthUnit } from '@shared/schemas/builds';
import type { ServiceContext } from '../context';
import type { UserRow } from '../db/schema/users';
import { setPreferredUnit as writePreferredUnit } from './users.repo';

/** The signed-in person's own settings; accounts is the one place that writes users. */
export function readPreferences(user: UserRow): { preferredUnit: LengthUnit } {
  return { preferredUnit: user.preferredUnit };
}

/** Sets the length unit this person types rivet lines in, and answers what is now stored. */
export function setPreferredUnit(ctx: ServiceContext, user: UserRow, preferredUnit: LengthUnit): { preferredUnit: LengthUnit } {
  const updated = writePreferredUnit(ctx.db, user.id, preferredUnit);
  return { preferredUnit: updated?.preferredUnit ?? preferredUnit };
}
