import type { NextFunction, Request, Response } from 'express';
import { IDEMPOTENCY_KEY_HEADER, PERFORMED_AT_HEADER } from '@shared/schemas/offline';
import { STATION_TOKEN_HEADER } from '@shared/schemas/stations';
import { replayMayRequest, stationMayRequest } from '../features/stations/station-scope';
import { checkStationSession } from '../features/stations/stations.service';
import { HttpError } from '../lib/http-error';
import { endSession } from '../lib/session-helpers';
import { SESSION_COOKIE } from './session';

/** Whether the request carries the offline queue's two headers (their values are checked by the action). */
const carriesQueueHeaders = (req: Request) => Boolean(req.get(IDEMPOTENCY_KEY_HEADER)) && Boolean(req.get(PERFORMED_AT_HEADER));

/**
 * What the station asks by itself rather than for the person (the countdown's poll, the offline
 * copy's refresh) reads without keeping their session alive.
 */
const isBackgroundRead = (req: Request) => req.method === 'GET' && (req.path === '/station/session' || req.path === '/station/copy');

/**
 * Scopes a station session (normal sessions pass untouched): every request must carry the station's
 * own token, the session ends after STATION_IDLE_SECONDS without a request, and only the station's
 * allow-list is answered (403 STATION_SCOPE otherwise; a replay session has its own, shorter list). Sets `req.ctx.station` for the services.
 * Mounted on the API router after the session and the signed-in person are loaded.
 */
export function stationSession(req: Request, res: Response, next: NextFunction) {
  const { stationId, stationActiveAt } = req.session ?? {};
  if (stationId === undefined) return next();
  const check = checkStationSession(req.ctx, { stationId, activeAt: stationActiveAt ?? 0 }, req.get(STATION_TOKEN_HEADER));
  if (!check.ok) {
    endSession(req).then(() => {
      res.clearCookie(SESSION_COOKIE, { path: '/' });
      next(check.error);
    }, next);
    return;
  }
  if (req.session.stationReplay) {
    if (!replayMayRequest(req.method, req.path, carriesQueueHeaders(req))) {
      return next(
        new HttpError(403, 'STATION_SCOPE', 'A replay session only sends the check outs, returns and draws queued at the station while it was offline, each with its Idempotency-Key and X-Performed-At.'),
      );
    }
  } else if (!stationMayRequest(req.method, req.path)) {
    return next(new HttpError(403, 'STATION_SCOPE', 'A station can open tools and bins, check out, return, hold, draw and return unused; do the rest on your own device.'));
  }
  if (!isBackgroundRead(req)) req.session.stationActiveAt = req.ctx.now().getTime();
  req.ctx = { ...req.ctx, station: { id: check.station.id, name: check.station.name } };
  next();
}
