const money = new Intl.NumberFormat(undefined, { style: 'currency', currency: 'USD' });
const perUnit = new Intl.NumberFormat(undefined, { style: 'currency', currency: 'USD', minimumFractionDigits: 2, maximumFractionDigits: 4 });
const longMonth = new Intl.DateTimeFormat(undefined, { month: 'long', year: 'numeric', timeZone: 'UTC' });
const shortMonth = new Intl.DateTimeFormat(undefined, { month: 'short', year: '2-digit', timeZone: 'UTC' });
const day = new Intl.DateTimeFormat(undefined, { month: 'short', day: 'numeric', year: 'numeric' });

/** Whole cents as dollars, like $14.40. */
export const dollars = (cents: number) => money.format(cents / 100);
/** A unit cost in dollars, to a hundredth of a cent where it has one: $0.12, $0.0125. */
export const unitCost = (d: number) => perUnit.format(d);

const firstOf = (month: string) => new Date(`${month}-01T00:00:00Z`);
/** 2026-11 as "November 2026". */
export const monthName = (month: string) => longMonth.format(firstOf(month));
/** 2026-11 as "Nov 26", for chart axes. */
export const monthShort = (month: string) => shortMonth.format(firstOf(month));
export const dayOf = (iso: string) => day.format(new Date(iso));

export const assemblyName = (id: number | null) => (id === null ? 'Not tied to an assembly' : `Assembly ${id}`);
