import type { AssemblyName } from '@shared/schemas/bins';
import type { Executor } from '../../db/client';

/**
 * Assemblies belong to the planning feature: the app hands stock this way to name them
 * (ids that name no assembly are missing from the answer).
 */
export type NameAssemblies = (db: Executor, ids: readonly number[]) => Map<number, AssemblyName>;

type Named<T> = T & { assembly: AssemblyName | null };

/** The names of every assembly the lists mention, in one query. */
export function namesFor(db: Executor, nameAssemblies: NameAssemblies, ...lists: { assemblyId: number | null }[][]): Map<number, AssemblyName> {
  return nameAssemblies(
    db,
    lists.flatMap((list) => list.flatMap((e) => (e.assemblyId === null ? [] : [e.assemblyId]))),
  );
}

/** Each entry with its assembly named; null when it names none (or the assembly is gone). */
export function withNames<T extends { assemblyId: number | null }>(entries: T[], names: Map<number, AssemblyName>): Named<T>[] {
  return entries.map((e) => ({ ...e, assembly: e.assemblyId === null ? null : (names.get(e.assemblyId) ?? null) }));
}

export function withAssemblyNames<T extends { assemblyId: number | null }>(db: Executor, nameAssemblies: NameAssemblies, entries: T[]): Named<T>[] {
  return withNames(entries, namesFor(db, nameAssemblies, entries));
}
