import type { NextFunction, Request, Response } from 'express';
import { ipKeyGenerator } from 'express-rate-limit';
import type { RateLimitConfig } from '../config';
import { HttpError } from '../lib/http-error';

/** Failures inside one window: when each happened, oldest first. */
class FailureLog {
  private readonly failures = new Map<string, number[]>();

  constructor(private readonly windowMs: number) {}

  recent(key: string, now: number): number[] {
    const kept = (this.failures.get(key) ?? []).filter((at) => now - at < this.windowMs);
    if (kept.length === 0) this.failures.delete(key);
    else this.failures.set(key, kept);
    return kept;
  }

  add(key: string, now: number): void {
    this.failures.set(key, [...this.recent(key, now), now]);
  }

  clear(key: string): void {
    this.failures.delete(key);
  }

  /** Forget keys whose failures have all aged out, so the map does not grow without end. */
  sweep(now: number): void {
    for (const key of [...this.failures.keys()]) this.recent(key, now);
  }
}

const addressOf = (req: Request): string => ipKeyGenerator(req.ip ?? 'unknown');
const accountOf = (req: Request): string => {
  const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
};

/**
 * Failed sign-ins are counted per account and address together, so someone guessing a member's
 * password from one place never locks the member out from another. An address that has failed too
 * often across accounts (a password spray) is refused on each account it has been failing on, and
 * gets one guess at any other, while a member behind the same hangar network who has not been
 * failing still signs in. Successful sign-ins are never throttled and clear their pair's failures.
 * Over the limit: 429 with Retry-After, in the usual error envelope. Kept in memory (one process).
 */
export function signInLimiters(config: RateLimitConfig) {
  const pairs = new FailureLog(config.windowMs);
  const addresses = new FailureLog(config.windowMs);
  let lastSweep = Date.now();

  const refuse = (res: Response, next: NextFunction, oldest: number, now: number, what: string) => {
    const retryAfter = Math.max(1, Math.ceil((oldest + config.windowMs - now) / 1000));
    res.setHeader('Retry-After', String(retryAfter));
    const minutes = Math.max(1, Math.ceil(retryAfter / 60));
    next(new HttpError(429, 'TOO_MANY_ATTEMPTS', `Too many failed sign-ins ${what}. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again, or reset your password.`));
  };

  const throttle = (req: Request, res: Response, next: NextFunction) => {
    const now = Date.now();
    if (now - lastSweep > config.windowMs) {
      pairs.sweep(now);
      addresses.sweep(now);
      lastSweep = now;
    }
    const address = addressOf(req);
    const pair = `${accountOf(req)}|${address}`;
    const pairFailures = pairs.recent(pair, now);
    if (pairFailures.length >= config.perAccount) return refuse(res, next, pairFailures[0]!, now, 'for this account from this device');
    const addressFailures = addresses.recent(address, now);
    if (addressFailures.length >= config.perIp && pairFailures.length > 0) return refuse(res, next, addressFailures[0]!, now, 'from this network');

    res.on('finish', () => {
      if (res.statusCode === 401) {
        pairs.add(pair, now);
        addresses.add(address, now);
      } else if (res.statusCode < 300) {
        pairs.clear(pair);
      }
    });
    next();
  };
  return [throttle];
}
