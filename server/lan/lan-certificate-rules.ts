import type { KeyObject, X509Certificate } from 'node:crypto';
import { DAY_MS } from '@shared/time/durations';

/** A certificate is made again this long before it runs out, so a phone never meets an expired one. */
export const RENEW_BEFORE_MS = 30 * DAY_MS;

export interface WantedNames {
  hostNames: string[];
  ipv4: string[];
  ipv6?: string[];
}

export interface StoredCertificate {
  cert: X509Certificate;
  key: KeyObject;
}

const expiresSoon = (cert: X509Certificate, now: Date) => new Date(cert.validTo).getTime() - now.getTime() < RENEW_BEFORE_MS;

/** Why the hangar's certificate authority must be made (again), or undefined to keep it. */
export function authorityRenewalReason(stored: StoredCertificate | undefined, now: Date): string | undefined {
  if (!stored) return 'there was none yet';
  if (!stored.cert.checkPrivateKey(stored.key)) return 'its key does not match it';
  if (expiresSoon(stored.cert, now)) return 'it runs out within 30 days';
  return undefined;
}

/**
 * Why the server certificate must be made (again), or undefined to keep it. A new IPv6 address alone
 * does not renew it: privacy addresses change daily, and a new certificate means a new warning on
 * phones that accepted the old one; phones in the hangar use the IPv4 address or the host name.
 */
export function serverRenewalReason(
  stored: StoredCertificate | undefined,
  authority: X509Certificate,
  wanted: WantedNames,
  now: Date,
): string | undefined {
  if (!stored) return 'there was none yet';
  if (!stored.cert.checkPrivateKey(stored.key)) return 'its key does not match it';
  if (!stored.cert.checkIssued(authority) || !stored.cert.verify(authority.publicKey)) return 'the hangar authority is new';
  if (expiresSoon(stored.cert, now)) return 'it runs out within 30 days';
  const name = wanted.hostNames.find((n) => stored.cert.checkHost(n, { subject: 'never', wildcards: false }) === undefined);
  if (name) return `it does not name ${name}`;
  const address = wanted.ipv4.find((ip) => stored.cert.checkIP(ip) === undefined);
  if (address) return `it does not name ${address}`;
  return undefined;
}
