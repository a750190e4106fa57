/**
 * The values of a code list whose labels are written as one record, in the record's order: a code and
 * its words are written once, side by side, and the tuple suits `z.enum` and Drizzle's `enum` option.
 */
export function valuesOf<const L extends Record<string, string>>(labels: L): [keyof L & string, ...(keyof L & string)[]] {
  return Object.keys(labels) as [keyof L & string, ...(keyof L & string)[]];
}
