import type { Person, UpdatePersonBody } from '@shared/schemas/people';
import { badgeHolderIds, workingBadgeOf } from '../../accounts/badges.repo';
import { toPerson } from '../../accounts/public-user';
import { changeAccess, countActiveLeads, findUserById, listUsers } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { publish } from '../../events/domain-events';
import { HttpError } from '../../lib/http-error';
import { endSessionsOf } from '../../session/sessions-of';

export function listPeople(ctx: ServiceContext): Person[] {
  const holders = badgeHolderIds(ctx.db);
  return listUsers(ctx.db).map((row) => toPerson(row, holders.has(row.id)));
}

/**
 * Role changes and (de)activation; the chapter always keeps at least one active lead. Deactivating
 * ends the person's sessions and publishes `person.deactivated` in the same transaction (the crib ends
 * their holds).
 */
export function updatePerson(ctx: ServiceContext, actor: UserRow, id: number, change: UpdatePersonBody): Person {
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
    const updated = changeAccess(db, id, {
      ...(change.role !== undefined && { role: change.role }),
      ...(change.active !== undefined && { deactivatedAt: change.active ? null : (person.deactivatedAt ?? ctx.now()) }),
    });
    if (deactivating) endSessionsOf(ctx.db, id);
    if (deactivating) publish(ctx, { type: 'person.deactivated', userId: id, at: ctx.now() });
    return toPerson(updated ?? person, workingBadgeOf(db, id) !== undefined);
  });
}
