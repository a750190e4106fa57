import type { StationCopy } from '@shared/schemas/stations';
import { workingBadgeHolders } from '../../accounts/badges.repo';
import type { ServiceContext } from '../../context';
import { openAssembliesByOwner } from '../planning/planning.reads';
import { drawnByPerson, stationCatalogueBins } from '../stock/stock.reads';
import { catalogueTools, loansByHolder, signoffIdsByPerson } from '../tools/tools.reads';
import { stationOfToken } from './stations.service';

/**
 * What a station keeps to go on without the network (GET /api/station/copy): the catalogue's tools
 * and bins, and every active person holding a working badge with the badge token's SHA-256 (what
 * `badges.token_hash` holds), the PIN's argon2id hash and what the offline checks need of them.
 * No e-mail. Read in one transaction with a fixed number of queries however many people there are:
 * each part is one grouped read of the feature that owns its tables.
 */
export function takeStationCopy(ctx: ServiceContext, stationToken: string | undefined): StationCopy {
  return ctx.db.$client.transaction((): StationCopy => {
    const station = stationOfToken(ctx, stationToken);
    const tools = catalogueTools(ctx.db);
    const holders = workingBadgeHolders(ctx.db);
    const ids = holders.map((h) => h.userId);
    const signoffs = signoffIdsByPerson(ctx.db, ids);
    const assemblies = openAssembliesByOwner(ctx.db, ids);
    const drawn = drawnByPerson(ctx.db, ids);
    const loans = loansByHolder(tools);
    return {
      takenAt: ctx.now().toISOString(),
      station: { id: station.id, name: station.name },
      tools,
      bins: stationCatalogueBins(ctx.db),
      people: holders.map((h) => ({
        id: h.userId,
        name: h.name,
        role: h.role,
        badgeHash: h.badgeHash,
        pinHash: h.pinHash,
        loans: loans.get(h.userId) ?? [],
        signoffs: signoffs.get(h.userId) ?? [],
        assemblies: assemblies.get(h.userId) ?? [],
        drawn: drawn.get(h.userId) ?? {},
      })),
    };
  })();
}
