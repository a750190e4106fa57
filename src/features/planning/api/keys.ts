import type { AssemblyStatus } from '@shared/schemas/builds';

export interface BuildListFilters {
  /** Quartermasters and leads may see every member's builds. */
  all?: boolean;
}

export interface AssemblyListFilters {
  mine?: boolean;
  status?: AssemblyStatus;
}

export const buildKeys = {
  all: ['builds'] as const,
  list: (filters: BuildListFilters) => ['builds', 'list', filters] as const,
  detail: (id: number) => ['builds', 'detail', id] as const,
};

/** The stock feature's assembly picker reads ['assemblies', 'list', { mine: true }] too: keep the shape. */
export const assemblyKeys = {
  all: ['assemblies'] as const,
  list: (filters: AssemblyListFilters) => ['assemblies', 'list', filters] as const,
  detail: (id: number) => ['assemblies', 'detail', id] as const,
  estimate: (id: number) => ['assemblies', 'estimate', id] as const,
};

export const preferenceKeys = {
  all: ['preferences'] as const,
};
