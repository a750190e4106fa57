import type { ActualWaste } from '@shared/schemas/forecast';
import type { ServiceContext } from '../../context';
import { readPlanningSettings } from '../../settings/planning-settings';
import { assemblyBinNeeds, binIndex } from './assembly-needs';
import { allBins, drawnForAssemblies } from '../stock/stock.reads';
import { assembliesIn } from './forecast.repo';

type Tally = { estimated: number; drawn: number };

/** (drawn − estimated) / estimated as a percentage to one decimal; none when nothing was estimated. */
const wastePercent = ({ estimated, drawn }: Tally) => (estimated > 0 ? Math.round(((drawn - estimated) / estimated) * 1000) / 10 : null);

/**
 * Waste measured on finished assemblies: the rivets their estimate needed (without the allowance,
 * only needs some bin stocks) against what was drawn for them from those bins, net of returns and
 * reversals. Per member (the build's owner) and for the chapter.
 */
export function actualWaste(ctx: ServiceContext): ActualWaste {
  const settings = readPlanningSettings(ctx.db);
  const index = binIndex(allBins(ctx.db));
  const done = assembliesIn(ctx.db, ['done']);
  const drawn = drawnForAssemblies(ctx.db, done.map((a) => a.id));
  const chapter: Tally = { estimated: 0, drawn: 0 };
  const members = new Map<number, Tally & { name: string }>();
  for (const a of done) {
    const needs = assemblyBinNeeds(a, settings, index).filter((n) => n.rivet);
    if (needs.length === 0) continue;
    const estimated = needs.reduce((sum, n) => sum + n.estimated, 0);
    const fromBins = new Set(needs.flatMap((n) => n.binIds));
    let taken = 0;
    for (const binId of fromBins) taken += drawn.get(`${a.id}:${binId}`) ?? 0;
    const member = members.get(a.ownerId) ?? { name: a.ownerName, estimated: 0, drawn: 0 };
    member.estimated += estimated;
    member.drawn += taken;
    members.set(a.ownerId, member);
    chapter.estimated += estimated;
    chapter.drawn += taken;
  }
  return {
    chapter: { ...chapter, wastePercent: wastePercent(chapter) },
    members: [...members.entries()]
      .sort(([, x], [, y]) => x.name.localeCompare(y.name))
      .map(([id, m]) => ({ member: { id, name: m.name }, estimated: m.estimated, drawn: m.drawn, wastePercent: wastePercent(m) })),
    currentAllowance: settings.wastePercent,
  };
}
