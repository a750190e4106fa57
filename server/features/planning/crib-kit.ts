import type { EstimateResult } from '@shared/estimate/estimate';
import type { KitItem, KitRole } from '@shared/schemas/builds';
import { inchFraction } from '@shared/stock/fasteners';
import { rivetSetSentence, type RivetHead } from '@shared/stock/kinds';
import type { ToolCategory } from '@shared/tools/categories';
import type { Executor } from '../../db/client';
import { kitCandidateTools, toolIdsOfferedTo, type KitCandidateTool } from '../tools/tools.reads';

type CribTool = Omit<KitCandidateTool, 'id'>;

const KIT_CATEGORIES: ToolCategory[] = ['hand_rivet_puller', 'pneumatic_rivet_puller', 'rivet_gun', 'bucking_bar', 'drill_bit', 'countersink_cutter', 'dimple_dies', 'temporary_fastener_tray', 'deburring_tool'];

/** The crib's tools that could join a kit (lost and retired ones never will); those set aside for `forUserId` say so. */
function loadCrib(db: Executor, forUserId: number): CribTool[] {
  const heldForYou = toolIdsOfferedTo(db, forUserId);
  return kitCandidateTools(db, KIT_CATEGORIES).map(({ id, ...t }) => ({ ...t, status: heldForYou.has(id) ? HELD_FOR_YOU : t.status }));
}

/** A tool already set aside for the person the kit is for: the best pick of all. */
export const HELD_FOR_YOU = 'held_for_you';

/** Free now first, then held, on loan, out of service; a hand tool before a powered one. */
const STATUS_RANK: Record<string, number> = { [HELD_FOR_YOU]: -1, available: 0, held: 1, on_loan: 2, out_of_service: 3 };
const freer = (a: CribTool, b: CribTool) => (STATUS_RANK[a.status] ?? 9) - (STATUS_RANK[b.status] ?? 9);
const preferred = (a: CribTool, b: CribTool) =>
  freer(a, b) || Number(a.category.startsWith('pneumatic')) - Number(b.category.startsWith('pneumatic')) || a.code.localeCompare(b.code);

/** Why the kit's pick cannot go home with you today, if it cannot. */
function noteFor(tool: CribTool | undefined, candidates: CribTool[]): string | null {
  if (!tool) return 'none in the crib';
  if (tool.status === 'available') return null;
  if (tool.status === HELD_FOR_YOU) return null;
  if (candidates.every((c) => c.status === 'on_loan')) return 'all on loan';
  return 'none free now: on loan, held for someone or out of service';
}

const item = (role: KitRole, need: string, count: number | null, tool: CribTool | undefined, note: string | null): KitItem => ({
  role,
  need,
  count,
  tool: tool ? { code: tool.code, name: tool.name, status: tool.status, category: tool.category } : null,
  note,
});

/** The best tool of a list, with its note. */
function pick(role: KitRole, need: string, count: number | null, candidates: CribTool[]): KitItem {
  const sorted = [...candidates].sort(preferred);
  return item(role, need, count, sorted[0], noteFor(sorted[0], sorted));
}

const sizes = (d32s: number[]) => d32s.map((d) => inchFraction(d, 32)).join(', ');
const hasNosepiece = (t: CribTool, d32: number) => t.accessories.some((a) => new RegExp(`nosepiece ${inchFraction(d32, 32)}(?![0-9/])`, 'i').test(a));
const SET_PATTERN: Record<RivetHead, RegExp> = { dome: /(universal|dome|round).*set/i, flange: /(universal|dome|round).*set/i, countersunk: /flush.*set/i };
const hasSet = (t: CribTool, head: RivetHead) => t.accessories.some((a) => SET_PATTERN[head].test(a));

/**
 * A tool that carries accessories (a puller and its nosepieces, a rivet gun and its sets): the
 * holder that carries the most of them is picked, then each accessory names the tool it travels with.
 */
function withAccessories<K>(
  holders: CribTool[],
  keys: K[],
  has: (t: CribTool, k: K) => boolean,
  holder: { role: KitRole; need: string },
  accessory: { role: KitRole; need: (k: K) => string },
): KitItem[] {
  const covered = (t: CribTool) => keys.filter((k) => has(t, k)).length;
  const sorted = [...holders].sort((a, b) => covered(b) - covered(a) || preferred(a, b));
  const chosen = sorted[0];
  const items = [item(holder.role, holder.need, null, chosen, noteFor(chosen, sorted))];
  for (const k of keys) {
    const carriers = holders.filter((t) => has(t, k)).sort((a, b) => Number(b === chosen) - Number(a === chosen) || preferred(a, b));
    const tool = carriers[0];
    const elsewhere = tool && chosen && tool !== chosen ? `travels with ${tool.code}, not with ${chosen.code}` : null;
    items.push(item(accessory.role, accessory.need(k), null, tool, tool ? (noteFor(tool, carriers) ?? elsewhere) : 'none in the crib'));
  }
  return items;
}

/** Trays of one size, free ones and the largest first, until they hold the count. */
function trays(crib: CribTool[], size: string, needed: number): KitItem[] {
  const candidates = crib.filter((t) => t.category === 'temporary_fastener_tray' && t.traySize === size).sort((a, b) => freer(a, b) || (b.trayCapacity ?? 0) - (a.trayCapacity ?? 0) || a.code.localeCompare(b.code));
  const need = `Temporary fasteners ${size} in`;
  if (candidates.length === 0) return [item('temporary_fastener_tray', need, needed, undefined, 'none in the crib')];
  const chosen: CribTool[] = [];
  let held = 0;
  for (const t of candidates) {
    if (held >= needed) break;
    chosen.push(t);
    held += t.trayCapacity ?? 0;
  }
  const items = chosen.map((t, i) => item('temporary_fastener_tray', chosen.length > 1 ? `${need}, tray ${i + 1} of ${chosen.length}` : need, needed, t, noteFor(t, candidates)));
  if (held < needed) items.push(item('temporary_fastener_tray', `${need}: ${needed - held} more`, needed - held, undefined, `the crib's ${size} in trays hold only ${held}`));
  return items;
}

/** What to take from the crib for the assembly: pullers or guns, drill bits by step, trays, a deburring tool. */
export function cribKit(db: Executor, result: EstimateResult, forUserId: number): KitItem[] {
  if (result.totals.rivets === 0) return [];
  const crib = loadCrib(db, forUserId);
  const of = (...categories: ToolCategory[]) => crib.filter((t) => categories.includes(t.category));
  const kit: KitItem[] = [];

  const blind = [...new Set(result.nosepieces.filter((n) => n.kind === 'blind').map((n) => n.diameter32))].sort((a, b) => a - b);
  if (blind.length > 0) {
    kit.push(
      ...withAccessories(of('hand_rivet_puller', 'pneumatic_rivet_puller'), blind, hasNosepiece, { role: 'puller', need: `Rivet puller for ${sizes(blind)} in blind rivets` }, { role: 'nosepiece', need: (d) => `Nosepiece ${inchFraction(d, 32)} in` }),
    );
  }
  const solid = result.nosepieces.filter((n) => n.kind === 'solid');
  if (solid.length > 0) {
    const heads = [...new Set(solid.map((n) => n.head))];
    const forHead = (h: RivetHead) => sizes([...new Set(solid.filter((n) => n.head === h).map((n) => n.diameter32))].sort((a, b) => a - b));
    kit.push(
      ...withAccessories(of('rivet_gun'), heads, hasSet, { role: 'rivet_gun', need: `Rivet gun for ${sizes([...new Set(solid.map((n) => n.diameter32))].sort((a, b) => a - b))} in solid rivets` }, { role: 'rivet_set', need: (h) => `${rivetSetSentence(h)} for ${forHead(h)} in` }),
      pick('bucking_bar', 'Bucking bar', null, of('bucking_bar')),
    );
  }
  for (const [step, holes] of Object.entries(result.totals.drillHoles)) {
    kit.push(pick('drill_bit', `Drill bit ${step}`, holes, of('drill_bit').filter((t) => t.drillSize === step)));
  }
  // A cutter is made for one rivet size and turns on a pilot that fits the line's final hole; dies for one rivet size.
  for (const f of result.flushTools) {
    kit.push(
      f.prep === 'countersink'
        ? pick('countersink_cutter', `100° countersink cutter, ${inchFraction(f.diameter32, 32)} in, ${f.pilot} pilot`, null, of('countersink_cutter').filter((t) => t.rivetDiameter32 === f.diameter32 && t.drillSize === f.pilot))
        : pick('dimple_dies', `100° dimple dies, ${inchFraction(f.diameter32, 32)} in`, null, of('dimple_dies').filter((t) => t.rivetDiameter32 === f.diameter32)),
    );
  }
  for (const [size, count] of Object.entries(result.totals.tempFasteners)) kit.push(...trays(crib, size, count));
  kit.push(pick('deburring_tool', 'Deburring tool', null, of('deburring_tool')));
  return kit;
}
