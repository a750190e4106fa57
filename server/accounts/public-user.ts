import type { User } from '@shared/schemas/auth';
import type { Person } from '@shared/schemas/people';
import type { UserRow } from '../db/schema/users';

export function toUser(row: UserRow): User {
  return { id: row.id, email: row.email, name: row.name, role: row.role };
}

/** A person as a lead sees them; `hasBadge` comes from the badges table (see badgeHolderIds). */
export function toPerson(row: UserRow, hasBadge: boolean): Person {
  return {
    ...toUser(row),
    active: row.deactivatedAt === null,
    createdAt: row.createdAt.toISOString(),
    deactivatedAt: row.deactivatedAt?.toISOString() ?? null,
    hasBadge,
    hasPin: row.pinHash !== null,
  };
}
