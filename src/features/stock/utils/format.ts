import { inchFraction } from '@shared/stock/fasteners';

/** Whole-cent money, like $12.40. */
const cents = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' });
/** Unit costs run to a hundredth of a cent (a rivet costs $0.0825). */
const unitCost = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD', minimumFractionDigits: 2, maximumFractionDigits: 4 });
const count = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
const dateTime = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' });
const dateOnly = new Intl.DateTimeFormat('en-US', { year: 'numeric', month: 'short', day: 'numeric' });

/** A money amount given in cents: 1240 → "$12.40". */
export const formatCents = (valueCents: number): string => cents.format(valueCents / 100);

/** A money amount given in dollars, to the cent: 12.4 → "$12.40". */
export const formatDollars = (dollars: number): string => cents.format(dollars);

/** A unit cost in dollars, keeping up to 4 decimals: 0.0825 → "$0.0825", 3 → "$3.00". */
export const formatUnitCost = (dollars: number): string => unitCost.format(dollars);

/** A whole quantity with thousands separators: 12000 → "12,000". */
export const formatCount = (n: number): string => count.format(n);

/** A quantity with its unit: (250, "each") → "250 each". */
export const formatQuantity = (n: number, unit: string): string => `${formatCount(n)} ${unit}`;

/** A signed ledger quantity: +500, −25 (a real minus sign), 0. */
export const formatSigned = (n: number): string => (n > 0 ? `+${formatCount(n)}` : n < 0 ? `−${formatCount(-n)}` : '0');

/** A rivet diameter dash in 32nds as inches: 4 → "1/8 in", 5 → "5/32 in". */
export const diameterText = (diameter32: number): string => `${inchFraction(diameter32, 32)} in`;

/** A solid rivet length dash in 16ths as inches: 6 → "3/8 in", 3.5 → "7/32 in". */
export const lengthText = (length16: number): string => `${inchFraction(length16 * 2, 32)} in`;

/** A grip range in inches to the thousandth: (0.063, 0.125) → "0.063–0.125 in". */
export const gripRangeText = (range: { min: number; max: number }): string => `${range.min.toFixed(3)}–${range.max.toFixed(3)} in`;

/** An ISO timestamp as a date and time for people. */
export const formatDateTime = (iso: string): string => dateTime.format(new Date(iso));

/** An ISO timestamp or day as a date for people. */
export const formatDate = (iso: string): string => dateOnly.format(new Date(iso));

/** A blind rivet grip dash with the sheet stack it takes: (2, {0.063, 0.125}) → "−2 (0.063–0.125 in)". */
export const gripDashText = (dash: number, range: { min: number; max: number }): string => `−${dash} (${gripRangeText(range)})`;
