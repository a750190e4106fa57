/** This feature's query keys; every family lives in the one registry (lib/query-keys.ts). */
export { stationKeys } from '@/lib/query-keys';
