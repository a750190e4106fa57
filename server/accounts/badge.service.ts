import type { LabelPerson } from '@shared/schemas/labels';
import type { IssuedBadge } from '@shared/schemas/stations';
import type { ServiceContext } from '../context';
import type { Executor } from '../db/client';
import type { UserRow } from '../db/schema/users';
import { HttpError } from '../lib/http-error';
import { badgeHolderIds, replaceBadge } from './badges.repo';
import { hashLinkToken, newLinkToken } from './link-tokens';
import { findUserById, listUsers } from './users.repo';

/** The person a badge or PIN change is for: 404 when unknown. */
export function requirePerson(db: Executor, id: number): UserRow {
  const person = findUserById(db, id);
  if (!person) throw new HttpError(404, 'PERSON_NOT_FOUND', `No person has id ${id}.`);
  return person;
}

export interface PrintableBadge {
  name: string;
  badge: string;
}

/**
 * Issues each person a new badge and revokes the one they had, all or none. The tokens are returned
 * once, here: only their hashes are kept, so a badge can be printed only now (its QR code holds it).
 */
export function issueBadges(ctx: ServiceContext, actor: UserRow, personIds: readonly number[]): PrintableBadge[] {
  return ctx.db.transaction((db) =>
    personIds.map((id) => {
      const person = requirePerson(db, id);
      if (person.deactivatedAt !== null) {
        throw new HttpError(409, 'PERSON_DEACTIVATED', `${person.name} is deactivated; reactivate them before issuing a badge.`);
      }
      const badge = newLinkToken();
      replaceBadge(db, { userId: person.id, tokenHash: hashLinkToken(badge), issuedById: actor.id, at: ctx.now() });
      return { name: person.name, badge };
    }),
  );
}

/** POST /api/users/:id/badge: one person's new badge. */
export function issueBadge(ctx: ServiceContext, actor: UserRow, personId: number): IssuedBadge {
  const [issued] = issueBadges(ctx, actor, [personId]);
  return { badge: issued!.badge };
}

/** Everyone a badge can be printed for (active people, by name), and whether they have one now. */
export function badgeCandidates(ctx: ServiceContext): LabelPerson[] {
  const holders = badgeHolderIds(ctx.db);
  return listUsers(ctx.db)
    .filter((u) => u.deactivatedAt === null)
    .map((u) => ({ id: u.id, name: u.name, hasBadge: holders.has(u.id) }));
}
