import { describe, expect, it } from 'vitest';
import { migrateDatabase } from '../../server/db/client';
import { withDatabaseBefore } from '../helpers/migrations-before';

describe('migration online_payment_expired', () => {
  it('rebuilds online_payments with the expired state and keeps every row, its payment and its foreign keys', () => {
    withDatabaseBefore('_online_payment_expired', (db) => {
      const sql = db.$client;
      sql.prepare("insert into users (id, email, name, role, password_hash) values (7, 'mia@example.org', 'Mia', 'member', 'x')").run();
      sql.prepare("insert into member_payments (id, user_id, amount_cents, at, note, recorded_by_id) values (3, 7, 1440, 1, 'Paid online', 7)").run();
      const insert = sql.prepare('insert into online_payments (session_id, event_id, user_id, amount_cents, currency, state, member_payment_id, created_at, updated_at) values (?, ?, 7, ?, ?, ?, ?, 1, 2)');
      insert.run('cs_test_paid', 'evt_paid', 1440, 'usd', 'paid', 3);
      insert.run('cs_test_open', null, 500, 'usd', 'open', null);
      expect(() => insert.run('cs_test_x', null, 500, 'usd', 'expired', null)).toThrow(/CHECK constraint/);

      migrateDatabase(db);
      expect(sql.prepare('select session_id, event_id, user_id, amount_cents, state, member_payment_id from online_payments order by id').all()).toEqual([
        { session_id: 'cs_test_paid', event_id: 'evt_paid', user_id: 7, amount_cents: 1440, state: 'paid', member_payment_id: 3 },
        { session_id: 'cs_test_open', event_id: null, user_id: 7, amount_cents: 500, state: 'open', member_payment_id: null },
      ]);
      sql.prepare("update online_payments set state = 'expired' where session_id = 'cs_test_open'").run();
      expect(() => sql.prepare("update online_payments set state = 'lost' where session_id = 'cs_test_open'").run()).toThrow(/CHECK constraint/);
      expect(() => insert.run('cs_test_paid', null, 500, 'usd', 'open', null)).toThrow(/UNIQUE constraint/);
      expect(() => sql.prepare("insert into online_payments (session_id, user_id, amount_cents, currency, created_at, updated_at) values ('cs_test_nobody', 99, 500, 'usd', 1, 1)").run()).toThrow(/FOREIGN KEY/);
    });
  });
});
