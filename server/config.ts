import type { Logger } from './lib/logger';
import type { Database } from './db/client';
import type { CertificateDownload } from './lan/certificate.router';
import type { PaymentsSetup } from './payments/payments-client';

export interface RateLimitConfig {
  /** Window for counting failed sign-ins. */
  windowMs: number;
  /** Failed sign-ins allowed per IP address within the window. */
  perIp: number;
  /** Failed sign-ins allowed per account (e-mail) within the window. */
  perAccount: number;
}

/** Everything createApp needs; tests build one per case around a temporary database. */
export interface AppConfig {
  db: Database;
  sessionSecret: string;
  /** Send cookies with Secure (the app is behind HTTPS). */
  secureCookies: boolean;
  /** Sign a person out after this long without a request. */
  sessionIdleMs: number;
  /** Base URL put in e-mailed links, e.g. http://localhost:3000 */
  publicUrl: string;
  /** True when the built-in mail catcher receives the mail (no real SMTP server configured). */
  catchingMail: boolean;
  logger: Logger;
  rateLimit: RateLimitConfig;
  /** Trust this many proxy hops for the client IP (0 = none). */
  trustProxyHops: number;
  /** Folder of the built client; when set the app serves it. */
  clientDir?: string;
  /** The certificate Gripline made for itself (npm run start:lan), offered at /certificate. */
  certificateDownload?: CertificateDownload;
  /** The payment provider's SDK client and webhook secret; unset: online payment is off. */
  payments?: PaymentsSetup;
  now?: () => Date;
}
