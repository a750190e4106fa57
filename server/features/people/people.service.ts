import type { Person, UpdatePersonBody } from '@shared/schemas/people';
import { toPerson } from '../../accounts/public-user';
import { countActiveLeads, findUserById, listUsers, updateUser } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { endSessionsOf } from '../../lib/session-helpers';

export function listPeople(ctx: ServiceContext): Person[] {
  return listUsers(ctx.db).map(toPerson);
}

/**
 * The crib's rule for a person who leaves: their holds and queue places end in the same transaction
 * (a tool set aside for them passes on), writing any e-mail to the outbox. The app hands it in.
 */
export type EndHoldsOf = (ctx: ServiceContext, personId: number, now: Date) => void;

/** Role changes and (de)activation; the chapter always keeps at least one active lead. */
export function updatePerson(ctx: ServiceContext, actor: UserRow, id: number, change: UpdatePersonBody, endHoldsOf: EndHoldsOf): Person {
  return ctx.db.transaction((db) => {
    const person = findUserById(db, id);
    if (!person) throw new HttpError(404, 'PERSON_NOT_FOUND', `No person has id ${id}.`);
    const deactivating = change.active === false && person.deactivatedAt === null;
    const demoting = change.role !== undefined && change.role !== 'lead' && person.role === 'lead';
    if (deactivating && person.id === actor.id) {
      throw new HttpError(409, 'CANNOT_DEACTIVATE_SELF', 'You cannot deactivate yourself; ask another lead.');
    }
    if ((deactivating || demoting) && person.role === 'lead' && person.deactivatedAt === null && countActiveLeads(db) <= 1) {
      throw new HttpError(409, 'LAST_LEAD', 'The chapter needs at least one active lead. Make someone else lead first.');
    }
    const updated = updateUser(db, id, {
      ...(change.role !== undefined && { role: change.role }),
      ...(change.active !== undefined && { deactivatedAt: change.active ? null : (person.deactivatedAt ?? ctx.now()) }),
    });
    if (deactivating) endSessionsOf(ctx.db, id);
    if (deactivating) endHoldsOf(ctx, id, ctx.now());
    return toPerson(updated ?? person);
  });
}
