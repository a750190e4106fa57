import type { CreateSignoffInput, MySignoff, Signoff, SignoffGrant, UpdateSignoffBody } from '@shared/schemas/signoffs';
import { findUserById } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { Database, Executor } from '../../db/client';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { isUniqueViolation } from '../../lib/sqlite-errors';
import { loanStatements } from './loans.repo';
import { closeRequestOnGrant } from './signoff-requests.service';
import {
  activeLeadNames,
  countToolsPerSignoff,
  findActiveGrant,
  findSignoff,
  findSignoffByName,
  insertGrant,
  insertSignoff,
  listActiveGrants,
  listSignoffRows,
  markGrantRevoked,
  updateSignoff,
  type SignoffRow,
} from './signoffs.repo';


const nameTaken = (name: string) =>
  new HttpError(409, 'SIGNOFF_NAME_TAKEN', `A sign-off called "${name}" already exists. Pick another name, or sign people off for that one.`, [
    { path: 'name', message: 'This name is taken.' },
  ]);

function signoffOrThrow(db: Executor, id: number): SignoffRow {
  const row = findSignoff(db, id);
  if (!row) throw new HttpError(404, 'SIGNOFF_NOT_FOUND', `No sign-off has id ${id}. Reload the list of sign-offs.`);
  return row;
}

/** Who to ask for a sign-off, by name: "Ask Dana Okafor (chapter lead) to sign you off." */
export function signOffAdvice(db: Database): string {
  const names = activeLeadNames(db);
  if (names.length === 0) return 'Ask the chapter lead to sign you off.';
  const who = names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} or ${names.at(-1)}`;
  return `Ask ${who} (chapter lead${names.length > 1 ? 's' : ''}) to sign you off.`;
}

export function listSignoffs(ctx: ServiceContext): Signoff[] {
  const toolCounts = countToolsPerSignoff(ctx.db);
  const grants = listActiveGrants(ctx.db);
  return listSignoffRows(ctx.db).map((s) => ({
    id: s.id,
    name: s.name,
    description: s.description,
    toolCount: toolCounts.get(s.id) ?? 0,
    holders: grants
      .filter((g) => g.signoffId === s.id)
      .map((g) => ({
        userId: g.userId,
        name: g.holderName,
        active: g.holderDeactivatedAt === null,
        grantedAt: g.grantedAt.toISOString(),
        grantedBy: { id: g.grantedById, name: g.grantedByName },
      })),
  }));
}

function signoffView(ctx: ServiceContext, id: number): Signoff {
  return listSignoffs(ctx).find((s) => s.id === id)!;
}

export function defineSignoff(ctx: ServiceContext, body: CreateSignoffInput): Signoff {
  const id = ctx.db.transaction((db) => {
    if (findSignoffByName(db, body.name)) throw nameTaken(body.name);
    try {
      return insertSignoff(db, { name: body.name, description: body.description, createdAt: ctx.now() }).id;
    } catch (err) {
      if (isUniqueViolation(err)) throw nameTaken(body.name);
      throw err;
    }
  });
  return signoffView(ctx, id);
}

export function changeSignoff(ctx: ServiceContext, id: number, change: UpdateSignoffBody): Signoff {
  ctx.db.transaction((db) => {
    signoffOrThrow(db, id);
    if (change.name !== undefined) {
      const other = findSignoffByName(db, change.name);
      if (other && other.id !== id) throw nameTaken(change.name);
    }
    updateSignoff(db, id, change);
  });
  return signoffView(ctx, id);
}

/**
 * Signs a person off: dated now, by the lead who does it. One active grant per person and sign-off.
 * Their open request for it, if any, closes as granted in the same transaction.
 */
export function grantSignoff(ctx: ServiceContext, actor: UserRow, id: number, userId: number): SignoffGrant {
  const now = ctx.now();
  return ctx.db.transaction((db) => {
    const signoff = signoffOrThrow(db, id);
    const person = findUserById(db, userId);
    if (!person) throw new HttpError(404, 'PERSON_NOT_FOUND', `No person has id ${userId}. Choose someone from the list.`);
    if (person.deactivatedAt) {
      throw new HttpError(409, 'PERSON_DEACTIVATED', `${person.name} is deactivated. Reactivate them on the People page before signing them off.`);
    }
    const alreadySignedOff = new HttpError(409, 'ALREADY_SIGNED_OFF', `${person.name} already holds the "${signoff.name}" sign-off.`);
    if (findActiveGrant(db, id, userId)) throw alreadySignedOff;
    let grant;
    try {
      grant = insertGrant(db, { signoffId: id, userId, grantedAt: now, grantedById: actor.id });
    } catch (err) {
      if (isUniqueViolation(err)) throw alreadySignedOff;
      throw err;
    }
    closeRequestOnGrant(ctx, db, id, userId, actor, now);
    return {
      id: grant.id,
      signoff: { id: signoff.id, name: signoff.name },
      holder: { id: person.id, name: person.name },
      grantedAt: grant.grantedAt.toISOString(),
      grantedBy: { id: actor.id, name: actor.name },
    };
  });
}

export function revokeSignoff(ctx: ServiceContext, actor: UserRow, id: number, userId: number): void {
  const now = ctx.now();
  ctx.db.transaction((db) => {
    const signoff = signoffOrThrow(db, id);
    const grant = findActiveGrant(db, id, userId);
    if (!grant) {
      const name = findUserById(db, userId)?.name ?? `Person ${userId}`;
      throw new HttpError(404, 'NOT_SIGNED_OFF', `${name} does not hold the "${signoff.name}" sign-off, so there is nothing to revoke.`);
    }
    markGrantRevoked(db, grant.id, now, actor.id);
  });
}

export function mySignoffs(ctx: ServiceContext, user: UserRow): MySignoff[] {
  const grants = new Map(listActiveGrants(ctx.db, { userId: user.id }).map((g) => [g.signoffId, g]));
  return listSignoffRows(ctx.db).flatMap((s) => {
    const g = grants.get(s.id);
    if (!g) return [];
    return [{ id: s.id, name: s.name, description: s.description, grantedAt: g.grantedAt.toISOString(), grantedBy: { id: g.grantedById, name: g.grantedByName } }];
  });
}

/**
 * A tool that needs a sign-off goes out, and is held, only for a person who has it: checkout, a
 * hold and "Hold the kit" refuse alike with 403 SIGNOFF_REQUIRED.
 */
export function refuseWithoutSignoff(ctx: ServiceContext, tool: { code: string; requiredSignoffId: number | null }, user: UserRow): void {
  if (tool.requiredSignoffId === null) return;
  const s = loanStatements(ctx.db);
  if (s.hasSignoff.get({ signoffId: tool.requiredSignoffId, userId: user.id })) return;
  const name = s.signoffName.get({ id: tool.requiredSignoffId })?.name ?? 'a sign-off';
  throw new HttpError(403, 'SIGNOFF_REQUIRED', `${tool.code} needs the "${name}" sign-off, which you do not have yet. ${signOffAdvice(ctx.db)}`);
}
