import type { EnrolledStation, EnrolStationBody, Station } from '@shared/schemas/stations';
import { STATION_IDLE_SECONDS, STATION_LOCK_MINUTES } from '@shared/schemas/stations';
import { pinLockedUntil, pinTriesLeft, stationSignInWords } from '@shared/stations/station-sign-in-rules';
import { findWorkingBadge } from '../../accounts/badges.repo';
import { hashLinkToken, newLinkToken } from '../../accounts/link-tokens';
import { verifyPin } from '../../accounts/pins';
import type { ServiceContext } from '../../context';
import type { StationRow } from '../../db/schema/stations';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { oneAtATime } from '../../lib/one-at-a-time';
import { findStation, findWorkingStation, insertStation, listStations, pinFailureTimesSince, recordPinFailure, revokeStation } from './stations.repo';

const LOCK_MS = STATION_LOCK_MINUTES * 60_000;
const IDLE_MS = STATION_IDLE_SECONDS * 1000;

const toStation = (row: StationRow, enrolledBy: string): Station => ({
  id: row.id,
  name: row.name,
  enrolledAt: row.enrolledAt.toISOString(),
  enrolledBy,
  revokedAt: row.revokedAt?.toISOString() ?? null,
});

/** Enrols a device as a station; its token is answered once and only its hash is kept. */
export function enrolStation(ctx: ServiceContext, actor: UserRow, body: EnrolStationBody): EnrolledStation {
  const stationToken = newLinkToken();
  const row = insertStation(ctx.db, { name: body.name, tokenHash: hashLinkToken(stationToken), enrolledById: actor.id, at: ctx.now() });
  return { id: row.id, name: row.name, stationToken };
}

export function stationList(ctx: ServiceContext): Station[] {
  return listStations(ctx.db).map((r) => toStation(r.station, r.enrolledBy));
}

export function revokeStationById(ctx: ServiceContext, actor: UserRow, id: number): Station {
  const revoked = ctx.db.transaction((tx) => {
    const existing = findStation(tx, id);
    if (!existing) throw new HttpError(404, 'STATION_NOT_FOUND', `There is no station ${id}.`);
    const row = revokeStation(tx, id, actor.id, ctx.now());
    if (!row) throw new HttpError(409, 'STATION_REVOKED', `${existing.name} was already revoked.`);
    return row;
  });
  return stationList(ctx).find((s) => s.id === revoked.id)!;
}

const notEnrolled = () =>
  new HttpError(401, 'STATION_NOT_ENROLLED', 'This device is not an enrolled station (or it was revoked). Ask a quartermaster to enrol it.');

/** The working station holding this token; 401 STATION_NOT_ENROLLED when missing, unknown or revoked. */
export function stationOfToken(ctx: ServiceContext, token: string | undefined): StationRow {
  const station = token ? findWorkingStation(ctx.db, hashLinkToken(token)) : undefined;
  if (!station) throw notEnrolled();
  return station;
}

/** Wrong PINs for this badge at this station that can still count toward a lock (the shared rule reads back two windows). */
const failuresFor = (ctx: ServiceContext, stationId: number, badgeId: number, now: Date) =>
  pinFailureTimesSince(ctx.db, stationId, badgeId, new Date(now.getTime() - 2 * LOCK_MS));

function lockedUntil(ctx: ServiceContext, stationId: number, badgeId: number, now: Date): Date | null {
  const until = pinLockedUntil(failuresFor(ctx, stationId, badgeId, now), now);
  return until && until > now ? until : null;
}

const locked = (until: Date, now: Date) => {
  const seconds = Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 1000));
  return new HttpError(429, 'BADGE_LOCKED', stationSignInWords.badgeLocked(Math.ceil(seconds / 60)), undefined, { 'Retry-After': String(seconds) });
};

const badgeNotRecognised = () => new HttpError(401, 'BADGE_NOT_RECOGNISED', stationSignInWords.badgeNotRecognised);

const pinChecks = oneAtATime();

/** A station and the person a badge (and PIN) signed in there. */
export interface StationSignIn {
  station: StationRow;
  user: UserRow;
}

/**
 * Checks a badge and PIN at a station. Wrong PINs are counted per badge per station; the lock
 * touches nothing else (the person's own sign-in, or the badge at another station).
 */
export async function checkStationSignIn(ctx: ServiceContext, token: string | undefined, badgeToken: string, pin: string): Promise<StationSignIn> {
  const station = stationOfToken(ctx, token);
  const found = findWorkingBadge(ctx.db, hashLinkToken(badgeToken));
  if (!found) throw badgeNotRecognised();
  const { badge, user } = found;
  // Attempts for one badge at one station are checked in turn: a burst cannot try more PINs than the lock allows.
  return pinChecks(`${station.id}:${badge.id}`, async () => {
    const until = lockedUntil(ctx, station.id, badge.id, ctx.now());
    if (until) throw locked(until, ctx.now());
    if (user.pinHash === null) throw new HttpError(401, 'NO_PIN', stationSignInWords.noPin);
    if (await verifyPin(user, pin)) return { station, user };

    const now = ctx.now();
    recordPinFailure(ctx.db, station.id, badge.id, now);
    const lockNow = lockedUntil(ctx, station.id, badge.id, now);
    if (lockNow) throw locked(lockNow, now);
    throw new HttpError(401, 'WRONG_PIN', stationSignInWords.wrongPin(pinTriesLeft(failuresFor(ctx, station.id, badge.id, now), now)));
  });
}

/**
 * Checks a badge for a replay session (the actions a station queued offline, sent once it is online
 * again). No PIN is asked, so wrong PINs are neither counted nor a lock: the station checked the PIN
 * against its copy (the argon2id hash in GET /api/station/copy) when the person was at it. The server
 * trusts an enrolled station for that, as it trusts it to read the badge; what it still checks is
 * that the station is enrolled and the badge works for an active person now. The PIN as it is now
 * plays no part: one changed or cleared by a lead since the actions were queued still lets them through.
 */
export function checkReplaySignIn(ctx: ServiceContext, token: string | undefined, badgeToken: string): StationSignIn {
  const station = stationOfToken(ctx, token);
  const found = findWorkingBadge(ctx.db, hashLinkToken(badgeToken));
  if (!found) throw badgeNotRecognised();
  return { station, user: found.user };
}

export type StationCheck = { ok: true; station: StationRow } | { ok: false; error: HttpError };

/**
 * Whether a station session may go on with this request: its station token must be the station's
 * own and still enrolled, and it must not have been idle for STATION_IDLE_SECONDS.
 */
export function checkStationSession(ctx: ServiceContext, session: { stationId: number; activeAt: number }, token: string | undefined): StationCheck {
  const station = token ? findWorkingStation(ctx.db, hashLinkToken(token)) : undefined;
  if (!station || station.id !== session.stationId) return { ok: false, error: notEnrolled() };
  if (idleSecondsLeft(ctx, session.activeAt) <= 0) return { ok: false, error: sessionEnded() };
  return { ok: true, station };
}

/** Seconds before an idle station session ends, counted from its last request. */
export function idleSecondsLeft(ctx: ServiceContext, activeAt: number): number {
  return Math.ceil((activeAt + IDLE_MS - ctx.now().getTime()) / 1000);
}

export const sessionEnded = () => new HttpError(401, 'STATION_SESSION_ENDED', 'The station session has ended. Scan your badge to start again.');
