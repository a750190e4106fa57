import type { LengthUnit } from './estimate-line';
import { cleanLength as clean } from './length-words';
import { MM_PER_INCH } from './rivet-rules';

/**
 * The shop head a solid rivet's length allowance of 1.5D is for: about 1.5D wide and 0.5D high
 * (FAA-H-8083-31 ch. 4, a secondary source).
 */
export const SHOP_HEAD_WIDTH_DIAMETERS = 1.5;
export const SHOP_HEAD_HEIGHT_DIAMETERS = 0.5;

export interface ShopHead {
  width: number;
  height: number;
}

/** Ten shop heads exist (five diameters, two units): each made once and shared, frozen. */
const heads = new Map<number, Readonly<ShopHead>>();

/** The shop head of a solid rivet of `diameter32`, in the line's unit. */
export function shopHeadFor(diameter32: number, unit: LengthUnit): Readonly<ShopHead> {
  const key = unit === 'mm' ? -diameter32 : diameter32;
  let head = heads.get(key);
  if (!head) {
    const d = (diameter32 / 32) * (unit === 'mm' ? MM_PER_INCH : 1);
    head = Object.freeze({ width: clean(SHOP_HEAD_WIDTH_DIAMETERS * d), height: clean(SHOP_HEAD_HEIGHT_DIAMETERS * d) });
    if (heads.size < 64) heads.set(key, head);
  }
  return head;
}

/**
 * The half-length dash below the chosen whole one (−3.5 under −4), when grip + 1.5D still fits it:
 * the standard writes half lengths with .5 (MS20470AD4-3.5, as the reference shows). Which half
 * lengths a supplier stocks varies (common practice), so this is an offer, never the length used.
 */
export function halfLengthOffer(neededIn: number, dash: number): number | null {
  const half = dash - 0.5;
  return half > 0 && neededIn * 16 <= half + 1e-9 ? half : null;
}
