import type { ServiceContext } from '../context';
import type { UserRow } from '../db/schema/users';
import { requirePerson } from './badge.service';
import { hashPin } from './pins';
import { setPinHash } from './users.repo';

/** Sets (or changes) the signed-in person's own station PIN. */
export async function setOwnPin(ctx: ServiceContext, user: UserRow, pin: string): Promise<void> {
  setPinHash(ctx.db, user.id, await hashPin(pin));
}

/** A lead clears someone's PIN: they cannot sign in at a station until they set a new one. */
export function clearPin(ctx: ServiceContext, personId: number): void {
  const person = requirePerson(ctx.db, personId);
  setPinHash(ctx.db, person.id, null);
}
