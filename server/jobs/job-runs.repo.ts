import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import type { Role } from '@shared/roles';
import type { Executor } from '../db/client';
import { jobRuns } from '../db/schema/crib-jobs';
import { users } from '../db/schema/users';

/** Each run of a scheduled job is recorded, so the people it concerns can see when it last ran. */
export function startJobRun(db: Executor, job: string, startedAt: Date): number {
  return db.insert(jobRuns).values({ job, startedAt }).returning({ id: jobRuns.id }).get().id;
}

export function finishJobRun(db: Executor, id: number, values: { finishedAt: Date; summary: string; error: string | null }): void {
  db.update(jobRuns).set(values).where(eq(jobRuns.id, id)).run();
}

export function lastJobRun(db: Executor, job: string) {
  return db.select().from(jobRuns).where(eq(jobRuns.job, job)).orderBy(desc(jobRuns.startedAt), desc(jobRuns.id)).limit(1).get();
}

/** The active people of one role, who receive a job's digest. */
export function activePeopleWithRole(db: Executor, role: Role): { name: string; email: string }[] {
  return db
    .select({ name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.role, role), isNull(users.deactivatedAt)))
    .orderBy(asc(users.id))
    .all();
}
