import { SECOND_MS } from '@shared/time/durations';
import type { Logger } from '../lib/logger';
import { deliverDueMail, type OutboxDeps } from './outbox';

/** Often enough that a link asked for on a screen is in the inbox by the time the person looks. */
const POLL_MS = SECOND_MS;

export interface OutboxWorker {
  /** Stops polling and waits for the run in progress, so the mailer can be closed after it. */
  stop(): Promise<void>;
}

/**
 * Sends the outbox in the background, started by the server (never by createApp; tests call
 * deliverDueMail themselves). One run at a time; a run that throws is logged and the next tick tries again.
 */
export function startOutboxWorker(deps: OutboxDeps, logger: Logger, pollMs = POLL_MS): OutboxWorker {
  let running: Promise<void> | undefined;
  const tick = () => {
    running ??= deliverDueMail(deps)
      .then((run) => {
        if (run.sent + run.retrying + run.failed > 0) logger.info({ job: 'mail-outbox', run }, 'outbox run finished');
        if (run.failed > 0) logger.warn({ job: 'mail-outbox', failed: run.failed }, 'mail given up after every attempt failed');
      })
      .catch((err: unknown) => logger.error({ job: 'mail-outbox', err }, 'outbox run failed'))
      .finally(() => {
        running = undefined;
      });
  };
  const timer = setInterval(tick, pollMs);
  timer.unref();
  tick();
  return {
    async stop() {
      clearInterval(timer);
      await running;
    },
  };
}
