import type { QueryClient } from '@tanstack/react-query';

/**
 * Stock and reorder alerts feed one computation (what to order now): a movement on a bin changes
 * its alert and the forecast, and an alert marked ordered, closed or dismissed changes the bins'
 * "on order" and "to order", the Restock list and the purchase list. The two features' key
 * factories take their roots from here, and their mutations refresh all of them.
 */
export const REORDER_ROOTS = {
  bins: ['bins'] as const,
  alerts: ['alerts'] as const,
  forecast: ['forecast'] as const,
};

export function invalidateReorderFamily(queryClient: QueryClient): Promise<unknown> {
  return Promise.all(Object.values(REORDER_ROOTS).map((queryKey) => queryClient.invalidateQueries({ queryKey })));
}
