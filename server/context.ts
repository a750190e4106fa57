import type { Database } from './db/client';
import type { Mailer } from './mail/mailer';

/** What services need from the app, without req/res. */
export interface ServiceContext {
  db: Database;
  mailer: Mailer;
  publicUrl: string;
  now: () => Date;
}

declare module 'express-serve-static-core' {
  interface Request {
    ctx: ServiceContext;
  }
}
