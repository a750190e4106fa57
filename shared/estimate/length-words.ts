import type { LengthUnit } from './estimate-line';

const inchNumber = new Intl.NumberFormat('en-US', { maximumFractionDigits: 4, useGrouping: false });
const mmNumber = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2, useGrouping: false });

/** A computed length in its unit, the same in tables and cautions: inches to 0.0001 in, millimetres to 0.01 mm. */
export const lengthWords = (x: number, unit: LengthUnit): string => `${(unit === 'in' ? inchNumber : mmNumber).format(x)} ${unit}`;
