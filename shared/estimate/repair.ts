import { diameterWords } from './length-words';
import { ESTIMATE_DIAMETERS } from './rivet-rules';

/**
 * A rivet drilled out leaves a hole that is enlarged: the repair uses the next larger standard
 * diameter (common practice for oversize repair rivets; AC 43.13-1B ch. 4 as restated, not read in
 * the circular itself: replace with the next larger size when the hole is enlarged — from memory of
 * that restatement). The steps 3 → 4 → 5 → 6 → 8 (32nds) are the estimator's standard diameters;
 * 1/4 in is the largest it knows, so a 1/4 in repair has no size here and is refused.
 */
export function nextDiameter32(diameter32: number): number | null {
  const i = (ESTIMATE_DIAMETERS as readonly number[]).indexOf(diameter32);
  return i >= 0 && i + 1 < ESTIMATE_DIAMETERS.length ? ESTIMATE_DIAMETERS[i + 1]! : null;
}

const dia = diameterWords;

export const noLargerDiameterMessage = (diameter32: number): string =>
  `A repair of drilled-out ${dia(diameter32)} rivets needs the next larger diameter, and ${dia(diameter32)} is the largest the estimator knows. Follow the kit’s plans or approved data for this repair.`;

/** Few distinct repair notices exist: each is made once and shared, frozen. */
const notices = new Map<number, Readonly<{ code: 'REPAIR_NEXT_SIZE'; message: string }>>();
export function repairNotice(from32: number, to32: number): Readonly<{ code: 'REPAIR_NEXT_SIZE'; message: string }> {
  let n = notices.get(from32);
  if (!n) {
    n = Object.freeze({ code: 'REPAIR_NEXT_SIZE' as const, message: `Repair: ${dia(from32)} holes drilled out, ${dia(to32)} rivets; edge distance and pitch re-checked for ${dia(to32)}.` });
    notices.set(from32, n);
  }
  return n;
}
