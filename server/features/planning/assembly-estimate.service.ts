import { estimate, isEstimateErrors, type EstimateInput, type EstimateResult } from '@shared/estimate/estimate';
import { totalsRules } from '@shared/estimate/line-rules';
import { estimateCautions, PLAN_NOT_DESIGN } from '@shared/safety/estimate-cautions';
import type { AssemblyEstimate, KitItem } from '@shared/schemas/builds';
import type { ServiceContext } from '../../context';
import type { Executor } from '../../db/client';
import type { UserRow } from '../../db/schema/users';
import { readPlanningSettings } from '../../settings/planning-settings';
import type { AssemblyInBuild } from './assemblies.repo';
import { assemblyToRead } from './assemblies.service';
import { billLines, drillOverrides, matchNeeds, type NeedMatch } from './bill';
import { cribKit } from './crib-kit';
import { parseExtraItems, parseLines } from './planning-dto';

/** The lead of the caution box; the estimate's `cautions` follow it (the plans govern, approved data, drilling). */
export const ESTIMATE_CAUTION = `${PLAN_NOT_DESIGN} Powered tools: eye and hearing protection, and a sign-off before first use.`;

interface Worked {
  result: EstimateResult;
  cautions: readonly string[];
  matches: NeedMatch[];
  labels: (string | null)[];
}
interface Refused {
  errors: AssemblyEstimate['errors'];
  cautions: readonly string[];
  wastePercent: number;
}

/**
 * The assembly's estimate with the build's edge distance floor and the chapter's settings. When a
 * bin that stocks a line's rivet names its own hole drill, that line is estimated again with it.
 */
function work(db: Executor, { assembly, build }: AssemblyInBuild): Worked | Refused {
  const planning = readPlanningSettings(db);
  const stored = parseLines(assembly.lines);
  const labels = stored.map((l) => l.label ?? null);
  const input: EstimateInput = { unit: assembly.unit, lines: stored.map(({ label: _label, ...line }) => line) };
  const options = { defaultWastePercent: planning.wastePercent, maxPitchDiameters: planning.maxPitchDiameters, edgeFloorIn: build.edgeFloorIn };
  const cautions = estimateCautions(stored);
  const refused = (errors: AssemblyEstimate['errors']): Refused => ({ errors, cautions, wastePercent: planning.wastePercent });
  const first = estimate(input, options);
  if (isEstimateErrors(first)) return refused(first.errors);
  const matches = matchNeeds(db, first.needs);
  const finalDrillOverrides = drillOverrides(matches, input.lines.length);
  if (finalDrillOverrides.every((d) => d === null)) return { result: first, cautions, matches, labels };
  const second = estimate(input, { ...options, finalDrillOverrides });
  return isEstimateErrors(second) ? refused(second.errors) : { result: second, cautions, matches, labels };
}

export function estimateAssembly(db: Executor, found: AssemblyInBuild): AssemblyEstimate {
  const { assembly } = found;
  const extras = parseExtraItems(assembly.extraItems);
  const worked = work(db, found);
  const base = { assemblyId: assembly.id, unit: assembly.unit, caution: ESTIMATE_CAUTION, cautions: worked.cautions };
  if ('errors' in worked) {
    // The editor shows what to fix; the extra items still have their bins.
    const totals = { rivets: 0, rivetsWithWaste: 0, drillHoles: {}, tempFasteners: {}, rules: totalsRules(worked.wastePercent, 'chapter') };
    return { ...base, wastePercent: worked.wastePercent, lines: [], totals, warnings: [], errors: worked.errors, bill: billLines(db, assembly.id, [], extras), kit: [] };
  }
  const { result, matches, labels } = worked;
  return {
    ...base,
    wastePercent: result.wastePercent,
    lines: result.lines.map((l, i) => ({ ...l, label: labels[i] ?? null })),
    totals: result.totals,
    warnings: result.warnings,
    errors: [],
    bill: billLines(db, assembly.id, matches, extras),
    kit: cribKit(db, result, found.build.ownerId),
  };
}

export function getAssemblyEstimate(ctx: ServiceContext, user: UserRow, id: number): AssemblyEstimate {
  return estimateAssembly(ctx.db, assemblyToRead(ctx, user, id));
}

/** The bill alone (bins against needs), without working out the crib kit. */
export function assemblyBill(db: Executor, found: AssemblyInBuild): AssemblyEstimate['bill'] {
  const worked = work(db, found);
  return billLines(db, found.assembly.id, 'errors' in worked ? [] : worked.matches, parseExtraItems(found.assembly.extraItems));
}

/** The crib kit alone, for placing holds. */
export function assemblyKit(db: Executor, found: AssemblyInBuild): KitItem[] {
  const worked = work(db, found);
  return 'errors' in worked ? [] : cribKit(db, worked.result, found.build.ownerId);
}
