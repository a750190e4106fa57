/** Counts and quantities with their unit, as the client and the mails both write them. */
const count = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** A whole quantity with thousands separators: 12000 → "12,000"; a fraction is rounded to a whole unit. */
export const countWords = (n: number): string => count.format(n);

/** Units that read the same for one and for many: abbreviations and counting words. */
const SAME_FOR_MANY = new Set(['each', 'ea', 'ft', 'in', 'mm', 'cm', 'm', 'yd', 'lb', 'oz', 'g', 'kg', 'ml', 'l', 'gal', 'qt', 'pt', 'dozen', 'gross']);

function pluralWord(word: string): string {
  const lower = word.toLowerCase();
  // Upper-case codes ("EA") and words already ending in s ("pcs") are left as written.
  if (SAME_FOR_MANY.has(lower) || !/^[a-z]+$/i.test(word) || word === word.toUpperCase() || lower.endsWith('s')) return word;
  if (/(x|z|ch|sh)$/.test(lower)) return `${word}es`;
  if (/[^aeiou]y$/.test(lower)) return `${word.slice(0, -1)}ies`;
  return `${word}s`;
}

/** The unit as it reads after the number: (1, "tube") → "tube", (4, "tube") → "tubes", "each" stays. */
export function unitWord(n: number, unit: string): string {
  if (countWords(Math.abs(n)) === '1') return unit;
  const at = unit.lastIndexOf(' ') + 1;
  return unit.slice(0, at) + pluralWord(unit.slice(at));
}

/** A quantity with its unit: (4, "tube") → "4 tubes", (1206, "each") → "1,206 each". */
export const quantityWords = (n: number, unit: string): string => `${countWords(n)} ${unitWord(n, unit)}`;

const ordinalRules = new Intl.PluralRules('en-US', { type: 'ordinal' });
const ORDINAL_SUFFIX: Partial<Record<Intl.LDMLPluralRule, string>> = { one: 'st', two: 'nd', few: 'rd' };

/** A place in a line: 1 → "1st", 2 → "2nd", 11 → "11th", 22 → "22nd". */
export const ordinalWords = (n: number): string => `${countWords(n)}${ORDINAL_SUFFIX[ordinalRules.select(n)] ?? 'th'}`;
