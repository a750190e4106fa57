import { desc, eq } from 'drizzle-orm';
import type { ToolEvent } from '@shared/schemas/tools';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import { stationNames } from '../stations/stations.reads';
import { toolEvents } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export interface NewToolEvent {
  toolId: number;
  actorId: number | null;
  /** The crib station the person acted at, if any. */
  stationId?: number | null;
  at: Date;
  action: string;
  fromStatus?: string | null;
  toStatus?: string | null;
  detail?: string;
}

/** Who did it and where: the person, and the station when they acted at one (a station session). */
export function actedBy(ctx: Pick<ServiceContext, 'station'>, person: { id: number }): { actorId: number; stationId: number | null } {
  return { actorId: person.id, stationId: ctx.station?.id ?? null };
}

/** The audit trail is append-only: events are added, never changed. */
export function recordToolEvent(db: Executor, e: NewToolEvent): void {
  db.insert(toolEvents)
    .values({ ...e, stationId: e.stationId ?? null, fromStatus: e.fromStatus ?? null, toStatus: e.toStatus ?? null, detail: e.detail ?? '' })
    .run();
}

export function listToolEvents(db: Executor, toolId: number, limit = 200): ToolEvent[] {
  const rows = db
    .select({ e: toolEvents, actorName: users.name })
    .from(toolEvents)
    .leftJoin(users, eq(users.id, toolEvents.actorId))
    .where(eq(toolEvents.toolId, toolId))
    .orderBy(desc(toolEvents.at), desc(toolEvents.id))
    .limit(limit)
    .all();
  const stations = stationNames(db, rows.map(({ e }) => e.stationId));
  return rows.map(({ e, actorName }) => ({
      id: e.id,
      at: e.at.toISOString(),
      actor: e.actorId !== null ? { id: e.actorId, name: actorName ?? 'a former member' } : null,
      action: e.action,
      fromStatus: e.fromStatus,
      toStatus: e.toStatus,
      detail: e.detail,
      station: e.stationId !== null ? (stations.get(e.stationId) ?? null) : null,
    }));
}
