import { eq } from 'drizzle-orm';
import type { Executor } from '../db/client';
import { settings } from '../db/schema/crib-jobs';

const KEY = 'paymentCurrency';
export const DEFAULT_PAYMENT_CURRENCY = 'usd';

/** The currency online payments are asked in (an ISO code in lower case); US dollars until a lead chooses. */
export function readPaymentCurrency(db: Executor): string {
  return db.select({ value: settings.value }).from(settings).where(eq(settings.key, KEY)).get()?.value ?? DEFAULT_PAYMENT_CURRENCY;
}
