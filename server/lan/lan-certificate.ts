import { X509Certificate, createPrivateKey } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { generate } from 'selfsigned';
import { authorityRenewalReason, serverRenewalReason, type StoredCertificate, type WantedNames } from './lan-certificate-rules';
import { DAY_MS } from '@shared/time/durations';

const AUTHORITY_DAYS = 10 * 365;
/** Apple devices refuse server certificates valid for more than 825 days. */
const SERVER_DAYS = 365;
/** Phones whose clock runs a little behind still accept a certificate made just now. */
const BACKDATE_MS = DAY_MS;

export interface LanCertificate {
  /** The server certificate followed by the authority that issued it (PEM). */
  cert: string;
  key: string;
  /** The hangar's own certificate authority (PEM): what a phone trusts, offered at /certificate. */
  authority: string;
  /** Download name of the authority, e.g. gripline-hangar.crt */
  fileName: string;
  /** What was made on this run and why; empty when both certificates were reused. */
  made: string[];
}

export interface LanCertificateRequest extends WantedNames {
  /** Folder the files are kept in (beside the database). */
  dir: string;
  now?: Date;
}

/** Where the certificates and their keys are kept. */
export function lanCertificateFiles(dir: string) {
  return {
    authority: join(dir, 'lan-ca.pem'),
    authorityKey: join(dir, 'lan-ca-key.pem'),
    cert: join(dir, 'lan-cert.pem'),
    key: join(dir, 'lan-key.pem'),
  };
}

type Pair = StoredCertificate & { pem: string; keyPem: string };

function readPair(certFile: string, keyFile: string): Pair | undefined {
  if (!existsSync(certFile) || !existsSync(keyFile)) return undefined;
  try {
    const pem = readFileSync(certFile, 'utf8');
    const keyPem = readFileSync(keyFile, 'utf8');
    return { pem, keyPem, cert: new X509Certificate(pem), key: createPrivateKey(keyPem) };
  } catch {
    return undefined;
  }
}

/** Reuses the pair kept in the two files, or makes and keeps a new one (the key readable by its owner only). */
async function keepOrMake(
  [certFile, keyFile]: [string, string],
  reasonToMake: (stored: Pair | undefined) => string | undefined,
  make: () => Promise<{ pem: string; keyPem: string }>,
  log: { what: string; made: string[] },
): Promise<Pair> {
  const stored = readPair(certFile, keyFile);
  const reason = reasonToMake(stored);
  if (stored && !reason) return stored;
  const { pem, keyPem } = await make();
  writeFileSync(keyFile, keyPem, { mode: 0o600 });
  chmodSync(keyFile, 0o600);
  writeFileSync(certFile, pem);
  log.made.push(`a new ${log.what} (${reason})`);
  return { pem, keyPem, cert: new X509Certificate(pem), key: createPrivateKey(keyPem) };
}

const validity = (now: Date, days: number) => ({
  notBeforeDate: new Date(now.getTime() - BACKDATE_MS),
  notAfterDate: new Date(now.getTime() + days * DAY_MS),
});

async function makeAuthority(name: string, now: Date) {
  const made = await generate([{ name: 'commonName', value: `Gripline hangar authority (${name})` }, { name: 'organizationName', value: 'Gripline' }], {
    keyType: 'ec',
    algorithm: 'sha256',
    ...validity(now, AUTHORITY_DAYS),
    extensions: [
      { name: 'basicConstraints', cA: true, pathLenConstraint: 0, critical: true },
      { name: 'keyUsage', keyCertSign: true, cRLSign: true, digitalSignature: true, critical: true },
    ],
  });
  return { pem: made.cert, keyPem: made.private };
}

async function makeServerCertificate(wanted: WantedNames, authority: { pem: string; keyPem: string }, now: Date) {
  const made = await generate([{ name: 'commonName', value: wanted.hostNames[0] ?? 'localhost' }], {
    keyType: 'ec',
    algorithm: 'sha256',
    ...validity(now, SERVER_DAYS),
    ca: { cert: authority.pem, key: authority.keyPem },
    extensions: [
      { name: 'basicConstraints', cA: false, critical: true },
      { name: 'keyUsage', digitalSignature: true, critical: true },
      { name: 'extKeyUsage', serverAuth: true },
      {
        name: 'subjectAltName',
        altNames: [
          ...wanted.hostNames.map((value) => ({ type: 2 as const, value })),
          ...[...wanted.ipv4, ...(wanted.ipv6 ?? [])].map((ip) => ({ type: 7 as const, ip })),
        ],
      },
    ],
  });
  return { pem: made.cert, keyPem: made.private };
}

const downloadName = (host: string) => `gripline-${(host.split('.')[0] ?? '').replace(/[^a-z0-9-]/gi, '') || 'hangar'}.crt`;

/**
 * The hangar's certificate for `npm run start:lan`: a certificate authority of its own (trusted once
 * per phone) and a server certificate it issues for this machine's names and addresses. Both are kept
 * in `dir` and reused until they run out or the machine's names change.
 */
export async function ensureLanCertificate(request: LanCertificateRequest): Promise<LanCertificate> {
  const { dir, now = new Date() } = request;
  const files = lanCertificateFiles(dir);
  mkdirSync(dir, { recursive: true });
  const made: string[] = [];

  const authority = await keepOrMake(
    [files.authority, files.authorityKey],
    (stored) => authorityRenewalReason(stored, now),
    () => makeAuthority(request.hostNames[0] ?? 'localhost', now),
    { what: 'certificate authority', made },
  );
  const server = await keepOrMake(
    [files.cert, files.key],
    (stored) => serverRenewalReason(stored, authority.cert, request, now),
    () => makeServerCertificate(request, authority, now),
    { what: 'server certificate', made },
  );

  return {
    cert: `${server.pem.trimEnd()}\n${authority.pem.trimEnd()}\n`,
    key: server.keyPem,
    authority: authority.pem,
    fileName: downloadName(request.hostNames[0] ?? 'hangar'),
    made,
  };
}
