import { diameterWords, lengthWords } from './length-words';
import type { LengthUnit } from './estimate-line';
import { ESTIMATE_DIAMETERS, MM_PER_INCH } from './rivet-rules';

/**
 * A rivet's diameter is about three times the thickness of the thickest sheet (AC 43.13-1B
 * para 4-58g example; the FAA general rule).
 */
export const DIAMETER_OF_THICKEST_SHEET = 3;

/** The standard diameters (32nds) that bracket 3t: the largest not above it and the smallest not below it; either may be missing at the ends of the table. */
export function bracketing(thickestIn: number): { below: number | undefined; above: number | undefined } {
  const target32 = DIAMETER_OF_THICKEST_SHEET * thickestIn * 32;
  let below: number | undefined;
  let above: number | undefined;
  for (const d of ESTIMATE_DIAMETERS) {
    if (d <= target32 + 1e-9) below = d;
    if (above === undefined && d >= target32 - 1e-9) above = d;
  }
  return { below, above };
}

export type SheetRuleCode = 'DIAMETER_SMALL_FOR_SHEET' | 'DIAMETER_LARGE_FOR_SHEET' | 'DIAMETER_BELOW_SHEET_THICKNESS';
export interface SheetRuleFinding {
  readonly code: SheetRuleCode;
  readonly message: string;
  /** The finding as a line's whole warning list, when it is the line's only warning: shared, so such a line makes no list of its own. */
  readonly alone: readonly { code: string; message: string }[];
}

const dia = diameterWords;

/**
 * The diameter against the thickest sheet: below the sheet thickness (NAVEDTRA 14018 ch. 13 gives
 * the sheet thickness as the minimum diameter; the caller refuses it on a structural line), or
 * outside the standard sizes bracketing 3t. Null when the diameter fits. `thickest` is in `unit`.
 * Findings are few and the same for the same inputs: each is made once and shared (frozen).
 */
export function sheetRuleFinding(diameter32: number, thickest: number, unit: LengthUnit): SheetRuleFinding | null {
  // One small map per diameter and unit, keyed by the thickness itself: no key string per line.
  const slot = diameter32 * 2 + (unit === 'mm' ? 1 : 0);
  let byThickness = findings[slot];
  if (!byThickness) findings[slot] = byThickness = new Map<number, SheetRuleFinding | null>();
  const cached = byThickness.get(thickest);
  if (cached !== undefined) return cached;
  const scale = unit === 'mm' ? MM_PER_INCH : 1;
  const found = work(diameter32, thickest / scale, thickest, unit, scale);
  // Thicknesses come from people's input: keep at most a few thousand per slot.
  if (byThickness.size < 2000) byThickness.set(thickest, found);
  return found;
}
const findings: (Map<number, SheetRuleFinding | null> | undefined)[] = [];

/** The finding, frozen, with its one-element list; the list holds a plain notice so a line's warnings read { code, message } only. */
function finding(code: SheetRuleCode, message: string): SheetRuleFinding {
  return Object.freeze({ code, message, alone: Object.freeze([Object.freeze({ code, message })]) });
}

function work(diameter32: number, thickestIn: number, thickest: number, unit: LengthUnit, scale: number): SheetRuleFinding | null {
  const sheet = lengthWords(thickest, unit);
  if (diameter32 / 32 < thickestIn - 1e-9) {
    return finding(
      'DIAMETER_BELOW_SHEET_THICKNESS',
      `A ${dia(diameter32)} rivet is thinner than the ${sheet} sheet: on a structural line the diameter must be at least the thickest sheet. Use a larger rivet.`,
    );
  }
  const { below, above } = bracketing(thickestIn);
  const small = below !== undefined && diameter32 < below;
  const large = above !== undefined && diameter32 > above;
  if (!small && !large) return null;
  const sizes = below === undefined || above === undefined || below === above ? dia((below ?? above)!) : `${dia(below)} or ${dia(above)}`;
  return finding(
    small ? 'DIAMETER_SMALL_FOR_SHEET' : 'DIAMETER_LARGE_FOR_SHEET',
    `A ${dia(diameter32)} rivet is ${small ? 'small' : 'large'} for a ${sheet} sheet: about ${DIAMETER_OF_THICKEST_SHEET} × the thickest sheet is ${lengthWords(DIAMETER_OF_THICKEST_SHEET * thickestIn * scale, unit)}, so ${sizes}.`,
  );
}
