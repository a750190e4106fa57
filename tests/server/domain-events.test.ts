import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { ServiceContext } from '../../server/context';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { appReactionsInstalled, createEventList, publish, type DomainEvent, type Reactions } from '../../server/events/domain-events';
import { installReactions, REACTIONS } from '../../server/events/reactions';

const deactivated: DomainEvent = { type: 'person.deactivated', userId: 7, at: new Date('2026-12-01T12:00:00Z') };

/** Every event with no reaction, but `overrides`. */
const reactions = (overrides: Partial<Reactions>): Reactions => ({ ...Object.fromEntries(Object.keys(REACTIONS).map((k) => [k, []])), ...overrides }) as unknown as Reactions;

let db: Database;
let ctx: ServiceContext;
const notes = () => db.$client.prepare('select text from note order by rowid').pluck().all();
const note = (c: ServiceContext, text: string) => c.db.$client.prepare('insert into note (text) values (?)').run(text);

beforeEach(() => {
  db = openDatabase(':memory:');
  db.$client.exec('create table note (text text not null)');
  ctx = { db, publicUrl: 'http://gripline.test', now: () => new Date('2026-12-01T12:00:00Z') };
});
afterEach(() => db.$client.close());

describe('the domain event list', () => {
  it('refuses to publish before the reactions are installed, naming the event and the fix', () => {
    const events = createEventList();
    expect(() => events.publish(ctx, deactivated)).toThrow(/"person\.deactivated" was published before the reactions were installed: call installReactions\(\)/);
  });

  it('runs the reactions to the event in their order, with the event, and no reactions to other events', () => {
    const events = createEventList();
    const seen: string[] = [];
    events.install(
      reactions({
        'person.deactivated': [(_c, e) => seen.push(`first ${e.userId}`), (_c, e) => seen.push(`second ${e.at.toISOString()}`)],
        'stock.received': [() => seen.push('stock')],
      }),
    );
    events.publish(ctx, deactivated);
    expect(seen).toEqual(['first 7', 'second 2026-12-01T12:00:00.000Z']);
  });

  it('runs the reactions inside the publisher’s transaction: they commit with its change', () => {
    const events = createEventList();
    events.install(reactions({ 'person.deactivated': [(c) => note(c, 'reaction')] }));
    db.transaction(() => {
      note(ctx, 'change');
      events.publish(ctx, deactivated);
      expect(db.$client.inTransaction).toBe(true);
    });
    expect(notes()).toEqual(['change', 'reaction']);
  });

  it('rolls the whole change back when a reaction throws, the publisher’s write and earlier reactions included', () => {
    const events = createEventList();
    events.install(
      reactions({
        'person.deactivated': [
          (c) => note(c, 'first reaction'),
          () => {
            throw new Error('the second reaction failed');
          },
        ],
      }),
    );
    expect(() =>
      db.transaction(() => {
        note(ctx, 'change');
        events.publish(ctx, deactivated);
      }),
    ).toThrow('the second reaction failed');
    expect(notes()).toEqual([]);
  });

  it('installs the same reactions once however often it is asked, and refuses a second, different table', () => {
    const events = createEventList();
    const table = reactions({});
    events.install(table);
    events.install(table);
    expect(events.installed()).toBe(true);
    expect(() => events.install(reactions({}))).toThrow(/already installed/);
  });

  it('installs the app’s reactions idempotently, after which publishing works', () => {
    migrateDatabase(db);
    installReactions();
    installReactions();
    expect(appReactionsInstalled()).toBe(true);
    expect(() => publish(ctx, { ...deactivated, userId: 999 })).not.toThrow();
  });
});
