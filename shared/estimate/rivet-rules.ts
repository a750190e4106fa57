import type { RivetHead } from '../stock/kinds';

/** The rivet kinds the estimator knows, as the API names them. */
export const ESTIMATE_RIVET_KINDS = ['blind-structural', 'blind-general', 'solid'] as const;
export type EstimateRivetKind = (typeof ESTIMATE_RIVET_KINDS)[number];

/** Diameters (in 32nds of an inch) with a published final drill. */
export const ESTIMATE_DIAMETERS = [3, 4, 5, 6, 8] as const;

/**
 * Final drill by rivet diameter. Solid rivets: FAA-H-8083-31 ch. 4 (3/32 #40, 1/8 #30, 5/32 #21,
 * 3/16 #11, 1/4 F). Blind rivets: the hole ranges of TM 10-5410-221-14/1 Table 4-3 (3/32 #40 —
 * inside 0.096–0.100 in, common practice —, 1/8 #30, 5/32 #20, 1/4 F); its 3/16 row is not
 * legible, so 3/16 uses #11 like the solid rivet and a bin may override its hole drill.
 */
export const FINAL_DRILL: Record<'solid' | 'blind', Readonly<Record<number, string>>> = {
  solid: { 3: '#40', 4: '#30', 5: '#21', 6: '#11', 8: 'F' },
  blind: { 3: '#40', 4: '#30', 5: '#20', 6: '#11', 8: 'F' },
};

export const PILOT_DRILL = '#40';

/** The temporary fastener that fits each drill step's hole (NAVEDTRA 14315: 3/32 ↔ #40, 1/8 ↔ #30, 5/32 ↔ #21/#20, 3/16 ↔ #11). */
export const TEMP_FASTENER_FOR_DRILL: Readonly<Record<string, string>> = {
  '#40': '3/32',
  '#30': '1/8',
  '#21': '5/32',
  '#20': '5/32',
  '#11': '3/16',
  F: '1/4',
};

export const familyOf = (kind: EstimateRivetKind): 'solid' | 'blind' => (kind === 'solid' ? 'solid' : 'blind');

/**
 * Pilot #40, then the final drill of each smaller rivet size, then this rivet's final drill
 * (common practice: open the hole one rivet size at a time). `finalOverride` is a bin's own hole drill.
 */
export function drillSequence(kind: EstimateRivetKind, diameter32: number, finalOverride?: string | null): readonly string[] {
  const key = `${familyOf(kind)}|${diameter32}|${finalOverride ?? ''}`;
  let steps = sequences.get(key);
  if (!steps) sequences.set(key, (steps = Object.freeze(buildSequence(kind, diameter32, finalOverride))));
  return steps;
}

/** Few distinct sequences exist; each is worked out once and shared (frozen) by every line that uses it. */
const sequences = new Map<string, readonly string[]>();

function buildSequence(kind: EstimateRivetKind, diameter32: number, finalOverride?: string | null): string[] {
  const table = FINAL_DRILL[familyOf(kind)];
  const steps = [PILOT_DRILL];
  for (const d of ESTIMATE_DIAMETERS) {
    if (d > diameter32) break;
    const drill = d === diameter32 && finalOverride ? finalOverride : table[d]!;
    if (!steps.includes(drill)) steps.push(drill);
  }
  return steps;
}

/**
 * Minimum edge distance in rivet diameters: 2D (AC 43.13-1B ch. 4; TM 10-5410-229-13&P para 5-6),
 * 2.5D for countersunk heads (FAA-H-8083-31).
 */
export const minEdgeDiameters = (head: RivetHead) => (head === 'countersunk' ? 2.5 : 2);

/** Edge distance above about 4D is more than the rule asks (FAA-H-8083-31 as restated, a secondary source): a warning, not a refusal. */
export const MAX_EDGE_DIAMETERS = 4;

/**
 * Transverse pitch, between rows: about 75 % of the pitch, never less than 2.5D (FAA-H-8083-31,
 * secondary; TM 10-5410-229-13&P: rows never less than 2 1/2 times the diameter).
 */
export const TRANSVERSE_PITCH_OF_PITCH = 0.75;
export const MIN_TRANSVERSE_DIAMETERS = 2.5;

/** How the rows of a line sit: side by side, or each second row moved along by half a pitch. */
export const ROW_PATTERNS = ['inline', 'staggered'] as const;
export type RowPattern = (typeof ROW_PATTERNS)[number];

/** Holes in a line of rows: staggered rows at odd index are half a pitch along, so they hold one hole fewer. */
export const rowHoles = (holesPerRow: number, rows: number, pattern: RowPattern = 'inline'): number =>
  holesPerRow * rows - (pattern === 'staggered' ? Math.floor(rows / 2) : 0);

/** Minimum pitch: 3D (AC 43.13-1B; TM 10-5410-229-13&P; NAVEDTRA 14018 ch. 13). */
export const MIN_PITCH_DIAMETERS = 3;
/** Maximum pitch: the sources disagree (8D NAVEDTRA 14018, 10D FAA-derived), so it is a chapter setting. */
export const DEFAULT_MAX_PITCH_DIAMETERS = 10;
export const DEFAULT_WASTE_PERCENT = 5;

export const MM_PER_INCH = 25.4;

export const SOFT_RIVET_CAUTION =
  'General-purpose (soft) blind rivets are for non-structural parts such as plastic windows and fibreglass; common pull-type blind rivets made for non-aircraft use are not approved for certificated aircraft structure (AC 43.13-1B p. 4-24). Use a structural blind rivet or a solid rivet, as the kit’s plans or approved data call for.';
