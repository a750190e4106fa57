import { findAccountToken } from './account-tokens.repo';
import { hashLinkToken } from './link-tokens';
import type { ServiceContext } from '../context';
import type { AccountTokenRow } from '../db/schema/account-tokens';
import { HttpError } from '../lib/http-error';

const WHAT = { invitation: 'invitation', password_reset: 'password reset link' } as const;

/** Finds the token behind an e-mailed link, or says plainly why the link no longer works. */
export function openLinkToken(ctx: ServiceContext, kind: AccountTokenRow['kind'], token: string): AccountTokenRow {
  const row = findAccountToken(ctx.db, kind, hashLinkToken(token));
  const what = WHAT[kind];
  if (!row) throw new HttpError(404, 'LINK_NOT_FOUND', `This ${what} is not known. Check that you opened the whole link from the e-mail.`);
  if (row.usedAt) throw new HttpError(410, 'LINK_USED', `This ${what} has already been used. Each link works once.`);
  if (row.revokedAt) throw new HttpError(410, 'LINK_REVOKED', `This ${what} has been replaced or withdrawn. Use the newest e-mail.`);
  if (row.expiresAt.getTime() <= ctx.now().getTime()) {
    throw new HttpError(410, 'LINK_EXPIRED', `This ${what} has expired. Ask for a new one.`);
  }
  return row;
}

export function linkUrl(ctx: ServiceContext, path: string, token: string): string {
  return `${ctx.publicUrl.replace(/\/$/, '')}${path}/${token}`;
}
