import { and, asc, desc, eq, isNull, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import type { SignoffRequestState } from '@shared/schemas/signoff-requests';
import type { Executor } from '../../db/client';
import { signoffRequests } from '../../db/schema/signoff-requests';
import { signoffs } from '../../db/schema/signoffs';
import { tools } from '../../db/schema/tools';
import { users } from '../../db/schema/users';

export type SignoffRequestRow = typeof signoffRequests.$inferSelect;

const member = alias(users, 'member');

/** Requests with the sign-off, the member (their e-mail for the answer) and the tool they asked from. */
function requestQuery(db: Executor) {
  return db
    .select({
      request: signoffRequests,
      signoff: { id: signoffs.id, name: signoffs.name },
      member: { id: member.id, name: member.name, email: member.email, deactivatedAt: member.deactivatedAt },
      tool: { code: tools.code, name: tools.name },
    })
    .from(signoffRequests)
    .innerJoin(signoffs, eq(signoffs.id, signoffRequests.signoffId))
    .innerJoin(member, eq(member.id, signoffRequests.userId))
    .innerJoin(tools, eq(tools.id, signoffRequests.toolId));
}
export type SignoffRequestWithNames = ReturnType<ReturnType<typeof requestQuery>['all']>[number];

/** Open requests of active people, the oldest first; or one person's requests, the newest first. */
export function listSignoffRequests(db: Executor, filter: { state?: SignoffRequestState; userId?: number }): SignoffRequestWithNames[] {
  const parts: SQL[] = [];
  if (filter.state) parts.push(eq(signoffRequests.state, filter.state));
  if (filter.userId !== undefined) parts.push(eq(signoffRequests.userId, filter.userId));
  else parts.push(isNull(member.deactivatedAt));
  const order = filter.userId !== undefined ? [desc(signoffRequests.askedAt), desc(signoffRequests.id)] : [asc(signoffRequests.askedAt), asc(signoffRequests.id)];
  return requestQuery(db)
    .where(and(...parts))
    .orderBy(...order)
    .all();
}

export function findSignoffRequest(db: Executor, id: number): SignoffRequestWithNames | undefined {
  return requestQuery(db).where(eq(signoffRequests.id, id)).get();
}

export function findOpenSignoffRequest(db: Executor, signoffId: number, userId: number): SignoffRequestWithNames | undefined {
  return requestQuery(db)
    .where(and(eq(signoffRequests.signoffId, signoffId), eq(signoffRequests.userId, userId), eq(signoffRequests.state, 'open')))
    .get();
}

export function insertSignoffRequest(db: Executor, values: { signoffId: number; userId: number; toolId: number; note: string; askedAt: Date }): SignoffRequestRow {
  return db.insert(signoffRequests).values(values).returning().get();
}

/** Closes an open request (compare and set on `open`); false when it was no longer open. */
export function closeSignoffRequest(
  db: Executor,
  id: number,
  close: { state: 'granted' | 'declined'; at: Date; byId: number; declineReason?: string },
): boolean {
  const done = db
    .update(signoffRequests)
    .set({ state: close.state, closedAt: close.at, closedById: close.byId, declineReason: close.declineReason ?? null })
    .where(and(eq(signoffRequests.id, id), eq(signoffRequests.state, 'open')))
    .returning({ id: signoffRequests.id })
    .all();
  return done.length > 0;
}
