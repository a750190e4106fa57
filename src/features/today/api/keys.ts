import type { Role } from '@shared/roles';

/** Home's "today" answers, one per role. Home refetches them whenever it is opened. */
export const todayKeys = {
  all: ['today'] as const,
  role: (role: Role) => ['today', role] as const,
};
