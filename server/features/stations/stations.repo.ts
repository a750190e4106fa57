import { and, asc, eq, gte, isNull } from 'drizzle-orm';
import { users } from '../../db/schema/users';
import type { Executor } from '../../db/client';
import { stationPinFailures, stations, type StationRow } from '../../db/schema/stations';

export function insertStation(db: Executor, values: { name: string; tokenHash: string; enrolledById: number; at: Date }): StationRow {
  return db.insert(stations).values({ name: values.name, tokenHash: values.tokenHash, enrolledById: values.enrolledById, enrolledAt: values.at }).returning().get();
}

/** Every station, enrolled first first, revoked ones included (the page shows them as revoked), with who enrolled it. */
export function listStations(db: Executor): { station: StationRow; enrolledBy: string }[] {
  return db
    .select({ station: stations, enrolledBy: users.name })
    .from(stations)
    .innerJoin(users, eq(users.id, stations.enrolledById))
    .orderBy(asc(stations.enrolledAt), asc(stations.id))
    .all();
}

export function findStation(db: Executor, id: number): StationRow | undefined {
  return db.select().from(stations).where(eq(stations.id, id)).get();
}

/** The station holding this token, unless it was revoked. */
export function findWorkingStation(db: Executor, tokenHash: string): StationRow | undefined {
  return db
    .select()
    .from(stations)
    .where(and(eq(stations.tokenHash, tokenHash), isNull(stations.revokedAt)))
    .get();
}

/** Revokes a working station; answers the row, or undefined when it was already revoked. */
export function revokeStation(db: Executor, id: number, byId: number, at: Date): StationRow | undefined {
  return db
    .update(stations)
    .set({ revokedAt: at, revokedById: byId })
    .where(and(eq(stations.id, id), isNull(stations.revokedAt)))
    .returning()
    .get();
}

export function recordPinFailure(db: Executor, stationId: number, badgeId: number, at: Date): void {
  db.insert(stationPinFailures).values({ stationId, badgeId, at }).run();
}

/** Wrong PINs typed for this badge at this station since `since`. */
export function pinFailureTimesSince(db: Executor, stationId: number, badgeId: number, since: Date): Date[] {
  return db
    .select({ at: stationPinFailures.at })
    .from(stationPinFailures)
    .where(and(eq(stationPinFailures.stationId, stationId), eq(stationPinFailures.badgeId, badgeId), gte(stationPinFailures.at, since)))
    .all()
    .map((r) => r.at);
}
