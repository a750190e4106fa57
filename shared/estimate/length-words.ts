import { inchFraction } from '../stock/fasteners';
import type { LengthUnit } from './estimate-line';

const inchNumber = new Intl.NumberFormat('en-US', { maximumFractionDigits: 4, useGrouping: false });
const mmNumber = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2, useGrouping: false });

/** A computed length in its unit, the same in tables and cautions: inches to 0.0001 in, millimetres to 0.01 mm. */
export const lengthWords = (x: number, unit: LengthUnit): string => `${(unit === 'in' ? inchNumber : mmNumber).format(x)} ${unit}`;

/** A computed length kept to a millionth, so float noise never shows or breaks an equality. */
export const cleanLength = (x: number): number => Math.round(x * 1e6) / 1e6;

/** A rivet diameter in 32nds as the trade writes it: 5 → "5/32 in". */
export const diameterWords = (diameter32: number): string => `${inchFraction(diameter32, 32)} in`;
