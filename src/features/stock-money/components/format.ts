import type { AssemblyName } from '@shared/schemas/bins';
import { monthInWords } from '@shared/time/words';
import { formatAssembly } from '@/lib/format';

/** Whole cents as dollars ($14.40), unit costs to a hundredth of a cent ($0.0125) and days, as on every page. */
export { formatCents as dollars, formatDate as dayOf, formatUnitCost as unitCost } from '@/lib/format';

/** A chapter month by its name "2026-11" (the server counts months on the chapter's calendar), read at its UTC first. */
const firstOf = (month: string) => new Date(`${month}-01T00:00:00Z`);
/** 2026-11 as "November 2026". */
export const monthName = (month: string) => monthInWords(firstOf(month), 'UTC');
/** 2026-11 as "Nov 26", for chart axes. */
export const monthShort = (month: string) => monthInWords(firstOf(month), 'UTC', true);

/** What a tab row was for: its assembly and build, or none. */
export const assemblyName = (a: AssemblyName | null) => (a === null ? 'Not tied to an assembly' : formatAssembly(a));
