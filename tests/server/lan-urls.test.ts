import { describe, expect, it } from 'vitest';
import { lanUrls, lanUrlsText } from '../../server/lan/lan-urls';
import { decodeTerminalQr } from '../helpers/qr-raster';

const HANGAR = { hostNames: ['hangar', 'hangar.local', 'localhost'], ipv4: ['192.168.1.20', '10.0.0.5'], ipv6: ['fd00::20'] };

describe('lanUrls', () => {
  it('offers an https URL per address, IPv4 first and IPv6 in brackets, then the names, and localhost apart', () => {
    expect(lanUrls(HANGAR, 3000)).toEqual({
      byAddress: ['https://192.168.1.20:3000', 'https://10.0.0.5:3000', 'https://[fd00::20]:3000'],
      byName: ['https://hangar:3000', 'https://hangar.local:3000'],
      local: 'https://localhost:3000',
    });
  });

  it('leaves out an address the certificate does not name', () => {
    expect(lanUrls(HANGAR, 3443, (ip) => ip !== 'fd00::20').byAddress).toEqual(['https://192.168.1.20:3443', 'https://10.0.0.5:3443']);
  });
});

describe('lanUrlsText', () => {
  it('prints each LAN address above a QR code drawn with block characters, and where the certificate is', async () => {
    const text = await lanUrlsText(lanUrls(HANGAR, 3000));
    const lines = text.split('\n');
    const qrUnder = (url: string) => {
      const start = lines.indexOf(`  ${url}`) + 1;
      const end = lines.findIndex((l, i) => i > start && !l.includes('\x1b['));
      return decodeTerminalQr(lines.slice(start, end).join('\n'));
    };
    expect(qrUnder('https://192.168.1.20:3000')).toBe('https://192.168.1.20:3000');
    expect(qrUnder('https://10.0.0.5:3000')).toBe('https://10.0.0.5:3000');
    expect(qrUnder('https://[fd00::20]:3000')).toBe('https://[fd00::20]:3000');
    expect(text).toContain('By name: https://hangar:3000  https://hangar.local:3000');
    expect(text).toContain('download it once at https://192.168.1.20:3000/certificate');
  });

  it('says so when the machine has no network address, and offers localhost only', async () => {
    const text = await lanUrlsText(lanUrls({ hostNames: ['localhost'], ipv4: [], ipv6: [] }, 3000));
    expect(text).toContain('This machine has no network address yet');
    expect(text).toContain('On this machine: https://localhost:3000');
    expect(text).not.toMatch(/[▀▄█]/);
  });
});
