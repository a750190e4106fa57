import type { UserRow } from '../db/schema/users';
import { hashPassword, verifyPassword } from './passwords';

/** A station PIN is kept like a password: an argon2id hash, never the digits. */
export function hashPin(pin: string): Promise<string> {
  return hashPassword(pin);
}

/** Whether the PIN is this person's; false when they have none. */
export async function verifyPin(user: Pick<UserRow, 'pinHash'>, pin: string): Promise<boolean> {
  if (user.pinHash === null) return false;
  return verifyPassword(user.pinHash, pin);
}
