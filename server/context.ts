import type { Database } from './db/client';

/** What services need from the app, without req/res. */
export interface ServiceContext {
  db: Database;
  publicUrl: string;
  now: () => Date;
}

declare module 'express-serve-static-core' {
  interface Request {
    ctx: ServiceContext;
  }
}
