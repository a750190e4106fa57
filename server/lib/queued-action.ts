import type { Request, Response } from 'express';

/** What an action answers: the status and JSON to send, and work to do once its transaction has committed (e-mail). */
export interface ActionAnswer {
  status: number;
  body: unknown;
  afterCommit?: () => Promise<void>;
}

/** An action a phone may have queued offline; it runs synchronously, with the time it was done. */
export type QueuedAction = (performedAt: Date) => ActionAnswer;

/**
 * Runs a queued-able action for a request: reads Idempotency-Key, X-Performed-At and X-Catalogue-At,
 * runs the action at most once per key and sends its answer. The app hands the implementation
 * (the idempotency feature) to the routers that need it.
 */
export type RunQueuedAction = (req: Request, res: Response, action: QueuedAction) => Promise<void>;
