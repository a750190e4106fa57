import { paymentsQuerySchema, type PaymentsQuery } from '@shared/schemas/payments';

/** The page's filters from its address; a filter that does not parse is left out rather than failing the page. */
export function paymentsQueryOf(params: URLSearchParams): PaymentsQuery {
  const asked = Object.fromEntries((['from', 'to', 'method'] as const).map((key) => [key, params.get(key) || undefined]));
  const valid = Object.fromEntries(Object.entries(asked).filter(([key, value]) => paymentsQuerySchema.safeParse({ [key]: value }).success));
  const parsed = paymentsQuerySchema.safeParse(valid);
  // Only a last day before the first is left: keep the first.
  return parsed.success ? parsed.data : paymentsQuerySchema.parse({ ...valid, to: undefined });
}

/** "?from=…&to=…&method=…" for the filters set, or "" for none. */
export function paymentsSearch(query: PaymentsQuery): string {
  const params = new URLSearchParams(Object.entries(query).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1] !== ''));
  const search = params.toString();
  return search ? `?${search}` : '';
}

/** The CSV of the payments the page shows, for the same filters. */
export const paymentsCsvUrl = (query: PaymentsQuery) => `/api/payments/export.csv${paymentsSearch(query)}`;
