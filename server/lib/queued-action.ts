import type { Request, Response } from 'express';

/** What an action answers: the status and JSON to send (its e-mail, if any, is in the outbox). */
export interface ActionAnswer {
  status: number;
  body: unknown;
}

/** An action a phone may have queued offline; it runs synchronously, with the time it was done. */
export type QueuedAction = (performedAt: Date) => ActionAnswer;

/**
 * Runs a queued-able action for a request: reads Idempotency-Key, X-Performed-At and X-Catalogue-At,
 * runs the action at most once per key and sends its answer. The app hands the implementation
 * (the idempotency feature) to the routers that need it.
 */
export type RunQueuedAction = (req: Request, res: Response, action: QueuedAction) => void;
