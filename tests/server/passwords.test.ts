import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from '../../server/accounts/passwords';

describe('password hashing', () => {
  it('uses argon2id with m = 19456 KiB, t = 2, p = 1', async () => {
    const hash = await hashPassword('gripline-demo');
    // OWASP Password Storage Cheat Sheet: argon2id, m=19456 (19 MiB), t=2, p=1.
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=19456,p=1,t=2\$/);
  });

  it('verifies the right password and refuses a wrong one', async () => {
    const hash = await hashPassword('correct horse battery');
    expect(await verifyPassword(hash, 'correct horse battery')).toBe(true);
    expect(await verifyPassword(hash, 'correct horse batterz')).toBe(false);
  });

  it('salts every hash', async () => {
    expect(await hashPassword('same words')).not.toBe(await hashPassword('same words'));
  });
});
