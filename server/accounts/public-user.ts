import type { User } from '@shared/schemas/auth';
import type { Person } from '@shared/schemas/people';
import type { UserRow } from '../db/schema/users';

export function toUser(row: UserRow): User {
  return { id: row.id, email: row.email, name: row.name, role: row.role };
}

export function toPerson(row: UserRow): Person {
  return {
    ...toUser(row),
    active: row.deactivatedAt === null,
    createdAt: row.createdAt.toISOString(),
    deactivatedAt: row.deactivatedAt?.toISOString() ?? null,
  };
}
