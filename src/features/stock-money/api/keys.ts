import type { PaymentsQuery } from '@shared/schemas/payments';

export const stockMoneyKeys = {
  all: ['stock-money'] as const,
  tabs: () => ['stock-money', 'tabs'] as const,
  /** Every single tab, whoever it belongs to. */
  anyTab: () => ['stock-money', 'tab'] as const,
  /** One person's tab; 'me' is the signed-in person's own. */
  tab: (who: number | 'me') => ['stock-money', 'tab', who] as const,
  spend: (months: number) => ['stock-money', 'spend', months] as const,
  /** Every list of payments, whatever its filters. */
  anyPayments: () => ['stock-money', 'payments'] as const,
  /** Everyone's payments, cash and online, for one set of filters. */
  payments: (query: PaymentsQuery) => ['stock-money', 'payments', query] as const,
  /** Online checkouts whose completion was refused: the provider's amount differed from the one asked. */
  refusedCheckouts: () => ['stock-money', 'refused-checkouts'] as const,
};
