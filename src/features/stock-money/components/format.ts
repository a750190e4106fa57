import type { AssemblyName } from '@shared/schemas/bins';
import { formatAssembly } from '@/lib/format';

/** Whole cents as dollars ($14.40), unit costs to a hundredth of a cent ($0.0125) and days, as on every page. */
export { formatCents as dollars, formatDate as dayOf, formatUnitCost as unitCost } from '@/lib/format';

const longMonth = new Intl.DateTimeFormat('en-US', { month: 'long', year: 'numeric', timeZone: 'UTC' });
const shortMonth = new Intl.DateTimeFormat('en-US', { month: 'short', year: '2-digit', timeZone: 'UTC' });

const firstOf = (month: string) => new Date(`${month}-01T00:00:00Z`);
/** 2026-11 as "November 2026". */
export const monthName = (month: string) => longMonth.format(firstOf(month));
/** 2026-11 as "Nov 26", for chart axes. */
export const monthShort = (month: string) => shortMonth.format(firstOf(month));

/** What a tab row was for: its assembly and build, or none. */
export const assemblyName = (a: AssemblyName | null) => (a === null ? 'Not tied to an assembly' : formatAssembly(a));
