import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { RateLimitConfig } from '../config';
import { HttpError } from '../lib/http-error';

function ipOf(req: Request): string {
  return ipKeyGenerator(req.ip ?? 'unknown');
}

function accountOf(req: Request): string {
  const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' && email.trim() ? `account:${email.trim().toLowerCase()}` : `ip:${ipOf(req)}`;
}

/**
 * Counts failed sign-ins only (successful ones are not throttled), per IP and per account.
 * Over the limit: 429 with Retry-After, in the usual error envelope.
 */
export function signInLimiters(config: RateLimitConfig) {
  const make = (limit: number, keyGenerator: (req: Request) => string, what: string) =>
    rateLimit({
      windowMs: config.windowMs,
      limit,
      keyGenerator,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-7',
      legacyHeaders: false,
      handler: (_req, res, next) => {
        const retryAfter = Number(res.getHeader('Retry-After')) || Math.ceil(config.windowMs / 1000);
        const minutes = Math.max(1, Math.ceil(retryAfter / 60));
        next(
          new HttpError(
            429,
            'TOO_MANY_ATTEMPTS',
            `Too many failed sign-ins ${what}. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again, or reset your password.`,
          ),
        );
      },
    });
  return [make(config.perIp, ipOf, 'from this network'), make(config.perAccount, accountOf, 'for this account')];
}
