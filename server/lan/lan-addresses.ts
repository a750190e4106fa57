import { hostname, networkInterfaces } from 'node:os';

export interface LanNames {
  /** The machine's name, its mDNS `.local` form and localhost. */
  hostNames: string[];
  ipv4: string[];
  ipv6: string[];
}

type Interfaces = ReturnType<typeof networkInterfaces>;

/** Link-local addresses (169.254/16, fe80::/10) cannot be typed into a phone's browser: left out. */
const isLinkLocal = (address: string) => address.startsWith('169.254.') || /^fe[89ab]/i.test(address);

/** The names and addresses a phone on the hangar network may use to reach this machine. */
export function lanNames(host: string = hostname(), interfaces: Interfaces = networkInterfaces()): LanNames {
  const name = host.toLowerCase();
  const hostNames = [...new Set([name, ...(name.includes('.') ? [] : [`${name}.local`]), 'localhost'])].filter(Boolean);
  const external = Object.values(interfaces)
    .flatMap((list) => list ?? [])
    .filter((i) => !i.internal && !isLinkLocal(i.address));
  const unique = (family: 'IPv4' | 'IPv6') => [...new Set(external.filter((i) => i.family === family).map((i) => i.address))];
  return { hostNames, ipv4: unique('IPv4'), ipv6: unique('IPv6') };
}
