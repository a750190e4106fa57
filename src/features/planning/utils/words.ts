import type { LengthUnit } from '@shared/schemas/builds';
import { diameterWords, lengthWords } from '@shared/estimate/length-words';
import type { FlushPrep } from '@shared/estimate/flush-prep';
import type { EstimateRivetKind } from '@shared/estimate/rivet-rules';
import { blindGripRange, inchFraction } from '@shared/stock/fasteners';
import { RIVET_SET_WORDS, rivetHeadLabel, type RivetHead } from '@shared/stock/kinds';
import { formatCount, formatDay } from '@/lib/format';

export const RIVET_KIND_LABELS: Record<EstimateRivetKind, string> = {
  'blind-structural': 'Structural blind rivet',
  'blind-general': 'General-purpose blind rivet',
  solid: 'Solid rivet',
};

export const UNIT_WORDS: Record<LengthUnit, string> = { in: 'inches', mm: 'millimetres' };

/** A length in its unit: inches to 0.0001 in, millimetres to 0.01 mm (the estimator's cautions use the same). */
export const lengthText = lengthWords;

/** A rivet diameter dash in 32nds: 5 → "5/32 in". */
export const diameterText = diameterWords;

/**
 * The grip of a rivet line: blind rivets by grip dash with the stack it takes ("−2 (0.063–0.125 in)"),
 * solid rivets by length dash as inches ("length −4 (1/4 in)").
 */
export function gripText(kind: EstimateRivetKind, grip: number | null): string {
  if (grip === null) return 'none in the grip table';
  if (kind === 'solid') return `length −${grip} (${inchFraction(grip * 2, 32)} in)`;
  const range = blindGripRange(grip);
  return range ? `−${grip} (${range.min.toFixed(3)}–${range.max.toFixed(3)} in)` : `−${grip}`;
}

export const drillStepsText = (steps: readonly string[]): string => steps.join(' → ');

/** How a flush head's top sheet is prepared, as the builder does it. */
export const FLUSH_PREP_WORDS: Record<FlushPrep, string> = { countersink: 'Countersink the top sheet (100°)', dimple: 'Dimple the top sheet (100°)' };

/** A solid rivet's length with the shop head it makes: "length −4 (1/4 in), shop head about 0.1875 in wide, 0.0625 in high". */
export function solidLengthText(grip: number | null, shopHead: { width: number; height: number } | null, unit: LengthUnit): string {
  const length = gripText('solid', grip);
  return shopHead ? `${length}, shop head about ${lengthText(shopHead.width, unit)} wide, ${lengthText(shopHead.height, unit)} high` : length;
}

/** The half-length dash offered below the length: "−3.5 (7/32 in) also fits; which half lengths are stocked varies by supplier". */
export const halfLengthText = (half: number): string => `−${half} (${inchFraction(half * 2, 32)} in) also fits; which half lengths are stocked varies by supplier`;

/** Temporary fasteners by size: "3/32 in × 7, 1/8 in × 7". */
export const tempFastenersText = (bySize: Record<string, number>): string =>
  Object.entries(bySize)
    .map(([size, n]) => `${size} in × ${formatCount(n)}`)
    .join(', ') || 'none';

/** Holes per drill step: "#40: 21, #30: 21". */
export const drillHolesText = (byDrill: Record<string, number>): string =>
  Object.entries(byDrill)
    .map(([drill, n]) => `${drill}: ${formatCount(n)}`)
    .join(', ') || 'none';

/** A rivet's head in the trade's words for its kind: a solid rivet's dome is its universal head. */
export const headText = (head: RivetHead, kind: EstimateRivetKind): string => rivetHeadLabel(head, kind === 'solid');

/** The rivet gun set for a solid rivet's head, as the crib kit names it: "universal-head rivet set". */
export const rivetSetText = (head: RivetHead): string => RIVET_SET_WORDS[head];

/** A planned day (YYYY-MM-DD) for people; days carry no time zone, so they are read as UTC. */
export const dayText = formatDay;

export function plannedDatesText(start: string | null, finish: string | null): string {
  if (start && finish) return `${dayText(start)} to ${dayText(finish)}`;
  if (start) return `from ${dayText(start)}`;
  if (finish) return `finish by ${dayText(finish)}`;
  return 'no dates planned';
}

export const plural = (n: number, one: string, many = `${one}s`): string => `${formatCount(n)} ${n === 1 ? one : many}`;
