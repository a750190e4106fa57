import { createServer as createHttpServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createApp } from './app';
import { startBackupScheduler } from './backup/nightly-backup';
import { backupDirFor } from './backup/take-backup';
import { migrateDatabase, openDatabase } from './db/client';
import type { Env } from './env';
import type { LanCertificate } from './lan/lan-certificate';
import { startPlanningScheduler } from './features/planning/planning-scheduler';
import { startCribScheduler } from './features/tools/crib-scheduler';
import { sweepIdempotencyKeys } from './features/idempotency/idempotency.service';
import { createLogger } from './lib/logger';
import { startMailCatcher, type MailCatcher } from './mail/mail-catcher';
import { createSmtpMailer } from './mail/mailer';
import { startFakeProvider, type FakeProvider } from './payments/fake-provider';
import { createPaymentsSetup } from './payments/payments-client';
import { startOutboxWorker } from './mail/outbox-worker';
import { installReactions } from './events/reactions';
import { seedDemoChapter } from './seed/demo-chapter';
import { resolveSessionSecret } from './session-secret';
import { createTlsServer, tlsFromEnv } from './tls';

export const CLIENT_DIR = resolve(dirname(fileURLToPath(import.meta.url)), '../dist');

export interface RunningGripline {
  url: string;
  port: number;
  close(): Promise<void>;
}

export interface StartOptions {
  /** A certificate Gripline made for itself (npm run start:lan): served over HTTPS and offered at /certificate. */
  lanCertificate?: LanCertificate;
  /** Host name in the URL Gripline reports and in e-mailed links when PUBLIC_URL is unset. */
  urlHost?: string;
}

/**
 * Opens and migrates the database, seeds the demo chapter when empty, starts mail, listens: over HTTPS
 * with a certificate (TLS_CERT_FILE and TLS_KEY_FILE, or one made by start:lan), which implies Secure
 * cookies and HSTS; over HTTP otherwise.
 */
export async function startGripline(env: Env, options: StartOptions = {}): Promise<RunningGripline> {
  const tls = options.lanCertificate ?? tlsFromEnv(env);
  const server = tls ? createTlsServer(tls) : createHttpServer();
  const logger = createLogger(env.LOG_LEVEL);
  // Before anything writes: the seed, the app and the jobs all publish domain events.
  installReactions();
  const db = openDatabase(env.DATABASE_PATH);
  migrateDatabase(db);
  if (env.SEED_DEMO && (await seedDemoChapter(db))) logger.info('seeded the demo chapter into an empty database');

  let catcher: MailCatcher | undefined;
  if (!env.SMTP_URL) catcher = await startMailCatcher(db);
  const mailer = createSmtpMailer(env.SMTP_URL ?? catcher!.url, env.MAIL_FROM);

  await new Promise<void>((ok, fail) => {
    server.once('error', fail);
    server.listen(env.PORT, env.HOST, () => ok());
  });
  const { port } = server.address() as AddressInfo;
  const url = `${tls ? 'https' : 'http'}://${options.urlHost ?? 'localhost'}:${port}`;
  // Without a real key the local fake provider takes the payments, and sends its webhooks here over loopback.
  let fakeProvider: FakeProvider | undefined;
  if (!env.PAYMENTS_SECRET_KEY) fakeProvider = await startFakeProvider({ webhookUrl: `${tls ? 'https' : 'http'}://127.0.0.1:${port}/api/payments/webhook` });
  const payments = createPaymentsSetup(
    fakeProvider
      ? { secretKey: fakeProvider.secretKey, webhookSecret: fakeProvider.webhookSecret, fake: fakeProvider }
      : { secretKey: env.PAYMENTS_SECRET_KEY!, webhookSecret: env.PAYMENTS_WEBHOOK_SECRET! },
  );
  const app = createApp({
    db,
    sessionSecret: resolveSessionSecret(env.SESSION_SECRET, env.DATABASE_PATH),
    secureCookies: env.SECURE_COOKIES || tls !== undefined,
    sessionIdleMs: env.SESSION_IDLE_MINUTES * 60_000,
    publicUrl: env.PUBLIC_URL ?? url,
    catchingMail: catcher !== undefined,
    logger,
    rateLimit: { windowMs: 15 * 60_000, perIp: 50, perAccount: 10 },
    trustProxyHops: env.TRUST_PROXY_HOPS,
    clientDir: CLIENT_DIR,
    payments,
    certificateDownload: options.lanCertificate && { pem: options.lanCertificate.authority, fileName: options.lanCertificate.fileName },
  });
  server.on('request', app);
  const jobContext = { db, publicUrl: env.PUBLIC_URL ?? url, now: () => new Date() };
  const outbox = startOutboxWorker({ db, mailer, now: jobContext.now }, logger);
  const scheduler = startCribScheduler(jobContext, logger, [{ name: 'sweep-idempotency-keys', run: () => sweepIdempotencyKeys(jobContext) }]);
  const planningScheduler = startPlanningScheduler(jobContext, logger);
  const backupScheduler = env.DATABASE_PATH === ':memory:' ? undefined : startBackupScheduler(db.$client, backupDirFor(env), logger);
  logger.info({ url, mail: catcher ? 'caught locally' : 'SMTP_URL', payments: fakeProvider ? 'local fake provider' : 'PAYMENTS_SECRET_KEY' }, 'Gripline is listening');

  return {
    url,
    port,
    async close() {
      await new Promise<void>((ok) => {
        server.close(() => ok());
        server.closeAllConnections();
      });
      scheduler.stop();
      planningScheduler.stop();
      backupScheduler?.stop();
      await outbox.stop();
      app.sessionStore.close();
      mailer.close();
      await catcher?.close();
      await fakeProvider?.close();
      db.$client.close();
    },
  };
}
