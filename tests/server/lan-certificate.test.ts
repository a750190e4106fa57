import { X509Certificate } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { lanNames } from '../../server/lan/lan-addresses';
import { ensureLanCertificate, lanCertificateFiles } from '../../server/lan/lan-certificate';

const DAY_MS = 24 * 60 * 60_000;
const NOW = new Date('2026-12-03T08:00:00Z');
const HANGAR = { hostNames: ['hangar', 'hangar.local', 'localhost'], ipv4: ['192.168.1.20'], ipv6: ['fd00::20'] };

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'gripline-lan-cert-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const serverCertOf = (chain: string) => new X509Certificate(chain);
const fileText = (path: string) => readFileSync(path, 'utf8');

describe('ensureLanCertificate', () => {
  describe('on the first run', () => {
    it('makes a server certificate naming every given host name and address, issued by the hangar authority', async () => {
      const made = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const cert = serverCertOf(made.cert);
      const authority = new X509Certificate(made.authority);

      expect(cert.subjectAltName).toBe(
        'DNS:hangar, DNS:hangar.local, DNS:localhost, IP Address:192.168.1.20, IP Address:FD00:0:0:0:0:0:0:20',
      );
      expect(cert.checkIP('fd00::20')).toBe('fd00::20');
      expect(cert.checkHost('gripline.test', { subject: 'never' })).toBeUndefined();
      expect(cert.ca).toBe(false);
      expect(cert.keyUsage).toEqual(['1.3.6.1.5.5.7.3.1']);
      expect(authority.ca).toBe(true);
      expect(cert.checkIssued(authority) && cert.verify(authority.publicKey)).toBe(true);
      expect(made.made).toEqual(['a new certificate authority (there was none yet)', 'a new server certificate (there was none yet)']);
      expect(made.fileName).toBe('gripline-hangar.crt');
    });

    it('serves the chain (server certificate, then the authority) and keeps the files beside each other', async () => {
      const made = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const files = lanCertificateFiles(dir);
      expect(made.cert).toBe(`${fileText(files.cert).trimEnd()}\n${fileText(files.authority).trimEnd()}\n`);
      expect(made.key).toBe(fileText(files.key));
      expect(made.authority).toBe(fileText(files.authority));
    });

    it('is valid from a day back (phone clocks lag) for 365 days, within what Apple devices accept', async () => {
      const cert = serverCertOf((await ensureLanCertificate({ dir, ...HANGAR, now: NOW })).cert);
      expect(new Date(cert.validFrom).getTime()).toBe(NOW.getTime() - DAY_MS);
      expect(new Date(cert.validTo).getTime()).toBe(NOW.getTime() + 365 * DAY_MS);
    });

    it('writes both keys readable by their owner only', async () => {
      await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const files = lanCertificateFiles(dir);
      expect(statSync(files.key).mode & 0o777).toBe(0o600);
      expect(statSync(files.authorityKey).mode & 0o777).toBe(0o600);
    });
  });

  describe('on a later run', () => {
    it('reuses both certificates when the names are unchanged', async () => {
      const first = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const again = await ensureLanCertificate({ dir, ...HANGAR, now: new Date(NOW.getTime() + 200 * DAY_MS) });
      expect(again.made).toEqual([]);
      expect(again.cert).toBe(first.cert);
      expect(again.key).toBe(first.key);
    });

    it('reuses them when an address went away (the certificate still names every current one)', async () => {
      const first = await ensureLanCertificate({ dir, ...HANGAR, ipv4: ['192.168.1.20', '10.0.0.5'], now: NOW });
      const again = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      expect(again.made).toEqual([]);
      expect(again.cert).toBe(first.cert);
    });

    it('reuses them when only an IPv6 address is new (privacy addresses change daily)', async () => {
      const first = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const again = await ensureLanCertificate({ dir, ...HANGAR, ipv6: ['fd00::99'], now: NOW });
      expect(again.cert).toBe(first.cert);
    });

    it('makes a new server certificate under the same authority when the IPv4 address changed', async () => {
      const first = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const again = await ensureLanCertificate({ dir, ...HANGAR, ipv4: ['192.168.1.31'], now: NOW });
      expect(again.made).toEqual(['a new server certificate (it does not name 192.168.1.31)']);
      expect(serverCertOf(again.cert).checkIP('192.168.1.31')).toBe('192.168.1.31');
      expect(again.authority).toBe(first.authority);
      expect(again.key).not.toBe(first.key);
      expect(statSync(lanCertificateFiles(dir).key).mode & 0o777).toBe(0o600);
    });

    it('makes a new server certificate when the host name changed', async () => {
      await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const again = await ensureLanCertificate({ dir, ...HANGAR, hostNames: ['bench-laptop', 'bench-laptop.local', 'localhost'], now: NOW });
      expect(again.made).toEqual(['a new server certificate (it does not name bench-laptop)']);
      expect(serverCertOf(again.cert).checkHost('bench-laptop.local', { subject: 'never' })).toBe('bench-laptop.local');
    });

    it('makes a new server certificate 30 days before it runs out, and keeps it one day earlier', async () => {
      const first = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const kept = await ensureLanCertificate({ dir, ...HANGAR, now: new Date(NOW.getTime() + 334 * DAY_MS) });
      expect(kept.cert).toBe(first.cert);
      const renewed = await ensureLanCertificate({ dir, ...HANGAR, now: new Date(NOW.getTime() + 336 * DAY_MS) });
      expect(renewed.made).toEqual(['a new server certificate (it runs out within 30 days)']);
      expect(renewed.authority).toBe(first.authority);
    });

    it('makes a new authority, and a server certificate under it, when the authority runs out within 30 days', async () => {
      const first = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const later = new Date(NOW.getTime() + (10 * 365 - 20) * DAY_MS);
      const renewed = await ensureLanCertificate({ dir, ...HANGAR, now: later });
      expect(renewed.made).toEqual([
        'a new certificate authority (it runs out within 30 days)',
        'a new server certificate (the hangar authority is new)',
      ]);
      expect(renewed.authority).not.toBe(first.authority);
      expect(serverCertOf(renewed.cert).verify(new X509Certificate(renewed.authority).publicKey)).toBe(true);
    });

    it('makes a new server certificate when its key file no longer matches it', async () => {
      await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      const files = lanCertificateFiles(dir);
      writeFileSync(files.key, fileText(files.authorityKey));
      const again = await ensureLanCertificate({ dir, ...HANGAR, now: NOW });
      expect(again.made).toEqual(['a new server certificate (its key does not match it)']);
    });
  });
});

describe('lanNames', () => {
  const nic = (address: string, family: 'IPv4' | 'IPv6', internal = false) => ({
    address,
    family,
    internal,
    netmask: '',
    mac: '00:00:00:00:00:00',
    cidr: null,
    ...(family === 'IPv6' ? { scopeid: 0 } : {}),
  });

  it('names the machine, its .local name and localhost, and every LAN address but loopback and link-local ones', () => {
    const names = lanNames('Hangar', {
      lo: [nic('127.0.0.1', 'IPv4', true), nic('::1', 'IPv6', true)],
      wlan0: [nic('192.168.1.20', 'IPv4'), nic('fe80::1', 'IPv6'), nic('fd00::20', 'IPv6')],
      eth0: [nic('10.0.0.5', 'IPv4'), nic('169.254.3.4', 'IPv4')],
    } as never);
    expect(names).toEqual({ hostNames: ['hangar', 'hangar.local', 'localhost'], ipv4: ['192.168.1.20', '10.0.0.5'], ipv6: ['fd00::20'] });
  });

  it('keeps a host name that already has a domain as it is', () => {
    expect(lanNames('crib.example.org', {}).hostNames).toEqual(['crib.example.org', 'localhost']);
  });
});
