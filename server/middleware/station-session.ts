import type { NextFunction, Request, Response } from 'express';
import { STATION_TOKEN_HEADER } from '@shared/schemas/stations';
import { stationMayRequest } from '../features/stations/station-scope';
import { checkStationSession } from '../features/stations/stations.service';
import { HttpError } from '../lib/http-error';
import { endSession } from '../lib/session-helpers';
import { SESSION_COOKIE } from './session';

/** The countdown's own poll reads the session without keeping it alive. */
const isCountdownPoll = (req: Request) => req.method === 'GET' && req.path === '/station/session';

/**
 * Scopes a station session (normal sessions pass untouched): every request must carry the station's
 * own token, the session ends after STATION_IDLE_SECONDS without a request, and only the station's
 * allow-list is answered (403 STATION_SCOPE otherwise). Sets `req.ctx.station` for the services.
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
  if (!stationMayRequest(req.method, req.path)) {
    return next(new HttpError(403, 'STATION_SCOPE', 'A station can open tools and bins, check out, return, hold, draw and return unused; do the rest on your own device.'));
  }
  if (!isCountdownPoll(req)) req.session.stationActiveAt = req.ctx.now().getTime();
  req.ctx = { ...req.ctx, station: { id: check.station.id, name: check.station.name } };
  next();
}
