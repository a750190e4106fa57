/** This feature's query keys; every family lives in the one registry (lib/query-keys.ts). */
export { buildKeys, assemblyKeys, preferenceKeys, type BuildListFilters, type AssemblyListFilters } from '@/lib/query-keys';
