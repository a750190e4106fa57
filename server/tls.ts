import { readFileSync } from 'node:fs';
import { createServer } from 'node:https';
import type { Env } from './env';

export interface TlsFiles {
  /** PEM certificate, with its chain when there is one. */
  cert: string;
  key: string;
}

function readPem(variable: string, path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (err) {
    throw new Error(`Gripline cannot start: ${variable} (${path}) cannot be read: ${(err as Error).message}`, { cause: err });
  }
}

/** The certificate and key named by TLS_CERT_FILE and TLS_KEY_FILE, or undefined to serve plain HTTP. */
export function tlsFromEnv(env: Pick<Env, 'TLS_CERT_FILE' | 'TLS_KEY_FILE'>): TlsFiles | undefined {
  if (!env.TLS_CERT_FILE || !env.TLS_KEY_FILE) return undefined;
  return { cert: readPem('TLS_CERT_FILE', env.TLS_CERT_FILE), key: readPem('TLS_KEY_FILE', env.TLS_KEY_FILE) };
}

/** An HTTPS server on the certificate; a certificate and key that are not PEM or not a pair stop the start. */
export function createTlsServer(tls: TlsFiles) {
  try {
    return createServer({ cert: tls.cert, key: tls.key });
  } catch (err) {
    throw new Error(`Gripline cannot start: the TLS certificate and key are not PEM, or do not belong together: ${(err as Error).message}`, {
      cause: err,
    });
  }
}
