import { inArray } from 'drizzle-orm';
import { PAYMENT_CURRENCIES, type PaymentCurrency } from '@shared/schemas/payments';
import type { Executor } from '../db/client';
import { settings } from '../db/schema/crib-jobs';

export interface PaymentSettings {
  /** Whether members may pay their tab online; when off they pay the quartermaster in cash. */
  offered: boolean;
  /** The currency online payments are asked in (an ISO code in lower case). */
  currency: PaymentCurrency;
}

/** Offered, in US dollars, until a lead chooses otherwise. */
export const DEFAULT_PAYMENT_SETTINGS: PaymentSettings = { offered: true, currency: 'usd' };

const KEYS = { offered: 'paymentsOffered', currency: 'paymentCurrency' } as const;

const isCurrency = (value: string | undefined): value is PaymentCurrency => (PAYMENT_CURRENCIES as readonly string[]).includes(value ?? '');

export function readPaymentSettings(db: Executor): PaymentSettings {
  const rows = db.select().from(settings).where(inArray(settings.key, Object.values(KEYS))).all();
  const stored = new Map(rows.map((r) => [r.key, r.value]));
  const offered = stored.get(KEYS.offered);
  const currency = stored.get(KEYS.currency);
  return {
    offered: offered === undefined ? DEFAULT_PAYMENT_SETTINGS.offered : offered === 'true',
    currency: isCurrency(currency) ? currency : DEFAULT_PAYMENT_SETTINGS.currency,
  };
}

/** Stores settings already checked by the settings schema. */
export function writePaymentSettings(db: Executor, values: PaymentSettings): void {
  for (const [field, key] of Object.entries(KEYS) as [keyof PaymentSettings, string][]) {
    const value = String(values[field]);
    db.insert(settings).values({ key, value }).onConflictDoUpdate({ target: settings.key, set: { value } }).run();
  }
}
