import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import BetterSqlite3 from 'better-sqlite3';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { backupFileName, parseBackupName } from '../../server/backup/backup-names';
import { BackupError, knownMigrations } from '../../server/backup/database-file';
import { runNightlyBackup } from '../../server/backup/nightly-backup';
import { restoreDatabase } from '../../server/backup/restore';
import { backupsToDelete } from '../../server/backup/retention';
import { backupDirFor, takeBackup } from '../../server/backup/take-backup';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { readEnv } from '../../server/env';
import { receive } from '../../server/features/stock/ledger.service';
import { findUserByEmail } from '../../server/accounts/users.repo';
import { createSmtpMailer } from '../../server/mail/mailer';
import { startGripline } from '../../server/main';
import { seedDemoChapter } from '../../server/seed/demo-chapter';

let dir: string;
let dbPath: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'gripline-backup-'));
  dbPath = join(dir, 'gripline.db');
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

/** A migrated Gripline database file with a table of numbered writes the test owns. */
function makeDatabase(path = dbPath): BetterSqlite3.Database {
  const db = openDatabase(path);
  migrateDatabase(db);
  db.$client.exec('create table test_writes (n integer primary key); create table test_total (id integer primary key check (id = 1), total integer not null); insert into test_total values (1, 0);');
  return db.$client;
}

const numbers = (path: string): number[] => {
  const sqlite = new BetterSqlite3(path, { readonly: true });
  try {
    return (sqlite.prepare('select n from test_writes order by n').all() as { n: number }[]).map((r) => r.n);
  } finally {
    sqlite.close();
  }
};
const write = (sqlite: BetterSqlite3.Database, n: number) => sqlite.prepare('insert into test_writes (n) values (?)').run(n);

/** A second connection on its own thread committing numbered writes as fast as it can; `written` is the last acknowledged. */
function startWriter(path: string) {
  const shared = new Int32Array(new SharedArrayBuffer(8));
  const worker = new Worker(
    `const { workerData } = require('node:worker_threads');
     const Database = require(workerData.driver);
     const db = new Database(workerData.path, { timeout: 5000 });
     const add = db.transaction((n) => {
       db.prepare('insert into test_writes (n) values (?)').run(n);
       db.prepare('update test_total set total = total + ? where id = 1').run(n);
     });
     for (let n = 1; Atomics.load(workerData.shared, 1) === 0; n++) { add(n); Atomics.store(workerData.shared, 0, n); }
     db.close();`,
    { eval: true, workerData: { path, shared, driver: require.resolve('better-sqlite3') } },
  );
  const done = new Promise((ok, fail) => worker.once('exit', ok).once('error', fail));
  return {
    written: () => Atomics.load(shared, 0),
    async stop() {
      Atomics.store(shared, 1, 1);
      await done;
    },
  };
}

async function waitFor(check: () => boolean) {
  for (let i = 0; i < 500 && !check(); i++) await new Promise((ok) => setTimeout(ok, 10));
  expect(check()).toBe(true);
}

/** About 24 MB the test owns, so a copy takes long enough for the writer to commit during it. */
const PADDING = 'create table test_padding (b blob); with recursive i(x) as (select 1 union all select x + 1 from i where x < 600) insert into test_padding select randomblob(40000) from i;';

describe('takeBackup', () => {
  it('copies the database while another connection keeps writing: the copy passes integrity_check, is one consistent moment and holds every write acknowledged before it began', async () => {
    const live = makeDatabase();
    live.exec(PADDING);
    const writer = startWriter(dbPath);
    const source = new BetterSqlite3(dbPath, { fileMustExist: true });
    try {
      await waitFor(() => writer.written() >= 200);
      const acknowledgedBefore = writer.written();
      const { file } = await takeBackup(source, join(dir, 'backups'), new Date(2026, 11, 3, 2, 30));
      const writtenDuring = writer.written() - acknowledgedBefore;
      await writer.stop();

      expect(file).toBe(join(dir, 'backups', 'gripline-2026-12-03T0230.db'));
      const copy = new BetterSqlite3(file, { readonly: true });
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(copy.pragma('journal_mode', { simple: true })).toBe('delete');
      const copied = (copy.prepare('select n from test_writes order by n').all() as { n: number }[]).map((r) => r.n);
      const { total } = copy.prepare('select total from test_total').get() as { total: number };
      copy.close();

      expect(writtenDuring).toBeGreaterThan(0);
      expect(copied.length).toBeGreaterThanOrEqual(acknowledgedBefore);
      expect(copied).toEqual(Array.from({ length: copied.length }, (_, i) => i + 1));
      // Both tables of each transaction, from the same moment: the total is the sum of the rows copied.
      expect(total).toBe((copied.length * (copied.length + 1)) / 2);
      expect(readdirSync(join(dir, 'backups'))).toEqual(['gripline-2026-12-03T0230.db']);
    } finally {
      await writer.stop();
      source.close();
      live.close();
    }
  });

  it('copies the demo chapter while a member draws from a bin through the ledger service on another thread: every acknowledged draw is in the copy and every bin balances', async () => {
    const db = openDatabase(dbPath);
    migrateDatabase(db);
    expect(await seedDemoChapter(db)).toBe(true);
    const ctx = { db, mailer: createSmtpMailer('smtp://127.0.0.1:9', 'test@example.org'), publicUrl: 'http://gripline.test', now: () => new Date() };
    const binCode = db.$client.prepare('select code from bins order by id limit 1').pluck().get() as string;
    receive(ctx, findUserByEmail(db, 'quartermaster@example.org')!, binCode, { quantity: 1_000_000 });
    ctx.mailer.close();
    db.$client.exec(PADDING);

    const shared = new Int32Array(new SharedArrayBuffer(8));
    // The worker runs the app's TypeScript through tsx, as `npm start` does.
    const worker = new Worker(`require('tsx/cjs/api').register(); require(${JSON.stringify(join(import.meta.dirname, '../helpers/ledger-draw-writer.ts'))});`, {
      eval: true,
      workerData: { path: dbPath, binCode, email: 'member@example.org', shared },
    });
    const done = new Promise((ok, fail) => worker.once('exit', ok).once('error', fail));
    try {
      await waitFor(() => Atomics.load(shared, 0) >= 50);
      const acknowledgedBefore = Atomics.load(shared, 0);
      const { file } = await takeBackup(db.$client, join(dir, 'backups'), new Date(2026, 11, 3, 2, 30));
      const drawnDuring = Atomics.load(shared, 0) - acknowledgedBefore;
      Atomics.store(shared, 1, 1);
      await done;

      const copy = new BetterSqlite3(file, { readonly: true });
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      const notes = copy.prepare(`select note from stock_movements where note like 'stream %' order by id`).pluck().all() as string[];
      const unbalanced = copy
        .prepare('select b.code from bins b where b.on_hand != (select coalesce(sum(m.quantity), 0) from stock_movements m where m.bin_id = b.id)')
        .pluck()
        .all();
      copy.close();

      expect(drawnDuring).toBeGreaterThan(0);
      expect(notes.length).toBeGreaterThanOrEqual(acknowledgedBefore);
      expect(notes).toEqual(Array.from({ length: notes.length }, (_, i) => `stream ${i + 1}`));
      expect(unbalanced).toEqual([]);
    } finally {
      Atomics.store(shared, 1, 1);
      await done;
      db.$client.close();
    }
    // Seeding the demo chapter takes ≈ 3.5 s alone; a full run on two shared cores needs room.
  }, 20_000);

  it('is needed because a copy of the database file alone misses the writes still in the -wal file', () => {
    const live = makeDatabase();
    live.pragma('wal_checkpoint(TRUNCATE)');
    for (let n = 1; n <= 20; n++) write(live, n);
    copyFileSync(dbPath, join(dir, 'plain-copy.db'));
    expect(numbers(join(dir, 'plain-copy.db'))).toEqual([]);
    expect(numbers(dbPath)).toHaveLength(20);
    live.close();
  });

  it('goes to BACKUP_DIR, or backups/ beside the database', () => {
    expect(backupDirFor(readEnv({ DATABASE_PATH: '/srv/crib/gripline.db' }))).toBe('/srv/crib/backups');
    expect(backupDirFor(readEnv({ DATABASE_PATH: '/srv/crib/gripline.db', BACKUP_DIR: '/mnt/usb/crib' }))).toBe('/mnt/usb/crib');
  });
});

describe('backup names', () => {
  it('carry the server local date and time to the minute', () => {
    expect(backupFileName(new Date(2026, 11, 3, 2, 30))).toBe('gripline-2026-12-03T0230.db');
    expect(backupFileName(new Date(2027, 0, 9, 23, 5))).toBe('gripline-2027-01-09T2305.db');
  });

  it('read back as the day and the ISO week, the year of the week being its Thursday\'s', () => {
    expect(parseBackupName('gripline-2026-12-03T0230.db')).toMatchObject({ day: '2026-12-03', week: '2026-W49' });
    expect(parseBackupName('gripline-2027-01-01T0300.db')?.week).toBe('2026-W53');
    expect(parseBackupName('gripline-2024-12-30T0300.db')?.week).toBe('2025-W01');
    for (const other of ['gripline-2026-02-30T0300.db', 'gripline-2026-12-03T0230.db.partial', 'gripline.before-restore-2026-12-03T0930.db', 'notes.txt']) {
      expect(parseBackupName(other)).toBeUndefined();
    }
  });
});

const nightly = (from: Date, days: number) =>
  Array.from({ length: days }, (_, i) => backupFileName(new Date(from.getFullYear(), from.getMonth(), from.getDate() + i, 3, 0)));

describe('backupsToDelete (7 daily, 4 weekly)', () => {
  it('keeps a week of nightly copies whole', () => {
    expect(backupsToDelete(nightly(new Date(2026, 10, 27), 7))).toEqual([]);
  });

  it('keeps the newest copy of each of the last 7 days and of each of the last 4 ISO weeks', () => {
    const all = nightly(new Date(2026, 9, 25), 40); // 25 October to 3 December 2026, a Thursday
    const kept = all.filter((name) => !backupsToDelete(all).includes(name));
    expect(kept).toEqual([
      'gripline-2026-11-15T0300.db', // Sunday, week 46
      'gripline-2026-11-22T0300.db', // Sunday, week 47
      ...['11-27', '11-28', '11-29', '11-30', '12-01', '12-02', '12-03'].map((d) => `gripline-2026-${d}T0300.db`),
    ]);
  });

  it('keeps only the newest of several copies in one day', () => {
    const names = ['gripline-2026-12-03T0300.db', 'gripline-2026-12-03T1215.db', 'gripline-2026-12-03T0930.db', 'gripline-2026-12-02T0300.db'];
    expect(backupsToDelete(names).sort()).toEqual(['gripline-2026-12-03T0300.db', 'gripline-2026-12-03T0930.db']);
  });

  it('counts days and weeks that have a copy, so a server back after a month off keeps its history', () => {
    const old = nightly(new Date(2026, 9, 1), 10); // 1 to 10 October
    const names = [...old, 'gripline-2026-12-03T0300.db'];
    expect(backupsToDelete(names)).toEqual(['gripline-2026-10-03T0300.db', 'gripline-2026-10-02T0300.db', 'gripline-2026-10-01T0300.db']);
  });

  it('never lists a file that is not named like a backup', () => {
    const names = [...nightly(new Date(2026, 9, 1), 60), 'notes.txt', 'gripline.before-restore-2026-10-02T0930.db', 'keep-gripline-2026-10-01T0300.db'];
    const deleted = backupsToDelete(names);
    // 1 October to 29 November, a Sunday: the 7 days are one ISO week, so 3 older weeks add a copy each.
    expect(deleted.length).toBe(60 - 10);
    expect(deleted.every((name) => parseBackupName(name) !== undefined)).toBe(true);
  });
});

describe('runNightlyBackup', () => {
  it('takes a checked backup, then deletes what the rule no longer keeps', async () => {
    const live = makeDatabase();
    write(live, 1);
    const backups = join(dir, 'backups');
    await takeBackup(live, backups, new Date(2026, 10, 1, 3, 0));
    for (const name of nightly(new Date(2026, 10, 2), 31)) copyFileSync(join(backups, 'gripline-2026-11-01T0300.db'), join(backups, name));
    writeFileSync(join(backups, 'README.txt'), 'kept by hand');

    const result = await runNightlyBackup(live, backups, new Date(2026, 11, 3, 3, 0));
    live.close();

    expect(result.file).toBe('gripline-2026-12-03T0300.db');
    expect(numbers(join(backups, result.file))).toEqual([1]);
    expect(readdirSync(backups).sort()).toEqual([
      'README.txt',
      'gripline-2026-11-15T0300.db',
      'gripline-2026-11-22T0300.db',
      ...['11-27', '11-28', '11-29', '11-30', '12-01', '12-02', '12-03'].map((d) => `gripline-2026-${d}T0300.db`),
    ]);
    expect(result.deleted).toHaveLength(33 - 9);
  });
});

describe('restoreDatabase', () => {
  const now = new Date(2026, 11, 3, 9, 30);
  const keptName = 'gripline.before-restore-2026-12-03T0930.db';

  async function backupWith(rows: number[]): Promise<string> {
    const live = makeDatabase(join(dir, 'source.db'));
    for (const n of rows) write(live, n);
    const { file } = await takeBackup(live, join(dir, 'backups'), new Date(2026, 11, 3, 3, 0));
    live.close();
    return file;
  }

  it('puts a backup back and keeps the database it replaced, recent writes included', async () => {
    const backup = await backupWith([1, 2]);
    const live = makeDatabase();
    for (const n of [7, 8, 9]) write(live, n);
    live.close();

    expect(restoreDatabase({ file: backup, databasePath: dbPath, now })).toEqual({ keptAs: join(dir, keptName) });
    expect(numbers(dbPath)).toEqual([1, 2]);
    expect(numbers(join(dir, keptName))).toEqual([7, 8, 9]);
    expect(readdirSync(dir).filter((f) => f.startsWith('gripline.db'))).toEqual(['gripline.db']);
    // The restored database opens and migrates like any other.
    const reopened = openDatabase(dbPath);
    migrateDatabase(reopened);
    reopened.$client.close();
  });

  it('folds the -wal of a server that was killed into the copy it keeps, and leaves no stale -wal or -shm beside the restored one', async () => {
    const backup = await backupWith([1]);
    makeDatabase().close();
    // A process killed mid-work leaves its last writes in gripline.db-wal.
    const crash = `const D = require(${JSON.stringify(require.resolve('better-sqlite3'))}); const db = new D(${JSON.stringify(dbPath)});
      for (let n = 100; n < 110; n++) db.prepare('insert into test_writes (n) values (?)').run(n); process.kill(process.pid, 'SIGKILL');`;
    expect(() => execFileSync(process.execPath, ['-e', crash], { stdio: 'ignore' })).toThrow();
    expect(readFileSync(`${dbPath}-wal`).length).toBeGreaterThan(0);

    restoreDatabase({ file: backup, databasePath: dbPath, now });

    expect(existsSync(`${dbPath}-wal`)).toBe(false);
    expect(existsSync(`${dbPath}-shm`)).toBe(false);
    expect(numbers(dbPath)).toEqual([1]);
    expect(existsSync(join(dir, `${keptName}-wal`))).toBe(false);
    expect(numbers(join(dir, keptName))).toEqual(Array.from({ length: 10 }, (_, i) => 100 + i));
  });

  it('refuses while Gripline is running on the database, and restores once it has stopped', async () => {
    const backup = await backupWith([1]);
    makeDatabase().close();
    const running = await startGripline(readEnv({ DATABASE_PATH: dbPath, PORT: '0', HOST: '127.0.0.1', SEED_DEMO: 'false', LOG_LEVEL: 'silent' }));
    try {
      expect(() => restoreDatabase({ file: backup, databasePath: dbPath, now })).toThrow(/is open in another process: stop Gripline/);
      expect(existsSync(join(dir, keptName))).toBe(false);
      expect(readdirSync(dir).some((f) => f.includes('.restoring'))).toBe(false);
    } finally {
      await running.close();
    }
    restoreDatabase({ file: backup, databasePath: dbPath, now });
    expect(numbers(dbPath)).toEqual([1]);
  });

  it('refuses a damaged backup, a file that is not a database, one that is not Gripline\'s and one from a newer Gripline, leaving the database as it was', async () => {
    const backup = await backupWith([1]);
    const live = makeDatabase();
    write(live, 5);
    live.close();

    const damaged = join(dir, 'damaged.db');
    const bytes = readFileSync(backup);
    bytes.fill(0x5a, 4096 * 2, 4096 * 6);
    writeFileSync(damaged, bytes);
    const text = join(dir, 'notes.db');
    writeFileSync(text, 'not a database at all, just some words typed into a file that is long enough');
    const foreign = join(dir, 'foreign.db');
    new BetterSqlite3(foreign).exec('create table t (x)').close();
    const newer = join(dir, 'newer.db');
    copyFileSync(backup, newer);
    const later = new BetterSqlite3(newer);
    later.prepare('insert into __drizzle_migrations (hash, created_at) values (?, ?)').run('f'.repeat(64), Date.now());
    later.close();

    const cases: [string, RegExp][] = [
      [damaged, /is damaged|cannot be read as a database/],
      [text, /cannot be read as a database/],
      [foreign, /is not a Gripline database/],
      [newer, new RegExp(`taken by a newer Gripline \\(${knownMigrations().length + 1} migrations`)],
      [join(dir, 'missing.db'), /does not exist/],
    ];
    for (const [file, message] of cases) {
      expect(() => restoreDatabase({ file, databasePath: dbPath, now })).toThrow(BackupError);
      expect(() => restoreDatabase({ file, databasePath: dbPath, now })).toThrow(message);
    }
    expect(numbers(dbPath)).toEqual([5]);
    expect(readdirSync(dir).filter((f) => f.includes('before-restore') || f.includes('.restoring'))).toEqual([]);
  });
});

describe('npm run backup and npm run restore', () => {
  const run = (script: string, args: string[] = []) =>
    spawnSync(join(process.cwd(), 'node_modules/.bin/tsx'), [`server/backup/${script}`, ...args], {
      env: { ...process.env, DATABASE_PATH: dbPath, BACKUP_DIR: join(dir, 'copies'), LOG_LEVEL: 'silent' },
      encoding: 'utf8',
    });

  it('back up while Gripline runs, refuse to restore until it stops, then restore', async () => {
    makeDatabase().close();
    const running = await startGripline(readEnv({ DATABASE_PATH: dbPath, PORT: '0', HOST: '127.0.0.1', SEED_DEMO: 'false', LOG_LEVEL: 'silent' }));
    let backup = '';
    try {
      const taken = run('backup-command.ts');
      expect(taken.status).toBe(0);
      expect(taken.stdout).toMatch(/^Backed up .*gripline-\d{4}-\d{2}-\d{2}T\d{4}\.db \(\d+ pages, integrity checked\)\./);
      backup = readdirSync(join(dir, 'copies'))[0]!;
      const refused = run('restore-command.ts', [join(dir, 'copies', backup)]);
      expect(refused.status).toBe(1);
      expect(refused.stderr).toMatch(/^Nothing was restored\. .* is open in another process/);
    } finally {
      await running.close();
    }
    const restored = run('restore-command.ts', [join(dir, 'copies', backup)]);
    expect(restored.stderr).toBe('');
    expect(restored.status).toBe(0);
    expect(restored.stdout).toMatch(/^Restored .* The database it replaced is kept as .*gripline\.before-restore-.*\.db\. Start Gripline again\./);
    expect(run('restore-command.ts').stderr).toMatch(/^Name the backup to restore/);
  }, 60_000);
});
