/** How a member paid towards their tab: cash handed to the lead or quartermaster, or online through the provider. */
export const PAYMENT_METHODS = ['cash', 'online'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];

export const PAYMENT_METHOD_LABELS: Record<PaymentMethod, string> = { cash: 'Cash', online: 'Online' };
