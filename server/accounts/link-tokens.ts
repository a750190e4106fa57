import { createHash, randomBytes } from 'node:crypto';

/** 256 random bits, base64url (43 characters): the secret in an e-mailed link. */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
