import { decoyHash, verifyPassword } from '../../accounts/passwords';
import { findUserByEmail } from '../../accounts/users.repo';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';

const BAD_CREDENTIALS = 'That e-mail and password do not match an account. Check both, or reset your password.';

/** Checks e-mail and password; an unknown e-mail costs the same hash as a wrong password. */
export async function authenticate(ctx: ServiceContext, email: string, password: string): Promise<UserRow> {
  const user = findUserByEmail(ctx.db, email);
  const ok = await verifyPassword(user?.passwordHash ?? (await decoyHash()), password);
  if (!user || !ok) throw new HttpError(401, 'BAD_CREDENTIALS', BAD_CREDENTIALS);
  if (user.deactivatedAt) {
    throw new HttpError(403, 'ACCOUNT_DEACTIVATED', 'This account has been deactivated. Ask your chapter lead to reactivate it.');
  }
  return user;
}
