import type { Catalogue } from '@shared/schemas/offline';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { openAssembliesOf } from '../planning/planning.reads';
import { catalogueBins } from '../stock/stock.reads';
import { catalogueTools, loansByHolder, signoffIdsOf } from '../tools/tools.reads';

/**
 * The copy of the catalogue a phone keeps to recognise a scan offline, for one member: read in one
 * transaction, so tools, bins and the member's own loans are from the same moment. Each part is the
 * read model of the feature that owns its tables.
 */
export function takeCatalogue(ctx: ServiceContext, user: UserRow): Catalogue {
  return ctx.db.$client.transaction((): Catalogue => {
    const tools = catalogueTools(ctx.db);
    return {
      takenAt: ctx.now().toISOString(),
      you: { id: user.id, name: user.name, role: user.role },
      tools,
      bins: catalogueBins(ctx.db, user.id),
      yourLoans: loansByHolder(tools).get(user.id) ?? [],
      yourSignoffs: signoffIdsOf(ctx.db, user.id),
      yourAssemblies: openAssembliesOf(ctx.db, user.id),
    };
  })();
}
