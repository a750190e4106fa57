/** Unit costs are stored in hundredths of a cent (dollars x 10,000); values in whole cents. */
export const dollarsToE4 = (dollars: number) => Math.round(dollars * 10_000);
const dollars = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' });
/** Whole cents as money, as pages and mails write it: 120600 → "$1,206.00". */
export const centsWords = (valueCents: number): string => dollars.format(valueCents / 100);
export const e4ToDollars = (e4: number) => e4 / 10_000;
/** The value of a quantity at a unit cost, in cents, rounded half away from zero. */
export const valueCents = (quantity: number, unitCostE4: number) => Math.sign(quantity) * Math.round((Math.abs(quantity) * unitCostE4) / 100) || 0;
/** The same, from a unit cost in dollars as the API gives it: what a preview shows before the entry is written. */
export const valueAtCost = (quantity: number, unitCostDollars: number) => valueCents(quantity, dollarsToE4(unitCostDollars));
