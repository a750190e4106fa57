import Stripe from 'stripe';

/** What the payments feature needs from the provider: the SDK client and the secret webhooks are signed with. */
export interface PaymentsSetup {
  provider: Stripe;
  webhookSecret: string;
  /** The real provider with the chapter's own key, or the local stand-in. */
  connection: 'local-fake' | 'connected';
}

/** Where the SDK talks: the real provider, or the local fake by loopback host and port. */
export interface ProviderTarget {
  secretKey: string;
  webhookSecret: string;
  /** Set for the local fake only. */
  fake?: { host: string; port: number };
}

export function createPaymentsSetup(target: ProviderTarget): PaymentsSetup {
  const provider = target.fake
    ? new Stripe(target.secretKey, { host: target.fake.host, port: target.fake.port, protocol: 'http', maxNetworkRetries: 0 })
    : new Stripe(target.secretKey);
  return { provider, webhookSecret: target.webhookSecret, connection: target.fake ? 'local-fake' : 'connected' };
}
