import { SOFT_RIVET_CAUTION, type EstimateRivetKind } from '../estimate/rivet-rules';

/** What Gripline's estimate is and is not: it plans stock and tools, it does not design structures. */
export const PLAN_NOT_DESIGN = 'Gripline plans stock and tools; it does not design structures. Follow local codes and rules.';

export const PLANS_GOVERN_CAUTION =
  'The kit’s plans and the rivet maker’s instructions govern rivet counts, grips, edge distances and drill sizes: where they differ from this estimate, follow them.';

export const CERTIFICATED_CAUTION = 'On a certificated aircraft, use approved data, and have a licensed mechanic or inspector check the work and sign it off.';

/** Every estimate drills. */
export const DRILLING_CAUTION =
  'Drilling: clamp the work, never hold it by hand; keep fingers clear of the bit; clear chips with a brush, not your fingers; deburr both sides of every hole; wear eye protection.';

export { SOFT_RIVET_CAUTION };

const USUAL: readonly string[] = Object.freeze([PLANS_GOVERN_CAUTION, CERTIFICATED_CAUTION, DRILLING_CAUTION]);
const WITH_SOFT_RIVETS: readonly string[] = Object.freeze([PLANS_GOVERN_CAUTION, CERTIFICATED_CAUTION, SOFT_RIVET_CAUTION, DRILLING_CAUTION]);

/** The cautions of an estimate: always the plans, approved data and drilling; the soft blind rivet one when a line uses a general-purpose blind rivet. */
export const cautionsFor = (generalBlindRivets: boolean): readonly string[] => (generalBlindRivets ? WITH_SOFT_RIVETS : USUAL);

/** The cautions for a set of rivet lines. */
export function estimateCautions(lines: readonly { rivet: { kind: EstimateRivetKind } }[]): readonly string[] {
  return cautionsFor(lines.some((l) => l.rivet.kind === 'blind-general'));
}
