import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * One length of a day: `DAY_MS` lives in shared/time/durations.ts and calendar days go through
 * shared/time/chapter-time.ts. A hand-made day constant anywhere else is a second idea of "a day".
 */
const root = join(__dirname, '../..');
const HAND_MADE_DAY = /const\s+DAY_MS\b|24\s*\*\s*60\s*\*\s*60|\b86_?400_?000\b|\b864e5\b/;

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sources(path);
    return /\.(ts|tsx)$/.test(entry.name) ? [path] : [];
  });
}

const handMadeDays = (dirs: string[]) =>
  dirs
    .flatMap((dir) => sources(join(root, dir)))
    .map((file) => relative(root, file))
    .filter((file) => !file.startsWith(join('shared', 'time')))
    .flatMap((file) =>
      readFileSync(join(root, file), 'utf8')
        .split('\n')
        .flatMap((line, i) => (HAND_MADE_DAY.test(line) ? [`${file}:${i + 1}: ${line.trim()}`] : [])),
    );

describe('the length of a day', () => {
  it('is defined once, in shared/time: no other DAY_MS or 24 × 60 × 60 in server/, src/ or shared/', () => {
    expect(handMadeDays(['server', 'src', 'shared'])).toEqual([]);
  });

  it('would catch one: the patterns match, and the scan finds the test files’ own day constants', () => {
    for (const line of ['const DAY_MS = 86_400_000;', 'const ms = 7 * 24 * 60 * 60 * 1000;', 'at + 86400000', 'const WEEK = 7 * 864e5;']) {
      expect(HAND_MADE_DAY.test(line), line).toBe(true);
    }
    expect(handMadeDays(['tests/server']).some((line) => line.startsWith(join('tests', 'server', 'overdue.routes.test.ts')))).toBe(true);
  });
});
