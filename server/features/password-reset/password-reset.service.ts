import { claimAccountToken, insertAccountToken, revokeOpenTokens } from '../../accounts/account-tokens.repo';
import { linkUrl, openLinkToken } from '../../accounts/link-token.service';
import { hashLinkToken, newLinkToken } from '../../accounts/link-tokens';
import { hashPassword } from '../../accounts/passwords';
import { findUserByEmail, updateUser } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { endSessionsOf } from '../../lib/session-helpers';
import { passwordResetMail } from '../../mail/messages';

export const RESET_LIFETIME_MS = 60 * 60 * 1000;

/** Sends a reset link to an active account; says nothing about whether the address exists. */
export async function requestPasswordReset(ctx: ServiceContext, email: string): Promise<void> {
  const user = findUserByEmail(ctx.db, email);
  if (!user || user.deactivatedAt) return;
  const now = ctx.now();
  const token = newLinkToken();
  ctx.db.transaction((db) => {
    revokeOpenTokens(db, 'password_reset', user.email, now);
    insertAccountToken(db, {
      kind: 'password_reset',
      tokenHash: hashLinkToken(token),
      email: user.email,
      userId: user.id,
      createdAt: now,
      expiresAt: new Date(now.getTime() + RESET_LIFETIME_MS),
    });
  });
  await ctx.mailer.send(passwordResetMail(user.email, user.name, linkUrl(ctx, '/reset-password', token)));
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
    updateUser(db, userId, { passwordHash });
  });
  endSessionsOf(ctx.db, userId);
}
