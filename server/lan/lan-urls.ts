import QRCode from 'qrcode';
import type { LanNames } from './lan-addresses';

export interface LanUrls {
  /** One per LAN address the certificate names: what a phone's camera scans. */
  byAddress: string[];
  /** By host name (mDNS `.local` works on most phones; the bare name only where the network resolves it). */
  byName: string[];
  local: string;
}

const hostPart = (address: string) => (address.includes(':') ? `[${address}]` : address);

/** The addresses to offer phones, IPv4 first; `named` leaves out an address the certificate does not name. */
export function lanUrls(names: LanNames, port: number, named: (ip: string) => boolean = () => true): LanUrls {
  const at = (host: string) => `https://${host}:${port}`;
  return {
    byAddress: [...names.ipv4, ...names.ipv6].filter(named).map((ip) => at(hostPart(ip))),
    byName: names.hostNames.filter((n) => n !== 'localhost').map(at),
    local: at('localhost'),
  };
}

/** The text `npm run start:lan` prints: each LAN address with a QR code of it drawn in the terminal. */
export async function lanUrlsText(urls: LanUrls): Promise<string> {
  const lines = ['', 'Gripline is running over HTTPS (stop with Ctrl+C).'];
  if (urls.byAddress.length === 0) {
    lines.push('This machine has no network address yet: join the hangar network and start again.');
  } else {
    lines.push('On a phone on the same network, point the camera at a code or type the address:');
  }
  for (const url of urls.byAddress) {
    lines.push('', `  ${url}`, await QRCode.toString(url, { type: 'terminal', small: true }));
  }
  if (urls.byName.length > 0) lines.push(`By name: ${urls.byName.join('  ')}`);
  lines.push(`On this machine: ${urls.local}`);
  const first = urls.byAddress[0] ?? urls.local;
  lines.push(
    'The first visit on each phone shows a certificate warning (see "Phones in the hangar" in the README);',
    `to trust the hangar's certificate instead, download it once at ${first}/certificate`,
    '',
  );
  return lines.join('\n');
}
