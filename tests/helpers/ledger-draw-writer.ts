import { workerData } from 'node:worker_threads';
import { findUserByEmail } from '../../server/accounts/users.repo';
import { openDatabase } from '../../server/db/client';
import { draw } from '../../server/features/stock/ledger.service';
import { createSmtpMailer } from '../../server/mail/mailer';

/**
 * Runs on its own thread with its own connection: a member draws one unit at a time from a bin through
 * the ledger service, as the app does, until told to stop. `shared[0]` is the number of draws
 * acknowledged (committed and answered); setting `shared[1]` stops it.
 */
const { path, binCode, email, shared } = workerData as { path: string; binCode: string; email: string; shared: Int32Array };
const db = openDatabase(path);
const ctx = { db, mailer: createSmtpMailer('smtp://127.0.0.1:9', 'test@example.org'), publicUrl: 'http://gripline.test', now: () => new Date() };
const member = findUserByEmail(db, email)!;
for (let n = 1; Atomics.load(shared, 1) === 0; n++) {
  draw(ctx, member, binCode, { quantity: 1, note: `stream ${n}` });
  Atomics.store(shared, 0, n);
}
ctx.mailer.close();
db.$client.close();
