import { gripRangeWords, inchFraction } from '@shared/stock/fasteners';
import { formatCount } from '@/lib/format';

export { formatCents, formatCount, formatDate, formatDateTime, formatQuantity, formatUnitCost } from '@/lib/format';


/** A signed ledger quantity: +500, −25 (a real minus sign), 0. */
export const formatSigned = (n: number): string => (n > 0 ? `+${formatCount(n)}` : n < 0 ? `−${formatCount(-n)}` : '0');

/** A rivet diameter dash in 32nds as inches: 4 → "1/8 in", 5 → "5/32 in". */
export const diameterText = (diameter32: number): string => `${inchFraction(diameter32, 32)} in`;

/** A solid rivet length dash in 16ths as inches: 6 → "3/8 in", 3.5 → "7/32 in". */
export const lengthText = (length16: number): string => `${inchFraction(length16 * 2, 32)} in`;

/** A grip range in inches to the thousandth: (0.063, 0.125) → "0.063–0.125 in". */
export const gripRangeText = gripRangeWords;


/** A blind rivet grip dash with the sheet stack it takes: (2, {0.063, 0.125}) → "−2 (0.063–0.125 in)". */
export const gripDashText = (dash: number, range: { min: number; max: number }): string => `−${dash} (${gripRangeText(range)})`;
