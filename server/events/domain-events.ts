import type { ServiceContext } from '../context';

/**
 * The catalogue of domain events: what one feature tells the others when it changed its own tables.
 * A feature writes only its own tables; another feature that must follow a change reacts to the
 * event (the reactions are in `reactions.ts`), in the same transaction as the change.
 */
export type DomainEvent =
  /** Stock booked a delivery into a bin (`movementId` is the receive entry in its ledger). */
  | { type: 'stock.received'; binId: number; quantity: number; movementId: number; at: Date }
  /** A lead deactivated a person: they no longer belong to the chapter. */
  | { type: 'person.deactivated'; userId: number; at: Date }
  /** A member paid a checkout (`onlinePaymentId`) online: the amount comes off their tab. */
  | { type: 'payment.received'; onlinePaymentId: number; userId: number; amountCents: number; at: Date; note: string }
  /** Stock put an online payment on a member's tab as its payment `memberPaymentId`. */
  | { type: 'tab.online_payment_recorded'; onlinePaymentId: number; memberPaymentId: number; userId: number; at: Date }
  /**
   * The provider handed money back on a tab's payment, named by the provider's refund id; the
   * same refund may be told twice (Gripline's own record and the provider's webhook). `recordedById`
   * is the lead who made it, null when it came from the provider's dashboard.
   */
  | { type: 'payment.refunded'; memberPaymentId: number; providerRefundId: string; amountCents: number; at: Date; recordedById: number | null; note: string };

export type DomainEventType = DomainEvent['type'];
export type EventOfType<K extends DomainEventType> = Extract<DomainEvent, { type: K }>;

/**
 * A reaction runs inside the publisher's transaction with the publisher's context (`ctx.db` is the
 * connection whose transaction is open); throwing rolls the whole change back.
 */
export type Reaction<K extends DomainEventType> = (ctx: ServiceContext, event: EventOfType<K>) => void;

/** Every event with the reactions to it, in the order they run (an empty list when nobody reacts). */
export type Reactions = { readonly [K in DomainEventType]: readonly Reaction<K>[] };

export interface EventList {
  /** Sets the reactions once; installing the same table again does nothing, another one is an error. */
  install(reactions: Reactions): void;
  installed(): boolean;
  /** Runs the event's reactions now, in order, in the caller's transaction. */
  publish(ctx: ServiceContext, event: DomainEvent): void;
}

/** A synchronous in-process event list; the app has one (below), a test may make its own. */
export function createEventList(): EventList {
  let table: Reactions | undefined;
  return {
    install(reactions) {
      if (table && table !== reactions) throw new Error('Domain event reactions are already installed; install them once, from reactions.ts.');
      table = reactions;
    },
    installed: () => table !== undefined,
    publish(ctx, event) {
      if (!table) {
        throw new Error(`The domain event "${event.type}" was published before the reactions were installed: call installReactions() at the entry point (createApp, the seed, a job).`);
      }
      for (const react of table[event.type] as readonly Reaction<typeof event.type>[]) react(ctx, event);
    },
  };
}

const appEvents = createEventList();

/** Tells the other features what changed, in the caller's transaction (see DomainEvent). */
export const publish = (ctx: ServiceContext, event: DomainEvent): void => appEvents.publish(ctx, event);

/** For `reactions.ts` only. */
export const installAppReactions = (reactions: Reactions): void => appEvents.install(reactions);
export const appReactionsInstalled = (): boolean => appEvents.installed();
