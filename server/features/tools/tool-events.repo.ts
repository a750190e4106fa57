import { desc, eq } from 'drizzle-orm';
import type { ToolEvent } from '@shared/schemas/tools';
import type { Executor } from '../../db/client';
import { toolEvents } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export interface NewToolEvent {
  toolId: number;
  actorId: number | null;
  at: Date;
  action: string;
  fromStatus?: string | null;
  toStatus?: string | null;
  detail?: string;
}

/** The audit trail is append-only: events are added, never changed. */
export function recordToolEvent(db: Executor, e: NewToolEvent): void {
  db.insert(toolEvents)
    .values({ ...e, fromStatus: e.fromStatus ?? null, toStatus: e.toStatus ?? null, detail: e.detail ?? '' })
    .run();
}

export function listToolEvents(db: Executor, toolId: number, limit = 200): ToolEvent[] {
  return db
    .select({ e: toolEvents, actorName: users.name })
    .from(toolEvents)
    .leftJoin(users, eq(users.id, toolEvents.actorId))
    .where(eq(toolEvents.toolId, toolId))
    .orderBy(desc(toolEvents.at), desc(toolEvents.id))
    .limit(limit)
    .all()
    .map(({ e, actorName }) => ({
      id: e.id,
      at: e.at.toISOString(),
      actor: e.actorId !== null ? { id: e.actorId, name: actorName ?? 'a former member' } : null,
      action: e.action,
      fromStatus: e.fromStatus,
      toStatus: e.toStatus,
      detail: e.detail,
    }));
}
