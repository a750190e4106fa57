import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { get } from 'node:https';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readEnv } from '../../server/env';
import { ensureLanCertificate, lanCertificateFiles, type LanCertificate } from '../../server/lan/lan-certificate';
import { startGripline } from '../../server/main';
import { buildTestApp, type TestApp } from '../helpers/test-app';

let dir: string;
let lan: LanCertificate;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'gripline-https-'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Gripline</title>');
  lan = await ensureLanCertificate({ dir, hostNames: ['hangar', 'localhost'], ipv4: ['127.0.0.1'] });
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** GET over HTTPS trusting only the hangar's own authority. */
function httpsGet(url: string, ca: string): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: string }> {
  return new Promise((ok, fail) => {
    get(url, { ca }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => (body += chunk));
      res.on('end', () => ok({ status: res.statusCode ?? 0, headers: res.headers, body }));
    }).on('error', fail);
  });
}

describe('GET /certificate', () => {
  let t: TestApp;
  afterAll(async () => t?.close());

  it('answers 404 NOT_FOUND when Gripline runs on no certificate of its own, not the client page', async () => {
    t = await buildTestApp({ clientDir: dir });
    const res = await request(t.app).get('/certificate').expect(404);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.body.error.code).toBe('NOT_FOUND');
    await request(t.app).get('/tools/T-1').expect(200).expect('content-type', /html/);
  });

  it('downloads the hangar authority when Gripline made its own certificate, without signing in', async () => {
    const withCert = await buildTestApp({ clientDir: dir, certificateDownload: { pem: lan.authority, fileName: lan.fileName } });
    const res = await request(withCert.app).get('/certificate').buffer(true).parse((r, done) => {
      let text = '';
      r.on('data', (c: Buffer) => (text += c.toString()));
      r.on('end', () => done(null, text));
    });
    await withCert.close();
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/x-x509-ca-cert');
    expect(res.headers['content-disposition']).toBe('attachment; filename=gripline-hangar.crt');
    expect(res.body).toBe(lan.authority);
  });
});

describe('TLS_CERT_FILE and TLS_KEY_FILE', () => {
  it('refuse to start when only one is set, naming the missing one', () => {
    expect(() => readEnv({ TLS_CERT_FILE: '/etc/gripline/cert.pem' })).toThrow(/\n  TLS_KEY_FILE: not set; HTTPS needs both TLS_CERT_FILE and TLS_KEY_FILE/);
    expect(() => readEnv({ TLS_KEY_FILE: '/etc/gripline/key.pem' })).toThrow(/\n  TLS_CERT_FILE: not set;/);
  });

  it('refuse to start when a file cannot be read, naming it', async () => {
    const env = readEnv({ TLS_CERT_FILE: join(dir, 'absent.pem'), TLS_KEY_FILE: lanCertificateFiles(dir).key, DATABASE_PATH: ':memory:' });
    await expect(startGripline(env)).rejects.toThrow(/TLS_CERT_FILE \(.*absent\.pem\) cannot be read/);
  });

  it('refuse to start when the certificate and key do not belong together', async () => {
    const files = lanCertificateFiles(dir);
    const env = readEnv({ TLS_CERT_FILE: files.cert, TLS_KEY_FILE: files.authorityKey, DATABASE_PATH: ':memory:' });
    await expect(startGripline(env)).rejects.toThrow(/Gripline cannot start: the TLS certificate and key are not PEM, or do not belong together/);
  });

  it('serve HTTPS on PORT with HSTS and Secure cookies, and report an https URL', async () => {
    const files = lanCertificateFiles(dir);
    const running = await startGripline(
      readEnv({
        PORT: '0',
        HOST: '127.0.0.1',
        DATABASE_PATH: join(dir, 'gripline.db'),
        SEED_DEMO: 'false',
        LOG_LEVEL: 'silent',
        TLS_CERT_FILE: files.cert,
        TLS_KEY_FILE: files.key,
      }),
    );
    try {
      expect(running.url).toBe(`https://localhost:${running.port}`);
      const res = await httpsGet(`${running.url}/api/auth/csrf`, lan.authority);
      expect(res.status).toBe(200);
      expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
      expect(String(res.headers['set-cookie'])).toMatch(/gripline\.sid=.*; Secure/);
      const certificate = await httpsGet(`${running.url}/certificate`, lan.authority);
      expect(certificate.status).toBe(404);
    } finally {
      await running.close();
    }
  });
});
