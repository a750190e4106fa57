import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

/**
 * The scripts and styles the sign-in page and the member's home page need before they render, as
 * sent to a browser that accepts brotli, stay within this many bytes in all. Fonts are not counted:
 * they swap in after the first paint.
 */
const BUDGET_BYTES = 150_000;

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const DIST = join(ROOT, 'dist');

/**
 * The route modules each first page renders. One bundled into the entry costs nothing more; one
 * loaded lazily brings its chunk, that chunk's imports and their styles into the count.
 */
const FIRST_PAGES: Record<string, string[]> = {
  'sign-in': ['src/app/routes/auth/sign-in.tsx'],
  'member home': ['src/app/routes/app/app-shell.tsx', 'src/app/routes/app/home.tsx'],
};

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

function readManifest(): Manifest {
  const path = join(DIST, '.vite', 'manifest.json');
  if (!existsSync(path)) throw new Error('dist/.vite/manifest.json is missing: run `npm run build` first (npm test does).');
  return JSON.parse(readFileSync(path, 'utf8')) as Manifest;
}

/** A chunk's file, its styles, and everything it imports statically, transitively. */
function staticClosure(manifest: Manifest, key: string, files: Set<string>, seen = new Set<string>()): Set<string> {
  if (seen.has(key)) return files;
  seen.add(key);
  const chunk = manifest[key];
  if (!chunk) throw new Error(`The manifest names ${key} but has no entry for it.`);
  files.add(chunk.file);
  for (const css of chunk.css ?? []) files.add(css);
  for (const imported of chunk.imports ?? []) staticClosure(manifest, imported, files, seen);
  return files;
}

/** What index.html itself asks for before anything runs: the entry script, preloads, styles. */
function referencedByPage(): string[] {
  const html = readFileSync(join(DIST, 'index.html'), 'utf8');
  return [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.(?:js|css))"/g)].map((m) => m[1]!);
}

/** Bytes as sent with brotli: the build's .br copy, or the file itself where no copy was worth making. */
function sentBytes(file: string): { raw: number; sent: number } {
  const raw = statSync(join(DIST, file)).size;
  const br = join(DIST, `${file}.br`);
  return { raw, sent: existsSync(br) ? statSync(br).size : raw };
}

function firstLoad() {
  const manifest = readManifest();
  const entryKey = Object.keys(manifest).find((key) => manifest[key]!.isEntry);
  if (!entryKey) throw new Error('The manifest has no entry chunk.');
  const entryFiles = staticClosure(manifest, entryKey, new Set(referencedByPage()));

  const neededBy = new Map<string, Set<string>>();
  for (const [page, modules] of Object.entries(FIRST_PAGES)) {
    const files = new Set(entryFiles);
    for (const module of modules) {
      if (!existsSync(join(ROOT, module))) throw new Error(`${module} is gone: point FIRST_PAGES at the module the ${page} route renders now.`);
      if (manifest[module]) staticClosure(manifest, module, files);
    }
    for (const file of files) neededBy.set(file, (neededBy.get(file) ?? new Set()).add(page));
  }
  const rows = [...neededBy].map(([file, pages]) => ({ file, pages: [...pages].join(', '), ...sentBytes(file) })).sort((a, b) => b.sent - a.sent);
  return { manifest, entryKey, rows, total: rows.reduce((sum, row) => sum + row.sent, 0) };
}

function breakdown(rows: ReturnType<typeof firstLoad>['rows'], total: number): string {
  const kb = (n: number) => `${(n / 1000).toFixed(1)} KB`.padStart(9);
  const lines = rows.map((r) => `${kb(r.sent)} ${kb(r.raw)}  ${r.file}  (${r.pages})`);
  return ['   brotli       raw  file  (needed by)', ...lines, `${kb(total)} of ${(BUDGET_BYTES / 1000).toFixed(0)} KB budget`].join('\n');
}

describe('first-load budget', () => {
  it(`sends the sign-in and member home pages' scripts and styles in at most ${BUDGET_BYTES / 1000} KB (brotli)`, () => {
    const { rows, total } = firstLoad();
    console.log(`First load of the sign-in and member home pages:\n${breakdown(rows, total)}`);
    expect(rows.some((r) => r.file.endsWith('.css'))).toBe(true);
    expect(total, `over the first-load budget:\n${breakdown(rows, total)}`).toBeLessThanOrEqual(BUDGET_BYTES);
  });

  it('counts a first page that the router loads lazily, with its imports', () => {
    const { manifest, entryKey } = firstLoad();
    const lazyPages = manifest[entryKey]!.dynamicImports ?? [];
    // The lead's and quartermaster's pages are lazy chunks of their own, outside the first load...
    expect(lazyPages).toEqual(expect.arrayContaining(['src/app/routes/app/people.tsx', 'src/app/routes/app/labels.tsx', 'src/app/routes/app/scan.tsx']));
    // ...and each of them would be counted in full if a first page were one of them.
    const scan = staticClosure(manifest, 'src/app/routes/app/scan.tsx', new Set());
    expect(scan.has(manifest['src/app/routes/app/scan.tsx']!.file)).toBe(true);
    expect(scan.has(manifest[entryKey]!.file)).toBe(true);
  });
});
