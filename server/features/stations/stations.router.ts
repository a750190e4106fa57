import { Router, type Request, type Response } from 'express';
import { idParam, noFieldsBodySchema } from '@shared/schemas/fields';
import { enrolStationBodySchema, STATION_IDLE_SECONDS, STATION_TOKEN_HEADER, stationReplaySignInBodySchema, stationSignInBodySchema, type StationSession } from '@shared/schemas/stations';
import { z } from 'zod';
import { toUser } from '../../accounts/public-user';
import { requireRole, requireUser } from '../../middleware/auth';
import { SESSION_COOKIE } from '../../middleware/session';
import { endSession, signInSession } from '../../lib/session-helpers';
import { parseInput } from '../../lib/validate';
import { takeStationCopy } from './station-copy.service';
import { checkReplaySignIn, checkStationSignIn, enrolStation, type StationSignIn, idleSecondsLeft, revokeStationById, sessionEnded, stationList } from './stations.service';

const idParams = z.object({ id: idParam });

/** /api/stations: enrolling, listing and revoking the crib's stations (quartermaster or lead). */
export function stationsRouter() {
  const router = Router();
  router.use(requireRole('quartermaster'));

  router.get('/', (req, res) => {
    res.json({ data: stationList(req.ctx) });
  });

  router.post('/', (req, res) => {
    res.status(201).json(enrolStation(req.ctx, requireUser(req), parseInput(enrolStationBodySchema, req.body)));
  });

  router.post('/:id/revoke', (req, res) => {
    const { id } = parseInput(idParams, req.params, 'path');
    parseInput(noFieldsBodySchema, req.body);
    res.json(revokeStationById(req.ctx, requireUser(req), id));
  });

  return router;
}

/** /api/station: what the station's own browser asks (sign in with badge and PIN, the session, Done). */
export function stationSessionRouter() {
  const router = Router();

  /** Starts a station session (a new session id) and answers it, with the new CSRF token in X-CSRF-Token. */
  async function startSession(req: Request, res: Response, { station, user }: StationSignIn, replay: boolean) {
    const csrfToken = await signInSession(req, user.id, { stationId: station.id, stationActiveAt: req.ctx.now().getTime(), ...(replay ? { stationReplay: true } : {}) });
    // The regenerated session has a new CSRF token; GET /api/auth/csrf answers it as well.
    res.set('X-CSRF-Token', csrfToken);
    const session: StationSession = { user: toUser(user), station: { id: station.id, name: station.name }, idleSeconds: STATION_IDLE_SECONDS };
    res.json(session);
  }

  router.post('/sign-in', async (req, res) => {
    const body = parseInput(stationSignInBodySchema, req.body);
    await startSession(req, res, await checkStationSignIn(req.ctx, req.get(STATION_TOKEN_HEADER), body.badge, body.pin), false);
  });

  // Back online: a session that may only send what the station queued for this badge's holder.
  router.post('/replay-sign-in', async (req, res) => {
    const body = parseInput(stationReplaySignInBodySchema, req.body);
    await startSession(req, res, checkReplaySignIn(req.ctx, req.get(STATION_TOKEN_HEADER), body.badge), true);
  });

  // What the station keeps to go on offline; no person need be signed in.
  router.get('/copy', (req, res) => {
    res.json(takeStationCopy(req.ctx, req.get(STATION_TOKEN_HEADER)));
  });

  router.get('/session', (req, res) => {
    const station = req.ctx.station;
    if (!station || !req.user || req.session.stationActiveAt === undefined) throw sessionEnded();
    const session: StationSession = { user: toUser(req.user), station, idleSeconds: idleSecondsLeft(req.ctx, req.session.stationActiveAt) };
    res.json(session);
  });

  router.post('/done', async (req, res) => {
    parseInput(noFieldsBodySchema, req.body);
    if (!req.ctx.station) throw sessionEnded();
    await endSession(req);
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.status(204).end();
  });

  return router;
}
