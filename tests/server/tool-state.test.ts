import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { TOOL_STATUSES } from '@shared/tools/categories';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { tools } from '../../server/db/schema/tools';
import { insertTool, updateTool } from '../../server/features/tools/tools.repo';
import { canMove, moveTool, TOOL_TRANSITIONS } from '../../server/features/tools/tool-state';

const ROOT = join(import.meta.dirname, '../..');
const OWNER = 'server/features/tools/tool-state.ts';

function sourceFiles(dir: string): string[] {
  return readdirSync(join(ROOT, dir), { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(path);
    return e.name.endsWith('.ts') ? [path] : [];
  });
}

/** Each `update(tools)` chain up to where it runs, and each raw `update tools set …` statement. */
function toolWrites(text: string): string[] {
  const chains = [...text.matchAll(/update\(tools\)[\s\S]*?\.(?:run|get|all|prepare)\(/g)].map((m) => m[0]);
  const raw = [...text.matchAll(/update\s+tools\s+set[^;'"`]*/gi)].map((m) => m[0]);
  return [...chains, ...raw];
}

describe('tools.status has one writer', () => {
  it('is written nowhere in server/ but the state module', () => {
    const offenders = sourceFiles('server')
      .filter((file) => file !== OWNER)
      .flatMap((file) => toolWrites(readFileSync(join(ROOT, file), 'utf8')).filter((w) => /\bstatus\b|status_note|statusNote/.test(w)).map((w) => `${relative(ROOT, join(ROOT, file))}: ${w.slice(0, 80)}`));
    expect(offenders).toEqual([]);
  });

  it('leaves missing accessories to their one module too', () => {
    const writers = sourceFiles('server').filter((file) => /(insert|update|delete)\(missingAccessories\)/.test(readFileSync(join(ROOT, file), 'utf8')));
    expect(writers).toEqual(['server/features/tools/missing-accessories.ts']);
  });

  it('finds such a write when one is there (the scan itself can fail)', () => {
    expect(toolWrites("ctx.db.update(tools).set({ status: 'available' }).where(eq(tools.id, 1)).run();")).toHaveLength(1);
    expect(toolWrites("db.prepare('UPDATE tools SET status = ? WHERE id = ?')")).toHaveLength(1);
  });
});

describe('the transition table', () => {
  let db: Database;
  beforeEach(() => {
    db = openDatabase(':memory:');
    migrateDatabase(db);
  });
  afterEach(() => db.$client.close());

  const at = new Date('2026-12-01T12:00:00Z');

  it('leads only to known states, from known states', () => {
    for (const rule of Object.values(TOOL_TRANSITIONS)) {
      expect(TOOL_STATUSES).toContain(rule.to);
      for (const from of rule.from) expect(TOOL_STATUSES).toContain(from);
    }
  });

  it('moves a tool and records the audit entry with from and to; refuses a move the table does not have and writes nothing', () => {
    const row = insertTool(db, { code: 'T-0001', name: 'Rivet gun', category: 'rivet_gun', createdAt: at, updatedAt: at });
    const held = moveTool(db, row, 'offer', { actorId: null, at, detail: 'Set aside' });
    expect(held.status).toBe('held');
    expect(() => moveTool(db, held, 'found', { actorId: null, at, detail: 'x' })).toThrow(/is held for the next person, so it cannot be marked found now/);
    const lost = moveTool(db, held, 'mark_lost', { actorId: null, at, detail: 'Not in the drawer' });
    expect(db.select().from(tools).get()).toMatchObject({ status: 'lost', statusNote: 'Not in the drawer' });
    expect(canMove(lost, 'offer_ended')).toBe(false);
    const events = db.$client.prepare('select action, from_status as fromStatus, to_status as toStatus from tool_events order by id').all();
    expect(events).toEqual([
      { action: 'held', fromStatus: 'available', toStatus: 'held' },
      { action: 'lost', fromStatus: 'held', toStatus: 'lost' },
    ]);
  });

  it('refuses a move made from a state the tool is no longer in (compare and set)', () => {
    const row = insertTool(db, { code: 'T-0001', name: 'Rivet gun', category: 'rivet_gun', createdAt: at, updatedAt: at });
    moveTool(db, row, 'offer', { actorId: null, at, detail: 'Set aside' });
    expect(() => moveTool(db, row, 'check_out', { actorId: null, at, detail: 'stale' })).toThrow(/changed meanwhile/);
    expect(db.select().from(tools).get()?.status).toBe('held');
  });

  it('guards a held tool: only the person it is set aside for takes it', () => {
    const row = insertTool(db, { code: 'T-0001', name: 'Rivet gun', category: 'rivet_gun', createdAt: at, updatedAt: at });
    const held = moveTool(db, row, 'offer', { actorId: null, at, detail: 'Set aside' });
    expect(() => moveTool(db, held, 'check_out', { actorId: null, at, detail: 'x', facts: { offeredToActor: false } })).toThrow(/set aside for someone else/);
    expect(moveTool(db, held, 'check_out', { actorId: null, at, detail: 'x', facts: { offeredToActor: true } }).status).toBe('on_loan');
  });

  it('keeps the state out of the catalogue writes: an edit cannot set a status', () => {
    const row = insertTool(db, { code: 'T-0001', name: 'Rivet gun', category: 'rivet_gun', createdAt: at, updatedAt: at, ...({ status: 'lost' } as object) });
    expect(row.status).toBe('available');
    expect(updateTool(db, row.id, { name: 'Rivet gun 3X', ...({ status: 'retired' } as object) }).status).toBe('available');
  });
});
