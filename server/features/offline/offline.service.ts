import type { Catalogue, CatalogueBin, CatalogueTool } from '@shared/schemas/offline';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import type { UserRow } from '../../db/schema/users';

/** What the catalogue copy is made of; each part comes from the feature that owns its tables (the app wires them). */
export interface CatalogueSources {
  tools(db: Executor): CatalogueTool[];
  signoffIds(db: Executor, userId: number): number[];
  bins(db: Executor, memberId: number): CatalogueBin[];
  assemblies(db: Executor, ownerId: number): Catalogue['yourAssemblies'];
}

/**
 * The copy of the catalogue a phone keeps to recognise a scan offline, for one member: read in one
 * transaction, so tools, bins and the member's own loans are from the same moment.
 */
export function takeCatalogue(ctx: ServiceContext, user: UserRow, sources: CatalogueSources): Catalogue {
  return ctx.db.$client.transaction((): Catalogue => {
    const tools = sources.tools(ctx.db);
    return {
      takenAt: ctx.now().toISOString(),
      you: { id: user.id, name: user.name, role: user.role },
      tools,
      bins: sources.bins(ctx.db, user.id),
      yourLoans: tools.filter((t) => t.status === 'on_loan' && t.holder?.id === user.id).map((t) => ({ code: t.code, dueAt: t.dueAt! })),
      yourSignoffs: sources.signoffIds(ctx.db, user.id),
      yourAssemblies: sources.assemblies(ctx.db, user.id),
    };
  })();
}
