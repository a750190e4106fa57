import { isBlindKind, rivetHeadLabel, type BinKind, type RivetHead } from './kinds';

/**
 * Blind rivet grip dashes and the sheet stack each covers (inches): the diameter-in-32nds,
 * grip-in-16ths numbering convention for blind rivets. -8 covers up to 1/2 in; there is no -7 row.
 */
export const BLIND_GRIP_RANGES: readonly { dash: number; min: number; max: number }[] = [
  { dash: 1, min: 0.02, max: 0.062 },
  { dash: 2, min: 0.063, max: 0.125 },
  { dash: 3, min: 0.126, max: 0.187 },
  { dash: 4, min: 0.188, max: 0.25 },
  { dash: 5, min: 0.251, max: 0.312 },
  { dash: 6, min: 0.313, max: 0.375 },
  { dash: 8, min: 0.376, max: 0.5 },
];

/** The grip range of a blind rivet grip dash, or undefined when the dash is not in the table. */
export function blindGripRange(dash: number): { min: number; max: number } | undefined {
  const row = BLIND_GRIP_RANGES.find((r) => r.dash === dash);
  return row && { min: row.min, max: row.max };
}

/** A length in inches to the 0.001 in the grip table is written in. */
export const toThousandth = (inches: number): number => Math.round(inches * 1000) / 1000;

/** The blind rivet grip dash whose range covers a stack (inches, rounded to 0.001 in); undefined beyond the table. */
export function blindGripForStack(stackInches: number): number | undefined {
  const t = toThousandth(stackInches);
  return BLIND_GRIP_RANGES.find((r) => t >= r.min && t <= r.max)?.dash;
}

/** A blind bin's grip range: the maker's on the box where the bin records it, else the table's band for its dash. */
export function binGripRange(bin: Pick<FastenerSpec, 'kind' | 'grip16' | 'gripMin' | 'gripMax'>): { min: number; max: number } | undefined {
  if (!isBlindKind(bin.kind)) return undefined;
  const band = bin.grip16 === null ? undefined : blindGripRange(bin.grip16);
  const min = bin.gripMin ?? band?.min;
  const max = bin.gripMax ?? band?.max;
  return min === undefined || max === undefined ? undefined : { min, max };
}

/** Solid rivet length dash (16ths): the next 1/16 in at or above grip + 1.5 D. */
export function solidLengthDash(gripInches: number, diameter32: number): number {
  const needed = gripInches + 1.5 * (diameter32 / 32);
  return Math.ceil(Math.round(needed * 16 * 1e6) / 1e6);
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** A length in 1/denominator inches as a reduced fraction: 4/32 → "1/8", 24/16 → "1 1/2". */
export function inchFraction(numerator: number, denominator: number): string {
  const whole = Math.floor(numerator / denominator);
  const rest = numerator - whole * denominator;
  if (rest === 0) return String(whole);
  if (!Number.isInteger(rest)) return (numerator / denominator).toFixed(3).replace(/0+$/, '');
  const g = gcd(rest, denominator);
  const frac = `${rest / g}/${denominator / g}`;
  return whole > 0 ? `${whole} ${frac}` : frac;
}

const inches = (x: number) => x.toFixed(3);

/** A grip range in inches to the thousandth, as the table writes it: "0.063–0.125 in". */
export const gripRangeWords = (range: { min: number; max: number }): string => `${inches(range.min)}–${inches(range.max)} in`;

/**
 * Material letters of the open-standard solid rivet numbers. MS20470 and MS20426 designate
 * aluminium-alloy rivets only: any other material (monel, copper, stainless, steel) gets our plain
 * description and no number.
 */
export const SOLID_MATERIAL_CODES: Readonly<Record<string, string>> = {
  '1100': 'A',
  '2117-T4': 'AD',
  '2017-T4': 'D',
  '2024-T4': 'DD',
  '5056': 'B',
};

const SOLID_HEAD_NUMBERS: Partial<Record<RivetHead, string>> = { dome: 'MS20470', countersunk: 'MS20426' };

export interface FastenerSpec {
  kind: BinKind;
  head: RivetHead | null;
  material: string | null;
  stemMaterial: string | null;
  diameter32: number | null;
  /** Blind rivets: grip dash in 16ths. */
  grip16: number | null;
  /** Blind rivets: the grip range stocked (inches), when it is not the table's band for the dash. */
  gripMin?: number | null;
  gripMax?: number | null;
  /** Solid rivets: length in 16ths; half lengths allowed (3.5). */
  length16: number | null;
}

/** The open-standard number of a solid rivet (MS20470AD4-6), or undefined when no standard covers it. */
export function solidRivetNumber(spec: FastenerSpec): string | undefined {
  if (spec.kind !== 'solid_rivet' || !spec.head || !spec.material || spec.diameter32 === null || spec.length16 === null) return undefined;
  const head = SOLID_HEAD_NUMBERS[spec.head];
  const letter = SOLID_MATERIAL_CODES[spec.material];
  if (!head || !letter) return undefined;
  return `${head}${letter}${spec.diameter32}-${spec.length16}`;
}

/**
 * How a rivet is named on screen and label: the open-standard number where one exists, otherwise
 * our own readable form ("Blind, structural, dome, 5056 · 1/8 in · grip −2 (0.063–0.125 in)").
 */
export function fastenerDesignation(spec: FastenerSpec): string | undefined {
  if (spec.diameter32 === null || !spec.head) return undefined;
  const number = solidRivetNumber(spec);
  if (number) return number;
  const dia = `${inchFraction(spec.diameter32, 32)} in`;
  const head = rivetHeadLabel(spec.head, spec.kind === 'solid_rivet');
  if (isBlindKind(spec.kind)) {
    const kind = spec.kind === 'blind_structural' ? 'structural' : 'general purpose';
    const material = [spec.material, spec.stemMaterial ? `${spec.stemMaterial} stem` : null].filter(Boolean).join(', ');
    const range = binGripRange(spec);
    const grip = spec.grip16 === null ? '' : ` · grip −${spec.grip16}${range ? ` (${gripRangeWords(range)})` : ''}`;
    return `Blind, ${kind}, ${head}${material ? `, ${material}` : ''} · ${dia}${grip}`;
  }
  if (spec.kind === 'solid_rivet') {
    const length = spec.length16 === null ? '' : ` · ${inchFraction(spec.length16 * 2, 32)} in long`;
    return `Solid, ${head}${spec.material ? `, ${spec.material}` : ''} · ${dia}${length}`;
  }
  return undefined;
}

/** How a bin is named: its fastener's designation, or the bin's own name when it holds something else. */
export function binDesignation(bin: FastenerSpec & { name: string }): string {
  return fastenerDesignation(bin) ?? bin.name;
}
