import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { ONLINE_PAYMENT_STATES } from '@shared/schemas/payments';
import { memberPayments } from './stock';
import { users } from './users';

export { ONLINE_PAYMENT_STATES, type OnlinePaymentState } from '@shared/schemas/payments';

/**
 * A hosted checkout a member started to settle their tab. It becomes paid once, when the provider's
 * signed completion arrives; the payment it made on the tab is `memberPaymentId`. It expires when the
 * member starts another (Gripline expires the older one at the provider) or the provider lets it lapse.
 */
export const onlinePayments = sqliteTable(
  'online_payments',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    sessionId: text().notNull().unique(),
    /** The provider's event that completed it; null while open. */
    eventId: text().unique(),
    userId: integer()
      .notNull()
      .references(() => users.id),
    amountCents: integer().notNull(),
    currency: text().notNull(),
    state: text({ enum: ONLINE_PAYMENT_STATES }).notNull().default('open'),
    memberPaymentId: integer().references(() => memberPayments.id),
    /** The provider's payment behind a paid checkout (what a refund names); set when it settles. */
    paymentIntentId: text().unique(),
    /** What the provider reported for a refused completion (another amount or currency than asked); null otherwise. */
    receivedAmountCents: integer(),
    receivedCurrency: text(),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer({ mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [
    index('online_payments_user_idx').on(t.userId, t.createdAt),
    check('online_payments_amount_check', sql`${t.amountCents} > 0`),
    check('online_payments_state_check', sql`${t.state} in ('open', 'paid', 'refused', 'expired')`),
  ],
);
export type OnlinePaymentRow = typeof onlinePayments.$inferSelect;
