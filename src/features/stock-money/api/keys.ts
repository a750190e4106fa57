export const stockMoneyKeys = {
  all: ['stock-money'] as const,
  tabs: () => ['stock-money', 'tabs'] as const,
  /** Every single tab, whoever it belongs to. */
  anyTab: () => ['stock-money', 'tab'] as const,
  /** One person's tab; 'me' is the signed-in person's own. */
  tab: (who: number | 'me') => ['stock-money', 'tab', who] as const,
  spend: (months: number) => ['stock-money', 'spend', months] as const,
};
