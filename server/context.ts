import type { Database } from './db/client';

/** What services need from the app, without req/res. */
export interface ServiceContext {
  db: Database;
  publicUrl: string;
  now: () => Date;
  /** Set in a station session: the station the person is acting at (kept on tool events and ledger entries). */
  station?: { id: number; name: string };
}

declare module 'express-serve-static-core' {
  interface Request {
    ctx: ServiceContext;
  }
}
