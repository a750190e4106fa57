import { createHash, randomBytes } from 'node:crypto';
import { MASKED_TOKEN } from '@shared/schemas/mail';

/** 256 random bits, base64url (43 characters): the secret in an e-mailed link. */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** The page each kind of e-mailed link opens, with the token as its last part. */
export const LINK_PAGES = { invitation: '/invite', password_reset: '/reset-password' } as const;

const RESET_LINK_TOKEN = new RegExp(`(${LINK_PAGES.password_reset}/)[A-Za-z0-9_-]+`, 'g');

/**
 * A reset link signs its holder in as an existing account, so only the person it was sent to may
 * read it whole; anyone else (a lead reading Sent mail) sees it masked.
 */
export function maskResetLinks(text: string): string {
  return text.replace(RESET_LINK_TOKEN, `$1${MASKED_TOKEN}`);
}
