import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

/**
 * SESSION_SECRET when set; otherwise a random secret kept beside the database file, so
 * sign-ins survive a restart of a demo or development server.
 */
export function resolveSessionSecret(configured: string | undefined, databasePath: string): string {
  if (configured) return configured;
  if (databasePath === ':memory:') return randomBytes(32).toString('base64url');
  const file = `${databasePath}.session-secret`;
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
