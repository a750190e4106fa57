import type { AssemblyName } from '@shared/schemas/bins';
import type { Executor } from '../../db/client';
import { assemblyNames } from '../planning/planning.reads';

type Named<T> = T & { assembly: AssemblyName | null };

/** The names of every assembly the lists mention, in one query (assemblies belong to planning; ids that name no assembly are absent). */
export function namesFor(db: Executor, ...lists: { assemblyId: number | null }[][]): Map<number, AssemblyName> {
  return assemblyNames(
    db,
    lists.flatMap((list) => list.flatMap((e) => (e.assemblyId === null ? [] : [e.assemblyId]))),
  );
}

/** Each entry with its assembly named; null when it names none (or the assembly is gone). */
export function withNames<T extends { assemblyId: number | null }>(entries: T[], names: Map<number, AssemblyName>): Named<T>[] {
  return entries.map((e) => ({ ...e, assembly: e.assemblyId === null ? null : (names.get(e.assemblyId) ?? null) }));
}

export function withAssemblyNames<T extends { assemblyId: number | null }>(db: Executor, entries: T[]): Named<T>[] {
  return withNames(entries, namesFor(db, entries));
}
