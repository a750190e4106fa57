import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createBinBodySchema } from '@shared/schemas/bins';
import { insertUser } from '../../server/accounts/users.repo';
import type { ServiceContext } from '../../server/context';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import type { UserRow } from '../../server/db/schema/users';
import { insertNewBin } from '../../server/features/stock/bins.service';
import { findBinByCode } from '../../server/features/stock/bins.repo';
import { ledgerSum } from '../../server/features/stock/ledger.repo';
import { count, draw, ledgerFor, receive, returnUnused, reverse, writeOff } from '../../server/features/stock/ledger.service';
import { installReactions } from '../../server/events/reactions';
import { HttpError } from '../../server/lib/http-error';
import { blindRivetBin } from '../helpers/crib';

type Op =
  | { op: 'draw' | 'receive' | 'writeOff' | 'return'; who: number; n: number }
  | { op: 'count'; who: number; n: number }
  | { op: 'reverse'; who: number; pick: number };

const opArb: fc.Arbitrary<Op> = fc.oneof(
  fc.record({ op: fc.constantFrom<'draw' | 'receive' | 'writeOff' | 'return'>('draw', 'receive', 'writeOff', 'return'), who: fc.nat(2), n: fc.integer({ min: 1, max: 80 }) }),
  fc.record({ op: fc.constant<'count'>('count'), who: fc.nat(2), n: fc.nat(150) }),
  fc.record({ op: fc.constant<'reverse'>('reverse'), who: fc.nat(2), pick: fc.nat(1000) }),
);

function freshChapter() {
  installReactions();
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  let clock = new Date('2026-06-01T08:00:00Z');
  const ctx: ServiceContext = { db, publicUrl: 'http://x', now: () => (clock = new Date(clock.getTime() + 60_000)) };
  const people: UserRow[] = ['a', 'b', 'c'].map((n) => insertUser(db, { email: `${n}@example.org`, name: n.toUpperCase(), role: n === 'a' ? 'quartermaster' : 'member', passwordHash: 'x' }));
  return { db, ctx, people };
}

/** Runs one operation against the service and a plain model of the bin; returns whether the service refused it. */
function apply(ctx: ServiceContext, people: UserRow[], code: string, op: Op, model: { onHand: number; entries: { id: number; qty: number; member: number | null; kind: string; reversed: boolean }[] }) {
  const who = people[op.who]!;
  const netDrawn = (id: number) => -model.entries.filter((e) => e.member === id).reduce((s, e) => s + e.qty, 0);
  try {
    let m: { id: number; quantity: number; kind: string; member: { id: number } | null };
    switch (op.op) {
      case 'draw':
        m = draw(ctx, who, code, { quantity: op.n });
        break;
      case 'return':
        m = returnUnused(ctx, who, code, { quantity: op.n });
        break;
      case 'receive':
        m = receive(ctx, who, code, { quantity: op.n });
        break;
      case 'writeOff':
        m = writeOff(ctx, who, code, { quantity: op.n, note: 'damaged' });
        break;
      case 'count':
        m = count(ctx, who, code, { counted: op.n });
        break;
      case 'reverse': {
        const target = model.entries[op.pick % Math.max(1, model.entries.length)];
        if (!target) return 'skipped';
        m = reverse(ctx, who, code, target.id, { note: 'mistake' });
        target.reversed = true;
        break;
      }
    }
    model.entries.push({ id: m.id, qty: m.quantity, member: m.member?.id ?? null, kind: m.kind, reversed: false });
    model.onHand += m.quantity;
    return { accepted: m };
  } catch (err) {
    if (!(err instanceof HttpError) || err.status !== 409) throw err;
    // A refusal must have had a reason the model agrees with.
    if (op.op === 'draw' || op.op === 'writeOff') expect(op.n).toBeGreaterThan(model.onHand);
    if (op.op === 'return') expect(op.n).toBeGreaterThan(netDrawn(who.id));
    if (op.op === 'reverse') {
      const target = model.entries[op.pick % model.entries.length]!;
      // A draw whose member has returned more than their other draws cover cannot be reversed.
      const returnedAgainst = target.kind === 'draw' && target.member !== null && netDrawn(target.member) + target.qty < 0;
      const impossible = target.kind === 'reversal' || target.reversed || target.qty === 0 || model.onHand - target.qty < 0 || returnedAgainst;
      expect(impossible).toBe(true);
    }
    return { refused: err.code };
  }
}

/** What a member took from a bin less what went back, read straight from the entries (not clamped). */
const rawNetDrawn = (db: ReturnType<typeof openDatabase>, binId: number, memberId: number) =>
  (db.$client.prepare('select coalesce(sum(-quantity), 0) as n from stock_movements where bin_id = ? and member_id = ?').get(binId, memberId) as { n: number }).n;

describe('the ledger under random sequences of movements', () => {
  it('never leaves on hand or a member’s net drawn negative, and the balance always equals the ledger sum', () => {
    const seen = new Map<string, number>();
    const tally = (key: string) => seen.set(key, (seen.get(key) ?? 0) + 1);
    // One chapter for all runs (each run gets its own bin): migrating a database per run is slow on a busy machine.
    const { db, ctx, people } = freshChapter();
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 200 }), fc.array(opArb, { minLength: 10, maxLength: 40 }), (opening, ops) => {
        {
          const bin = insertNewBin(ctx, people[0]!, createBinBodySchema.parse(blindRivetBin({ initialQuantity: opening })));
          const model = { onHand: opening, entries: ledgerFor(ctx, people[0]!, bin.code).map((e) => ({ id: e.id, qty: e.quantity, member: null, kind: e.kind, reversed: false })) };
          for (const op of ops) {
            const result = apply(ctx, people, bin.code, op, model);
            tally(result === 'skipped' ? 'skipped' : 'accepted' in result ? `${op.op} accepted` : `${op.op} refused`);
            if (result !== 'skipped' && 'refused' in result) tally(result.refused ?? 'no code');
            const row = findBinByCode(db, bin.code)!;
            expect(row.onHand).toBeGreaterThanOrEqual(0);
            expect(row.onHand).toBe(ledgerSum(db, row.id));
            expect(row.onHand).toBe(model.onHand);
            // No member's tab on the bin goes below nothing: they never have back more than they took.
            for (const p of people) expect(rawNetDrawn(db, row.id, p.id), `net drawn by ${p.name}`).toBeGreaterThanOrEqual(0);
            if (result !== 'skipped' && 'accepted' in result && op.op === 'count') expect(row.onHand).toBe(op.n);
          }
          const ledger = ledgerFor(ctx, people[0]!, bin.code, undefined, undefined, 5000);
          expect(ledger.every((e) => e.balanceAfter >= 0)).toBe(true);
          // Newest first, and each entry's balance is the previous balance plus its quantity.
          const oldestFirst = [...ledger].reverse();
          oldestFirst.reduce((before, e) => {
            expect(e.balanceAfter).toBe(before + e.quantity);
            return e.balanceAfter;
          }, 0);
        }
      }),
      {
        numRuns: 120,
        // Always tried as well: a draw with a return against it, then the draw reversed (rare at random).
        examples: [[100, [{ op: 'draw', who: 1, n: 25 }, { op: 'return', who: 1, n: 5 }, { op: 'reverse', who: 0, pick: 1 }, ...Array.from({ length: 7 }, (): Op => ({ op: 'draw', who: 2, n: 1 }))]]],
      },
    );
    db.$client.close();
    // The runs exercised both sides of every rule, not just the easy path.
    for (const op of ['draw', 'writeOff', 'return', 'reverse']) {
      expect(seen.get(`${op} accepted`) ?? 0, `${op} accepted`).toBeGreaterThan(0);
      expect(seen.get(`${op} refused`) ?? 0, `${op} refused`).toBeGreaterThan(0);
    }
    expect(seen.get('count accepted') ?? 0).toBeGreaterThan(0);
    expect(seen.get('RETURN_AGAINST_DRAW') ?? 0, 'a draw refused for a return against it').toBeGreaterThan(0);
  }, 60_000);

  it('keeps every entry: the database refuses to change or delete one', () => {
    const { db, ctx, people } = freshChapter();
    const bin = insertNewBin(ctx, people[0]!, createBinBodySchema.parse(blindRivetBin()));
    const entry = draw(ctx, people[1]!, bin.code, { quantity: 10 });
    expect(() => db.$client.prepare('update stock_movements set quantity = 0 where id = ?').run(entry.id)).toThrow(/append-only/);
    expect(() => db.$client.prepare('delete from stock_movements where id = ?').run(entry.id)).toThrow(/append-only/);
    expect(() => db.$client.prepare('update bins set on_hand = -1 where id = ?').run(bin.id)).toThrow(/CHECK constraint/);
    expect(ledgerSum(db, bin.id)).toBe(490);
    db.$client.close();
  });
});
