import type { Database } from '../db/client';

/** Signs a person out everywhere (password reset, deactivation): the sessions table is written only in session/. */
export function endSessionsOf(db: Database, userId: number): number {
  return db.$client.prepare("delete from sessions where json_extract(sess, '$.userId') = ?").run(userId).changes;
}
