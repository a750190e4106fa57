import { LETTER_DRILL_INCH, NUMBERED_DRILL_INCH } from './drill-table';

export type DrillSeries = 'number' | 'letter' | 'fraction';

export interface DrillSize {
  /** As builders say it: '#40', 'F', '1/8'. */
  name: string;
  series: DrillSeries;
  inch: number;
  /** inch x 25.4, rounded to 3 decimals. */
  mm: number;
}

const MM_PER_INCH = 25.4;
const toMm = (inch: number) => Math.round(inch * MM_PER_INCH * 1000) / 1000;

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Fractional drills from 1/64 to 1/2 in by 64ths, written in lowest terms. */
function fractionalSizes(): DrillSize[] {
  return Array.from({ length: 32 }, (_, i) => {
    const n = i + 1;
    const g = gcd(n, 64);
    const inch = n / 64;
    return { name: `${n / g}/${64 / g}`, series: 'fraction' as const, inch, mm: toMm(inch) };
  });
}

/** Numbered #1-#80 then letters A-Z (ASME B94.11M), the sizes the drill reference API lists. */
export const NUMBER_AND_LETTER_DRILLS: readonly DrillSize[] = [
  ...Object.entries(NUMBERED_DRILL_INCH)
    .map(([n, inch]) => ({ name: `#${n}`, series: 'number' as const, inch, mm: toMm(inch) }))
    .sort((a, b) => Number(a.name.slice(1)) - Number(b.name.slice(1))),
  ...Object.entries(LETTER_DRILL_INCH).map(([letter, inch]) => ({ name: letter, series: 'letter' as const, inch, mm: toMm(inch) })),
];

export const FRACTIONAL_DRILLS: readonly DrillSize[] = fractionalSizes();

export const ALL_DRILLS: readonly DrillSize[] = [...NUMBER_AND_LETTER_DRILLS, ...FRACTIONAL_DRILLS];

const BY_NAME = new Map(ALL_DRILLS.map((d) => [d.name.toUpperCase(), d]));

/** Finds a drill by name; accepts '#40', '40', 'f', '1/8'. */
export function findDrill(name: string): DrillSize | undefined {
  const key = name.trim().toUpperCase();
  return BY_NAME.get(key) ?? (/^\d+$/.test(key) ? BY_NAME.get(`#${key}`) : undefined);
}
