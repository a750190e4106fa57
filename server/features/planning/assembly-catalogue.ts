import type { Catalogue } from '@shared/schemas/offline';
import type { Executor } from '../../db/client';
import { listAssemblies } from './assemblies.repo';

/** The assemblies a member may draw for: their own, not done. */
export function openAssembliesOf(db: Executor, ownerId: number): Catalogue['yourAssemblies'] {
  return listAssemblies(db, { ownerId })
    .filter((a) => a.assembly.status !== 'done')
    .map((a) => ({ id: a.assembly.id, name: a.assembly.name, buildName: a.build.name }));
}
