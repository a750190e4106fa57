import type { AssemblyName } from '@shared/schemas/bins';
import type { Catalogue } from '@shared/schemas/offline';
import type { Executor } from '../../db/client';
import { assemblyAndBuildNames, listAssemblies } from './assemblies.repo';

/** The assemblies a member may draw for: their own, not done. */
export function openAssembliesOf(db: Executor, ownerId: number): Catalogue['yourAssemblies'] {
  return listAssemblies(db, { ownerId })
    .filter((a) => a.assembly.status !== 'done')
    .map((a) => ({ id: a.assembly.id, name: a.assembly.name, buildName: a.build.name }));
}

/** Names assemblies for other features (the stock ledger and tabs name the assembly a draw was for). */
export function assemblyNames(db: Executor, ids: readonly number[]): Map<number, AssemblyName> {
  return new Map(assemblyAndBuildNames(db, [...new Set(ids)]).map((a) => [a.id, { name: a.name, buildName: a.buildName }]));
}
