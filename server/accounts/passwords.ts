import argon2 from 'argon2';

/** OWASP Password Storage Cheat Sheet: argon2id, m = 19456 KiB, t = 2, p = 1. */
export const ARGON2_OPTIONS = {
  type: argon2.argon2id,
  memoryCost: 19456,
  timeCost: 2,
  parallelism: 1,
} as const;

export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, ARGON2_OPTIONS);
}

export function verifyPassword(hash: string, password: string): Promise<boolean> {
  return argon2.verify(hash, password);
}

/**
 * A hash of a random password, verified against when the e-mail is unknown so that a wrong
 * e-mail takes as long as a wrong password.
 */
let decoy: Promise<string> | undefined;
export function decoyHash(): Promise<string> {
  decoy ??= hashPassword(`decoy-${Math.random()}-${Date.now()}`);
  return decoy;
}
