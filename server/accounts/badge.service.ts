import type { IssuedBadge } from '@shared/schemas/stations';
import type { ServiceContext } from '../context';
import type { Executor } from '../db/client';
import type { UserRow } from '../db/schema/users';
import { HttpError } from '../lib/http-error';
import { replaceBadge } from './badges.repo';
import { hashLinkToken, newLinkToken } from './link-tokens';
import { findUserById } from './users.repo';

/** The person a badge or PIN change is for: 404 when unknown. */
export function requirePerson(db: Executor, id: number): UserRow {
  const person = findUserById(db, id);
  if (!person) throw new HttpError(404, 'PERSON_NOT_FOUND', `No person has id ${id}.`);
  return person;
}

/**
 * Issues the person a new badge and revokes the one they had. The token is returned once, here: only
 * its hash is kept, so it can be printed only now (the QR code on the badge label holds it).
 */
export function issueBadge(ctx: ServiceContext, actor: UserRow, personId: number): IssuedBadge {
  return ctx.db.transaction((db) => {
    const person = requirePerson(db, personId);
    if (person.deactivatedAt !== null) {
      throw new HttpError(409, 'PERSON_DEACTIVATED', `${person.name} is deactivated; reactivate them before issuing a badge.`);
    }
    const badge = newLinkToken();
    replaceBadge(db, { userId: person.id, tokenHash: hashLinkToken(badge), issuedById: actor.id, at: ctx.now() });
    return { badge };
  });
}
