import { HOUR_MS } from '@shared/time/durations';
import { claimAccountToken, countTokensSince, insertAccountToken, revokeOpenTokens } from '../../accounts/account-tokens.repo';
import { linkUrl, openLinkToken } from '../../accounts/link-token.service';
import { hashLinkToken, LINK_PAGES, newLinkToken } from '../../accounts/link-tokens';
import { hashPassword } from '../../accounts/passwords';
import { findUserByEmail, setPasswordHash } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { endSessionsOf } from '../../session/sessions-of';
import { passwordResetMail } from '../../mail/messages';
import { queueMail } from '../../mail/outbox';

export const RESET_LIFETIME_MS = HOUR_MS;

/** More requests for one address within the hour are answered alike and queue nothing. */
export const RESETS_PER_HOUR = 3;

/**
 * Writes a reset link for an active account to the outbox; says nothing about whether the address
 * exists, not even by the time it takes: no mail is sent during the request, and both paths make
 * a token and run one short transaction.
 */
export function requestPasswordReset(ctx: ServiceContext, email: string): void {
  const now = ctx.now();
  const token = newLinkToken();
  const tokenHash = hashLinkToken(token);
  ctx.db.transaction((db) => {
    const user = findUserByEmail(db, email);
    if (!user || user.deactivatedAt) return;
    if (countTokensSince(db, 'password_reset', user.email, new Date(now.getTime() - HOUR_MS)) >= RESETS_PER_HOUR) return;
    revokeOpenTokens(db, 'password_reset', user.email, now);
    insertAccountToken(db, {
      kind: 'password_reset',
      tokenHash,
      email: user.email,
      userId: user.id,
      createdAt: now,
      expiresAt: new Date(now.getTime() + RESET_LIFETIME_MS),
    });
    queueMail(db, passwordResetMail(user.email, user.name, linkUrl(ctx, LINK_PAGES.password_reset, token)), now);
  });
}

export async function confirmPasswordReset(ctx: ServiceContext, token: string, password: string): Promise<void> {
  const row = openLinkToken(ctx, 'password_reset', token);
  const passwordHash = await hashPassword(password);
  const userId = row.userId;
  if (userId === null) throw new HttpError(410, 'LINK_REVOKED', 'This password reset link has been withdrawn.');
  ctx.db.transaction((db) => {
    if (!claimAccountToken(db, row.id, ctx.now())) {
      throw new HttpError(410, 'LINK_USED', 'This password reset link has already been used. Each link works once.');
    }
    setPasswordHash(db, userId, passwordHash);
  });
  endSessionsOf(ctx.db, userId);
}
