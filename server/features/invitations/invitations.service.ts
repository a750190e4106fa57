import type { Role } from '@shared/roles';
import type { InvitationPreview } from '@shared/schemas/auth';
import type { PendingInvitation } from '@shared/schemas/people';
import {
  claimAccountToken,
  insertAccountToken,
  listOpenInvitations,
  revokeOpenTokens,
  revokeTokenById,
} from '../../accounts/account-tokens.repo';
import { linkUrl, openLinkToken } from '../../accounts/link-token.service';
import { hashLinkToken, LINK_PAGES, newLinkToken } from '../../accounts/link-tokens';
import { hashPassword } from '../../accounts/passwords';
import { findUserByEmail, findUserById, insertUser } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { invitationMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';
import { DAY_MS } from '@shared/time/durations';

export const INVITATION_LIFETIME_MS = 7 * DAY_MS;

function alreadyHasAccount(email: string): HttpError {
  return new HttpError(409, 'ALREADY_HAS_ACCOUNT', `${email} already has a Gripline account; change its role on the People page instead.`);
}

/** A new invitation replaces any open one for the same address; its e-mail is written to the outbox with it. */
export function invite(ctx: ServiceContext, lead: UserRow, email: string, role: Role): PendingInvitation {
  if (findUserByEmail(ctx.db, email)) throw alreadyHasAccount(email);
  const now = ctx.now();
  const token = newLinkToken();
  const row = ctx.db.transaction((db) => {
    revokeOpenTokens(db, 'invitation', email, now);
    queueMail(db, invitationMail(email, role, lead.name, linkUrl(ctx, LINK_PAGES.invitation, token)), now);
    return insertAccountToken(db, {
      kind: 'invitation',
      tokenHash: hashLinkToken(token),
      email,
      role,
      createdById: lead.id,
      createdAt: now,
      expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_MS),
    });
  });
  return {
    id: row.id,
    email,
    role,
    invitedBy: lead.name,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
  };
}

export function listPendingInvitations(ctx: ServiceContext): PendingInvitation[] {
  return listOpenInvitations(ctx.db, ctx.now()).map((r) => ({
    id: r.id,
    email: r.email,
    role: r.role ?? 'member',
    invitedBy: r.invitedBy ?? 'a former lead',
    createdAt: r.createdAt.toISOString(),
    expiresAt: r.expiresAt.toISOString(),
  }));
}

export function withdrawInvitation(ctx: ServiceContext, id: number): void {
  if (!revokeTokenById(ctx.db, id, ctx.now())) {
    throw new HttpError(404, 'INVITATION_NOT_FOUND', 'No open invitation has that id; it may have been used or withdrawn already.');
  }
}

export function previewInvitation(ctx: ServiceContext, token: string): InvitationPreview {
  const row = openLinkToken(ctx, 'invitation', token);
  const inviter = row.createdById ? findUserById(ctx.db, row.createdById) : undefined;
  return {
    email: row.email,
    role: row.role ?? 'member',
    invitedBy: inviter?.name ?? 'your chapter lead',
    expiresAt: row.expiresAt.toISOString(),
  };
}

/** Creates the account from an invitation; the token is claimed in the same transaction. */
export async function acceptInvitation(ctx: ServiceContext, token: string, name: string, password: string): Promise<UserRow> {
  const row = openLinkToken(ctx, 'invitation', token);
  if (findUserByEmail(ctx.db, row.email)) throw alreadyHasAccount(row.email);
  const passwordHash = await hashPassword(password);
  return ctx.db.transaction((db) => {
    if (!claimAccountToken(db, row.id, ctx.now())) {
      throw new HttpError(410, 'LINK_USED', 'This invitation has already been used. Each link works once.');
    }
    return insertUser(db, { email: row.email, name, role: row.role ?? 'member', passwordHash });
  });
}
