import type { AssemblyName } from '@shared/schemas/bins';
import type { Executor } from '../../db/client';

/**
 * Assemblies belong to the planning feature: the app hands stock this way to name them
 * (ids that name no assembly are missing from the answer).
 */
export type NameAssemblies = (db: Executor, ids: readonly number[]) => Map<number, AssemblyName>;

/** Each entry with its assembly named; null when it names none (or the assembly is gone). */
export function withAssemblyNames<T extends { assemblyId: number | null }>(db: Executor, nameAssemblies: NameAssemblies, entries: T[]): (T & { assembly: AssemblyName | null })[] {
  const names = nameAssemblies(
    db,
    entries.flatMap((e) => (e.assemblyId === null ? [] : [e.assemblyId])),
  );
  return entries.map((e) => ({ ...e, assembly: e.assemblyId === null ? null : (names.get(e.assemblyId) ?? null) }));
}
