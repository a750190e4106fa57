import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { CLIENT_DIR } from './main';

const ROOT = resolve(CLIENT_DIR, '..');
const CLIENT_SOURCES = ['src', 'shared', 'index.html', 'vite.config.ts', 'package-lock.json'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return Math.max(0, ...readdirSync(path).map((name) => newestMtime(join(path, name))));
}

/** Builds the client when dist/ is missing or older than its sources (npm start, npm run start:lan). */
export function buildClientWhenStale(): void {
  const builtAt = newestMtime(join(CLIENT_DIR, 'index.html'));
  const sourcesAt = Math.max(...CLIENT_SOURCES.map((p) => newestMtime(join(ROOT, p))));
  if (builtAt >= sourcesAt) return;
  console.log('Building the client…');
  const result = spawnSync(process.execPath, [join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], {
    cwd: ROOT,
    stdio: 'inherit',
  });
  if (result.status !== 0) process.exit(result.status ?? 1);
}
