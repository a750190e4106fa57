export const paymentKeys = {
  all: ['payments'] as const,
  settings: () => ['payments', 'settings'] as const,
  checkout: (sessionId: string) => ['payments', 'checkout', sessionId] as const,
};
