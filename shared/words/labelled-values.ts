/**
 * The values of a code list written as one record (a code and its words, or its row of facts), in the
 * record's order: each code is written once, and the tuple suits `z.enum` and Drizzle's `enum` option.
 */
export function valuesOf<const L extends Record<string, unknown>>(table: L): [keyof L & string, ...(keyof L & string)[]] {
  return Object.keys(table) as [keyof L & string, ...(keyof L & string)[]];
}
