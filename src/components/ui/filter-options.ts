/** A filter's options for a select box: first `any` (value '', no filter), then each value in its words. */
export function filterOptions<V extends string | number>(any: string, values: readonly V[], label: (value: V) => string) {
  return [{ value: '', label: any }, ...values.map((value) => ({ value: String(value), label: label(value) }))];
}

/** The distinct texts of a column (places, materials), sorted, as a filter's options; blanks are left out. */
export function distinctOptions(any: string, texts: readonly string[]) {
  return filterOptions(any, [...new Set(texts.filter(Boolean))].sort(), (text) => text);
}
