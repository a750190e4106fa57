/** Unit costs are stored in hundredths of a cent (dollars x 10,000); values in whole cents. */
export const dollarsToE4 = (dollars: number) => Math.round(dollars * 10_000);
const moneyFormats = new Map<string, Intl.NumberFormat>();
const moneyFormat = (currency: string): Intl.NumberFormat => {
  let format = moneyFormats.get(currency);
  if (!format) moneyFormats.set(currency, (format = new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() })));
  return format;
};
/**
 * Whole cents as money, as pages and mails write it: 120600 → "$1,206.00". Tabs are in the chapter's
 * dollars; an online payment names its own currency (ISO code, any case): 1240, 'eur' → "€12.40".
 */
export const centsWords = (valueCents: number, currency = 'usd'): string => moneyFormat(currency).format(valueCents / 100);
export const e4ToDollars = (e4: number) => e4 / 10_000;
/** The value of a quantity at a unit cost, in cents, rounded half away from zero. */
export const valueCents = (quantity: number, unitCostE4: number) => Math.sign(quantity) * Math.round((Math.abs(quantity) * unitCostE4) / 100) || 0;
/** The same, from a unit cost in dollars as the API gives it: what a preview shows before the entry is written. */
export const valueAtCost = (quantity: number, unitCostDollars: number) => valueCents(quantity, dollarsToE4(unitCostDollars));
