/** How the sheet a flush head sits in is made to take it. */
export const FLUSH_PREPS = ['countersink', 'dimple'] as const;
export type FlushPrep = (typeof FLUSH_PREPS)[number];

/**
 * The thinnest sheet, in inches, that may be machine countersunk for a 100° flush head, by rivet
 * diameter in 32nds (US Army TM 9-2320-363-34-2, "Minimum Sheet Gage for 100-Degree Machine
 * Countersink", as seen in a public restatement). A thinner sheet is dimpled.
 */
export const MIN_COUNTERSINK_SHEET_IN: Readonly<Record<number, number>> = Object.freeze({ 3: 0.04, 4: 0.05, 5: 0.064, 6: 0.072, 8: 0.072 });

/** What the rule gives for one sheet: countersunk at or above the minimum gage, dimpled below it. */
export const flushPrepForSheet = (sheetIn: number, diameter32: number): FlushPrep =>
  sheetIn >= MIN_COUNTERSINK_SHEET_IN[diameter32]! - 1e-9 ? 'countersink' : 'dimple';

/** Whether countersinking this sheet would leave a knife edge: it is below the minimum gage (MIL-HDBK-5 notes the knife edge as not approved, secondary). */
export const leavesKnifeEdge = (sheetIn: number, diameter32: number): boolean => flushPrepForSheet(sheetIn, diameter32) === 'dimple';

/**
 * What each sheet of a flush stack needs, head side first, as two flags: whether any sheet is
 * countersunk and whether any is dimpled. The top sheet follows the plans' choice or the rule; the
 * sheet under a dimpled sheet is countersunk to take the dimple when it is at least the minimum
 * gage, else dimpled too (nested dimples, common practice); below a countersunk sheet the holes are
 * plain. `stack` is in the line's unit, `scale` that unit per inch.
 */
export function flushSheetPreps(stack: readonly number[], scale: number, diameter32: number, top: FlushPrep): FlushSheets {
  let countersink = top === 'countersink';
  let dimple = !countersink;
  for (let i = 1; i < stack.length && !countersink; i++) {
    if (flushPrepForSheet(stack[i]! / scale, diameter32) === 'countersink') countersink = true;
    else dimple = true;
  }
  return countersink ? (dimple ? BOTH : COUNTERSINK_ONLY) : DIMPLE_ONLY;
}
export interface FlushSheets {
  readonly countersink: boolean;
  readonly dimple: boolean;
}
const BOTH: FlushSheets = Object.freeze({ countersink: true, dimple: true });
const COUNTERSINK_ONLY: FlushSheets = Object.freeze({ countersink: true, dimple: false });
const DIMPLE_ONLY: FlushSheets = Object.freeze({ countersink: false, dimple: true });
