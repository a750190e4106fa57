import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { get, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addBinAs, blindRivetBin } from '../helpers/crib';
import { buildTestApp, type TestApp } from '../helpers/test-app';

/**
 * A small built client. Each compressed copy says which copy it is, so a test can tell which file
 * was sent, not only that its bytes decode.
 */
const INDEX = '<!doctype html><html lang="en"><head><title>Gripline</title></head><body><div id="root"></div></body></html>';
const SCRIPT = `export const hello = ${JSON.stringify('rivet '.repeat(400))};`;
const variant = (text: string, which: string) => `${text}<!-- ${which} -->`;

function writeClient(dir: string) {
  mkdirSync(join(dir, 'assets'));
  const withCopies = (name: string, text: string) => {
    writeFileSync(join(dir, name), text);
    writeFileSync(join(dir, `${name}.br`), brotliCompressSync(variant(text, 'br')));
    writeFileSync(join(dir, `${name}.gz`), gzipSync(variant(text, 'gz')));
  };
  withCopies('index.html', INDEX);
  withCopies('assets/index-C4fe12ab.js', SCRIPT);
  withCopies('sw.js', 'self.addEventListener("fetch", () => {});');
  writeFileSync(join(dir, 'manifest.webmanifest'), '{"name":"Gripline"}');
  writeFileSync(join(dir, 'assets/inter-latin-Dx4kXJAl.woff2'), Buffer.from([0x77, 0x4f, 0x46, 0x32, 1, 2, 3]));
}

interface Raw {
  status: number;
  headers: IncomingHttpHeaders;
  body: Buffer;
}

/** A plain HTTP GET that keeps the bytes as sent (supertest would decode them). */
function fetchRaw(path: string, headers: Record<string, string> = {}): Promise<Raw> {
  return new Promise((ok, fail) => {
    get({ host: '127.0.0.1', port: (server.address() as AddressInfo).port, path, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => ok({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
    }).on('error', fail);
  });
}

const decoded = (res: Raw) =>
  (res.headers['content-encoding'] === 'br' ? brotliDecompressSync(res.body) : res.headers['content-encoding'] === 'gzip' ? gunzipSync(res.body) : res.body).toString();

let dir: string;
let t: TestApp;
let server: Server;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'gripline-client-'));
  writeClient(dir);
  t = await buildTestApp({ clientDir: dir });
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((ok) => server.once('listening', ok));
});
afterAll(async () => {
  await new Promise((ok) => server.close(ok));
  await t.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the built client, compressed at build time', () => {
  it('sends the brotli copy when the browser accepts brotli and gzip, with Vary: Accept-Encoding', async () => {
    const res = await fetchRaw('/assets/index-C4fe12ab.js', { 'Accept-Encoding': 'gzip, deflate, br, zstd' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^text\/javascript; charset=utf-8$/i);
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
    expect(Number(res.headers['content-length'])).toBe(res.body.length);
    expect(decoded(res)).toBe(variant(SCRIPT, 'br'));
  });

  it('sends the gzip copy to a browser that takes gzip only, and the plain file to one that takes neither', async () => {
    const gz = await fetchRaw('/assets/index-C4fe12ab.js', { 'Accept-Encoding': 'gzip' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(decoded(gz)).toBe(variant(SCRIPT, 'gz'));

    for (const accept of [undefined, 'identity', 'zstd']) {
      const plain = await fetchRaw('/assets/index-C4fe12ab.js', accept ? { 'Accept-Encoding': accept } : {});
      expect(plain.headers['content-encoding']).toBeUndefined();
      expect(plain.headers.vary).toMatch(/Accept-Encoding/);
      expect(plain.body.toString()).toBe(SCRIPT);
    }
  });

  it('keeps hashed assets for a year, compressed or not', async () => {
    for (const path of ['/assets/index-C4fe12ab.js', '/assets/inter-latin-Dx4kXJAl.woff2']) {
      const res = await fetchRaw(path, { 'Accept-Encoding': 'br' });
      expect(res.status).toBe(200);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    }
  });

  it('answers 404 for an asset that is not there, never the page in its place', async () => {
    const res = await fetchRaw('/assets/index-0ld0ld00.js', { 'Accept-Encoding': 'br' });
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/^text\/plain/);
  });

  it('has files outside assets/ (a service worker, a web manifest) revalidate instead of being kept', async () => {
    const sw = await fetchRaw('/sw.js', { 'Accept-Encoding': 'br' });
    expect(sw.headers['cache-control']).toBe('no-cache');
    expect(sw.headers['content-encoding']).toBe('br');
    const manifest = await fetchRaw('/manifest.webmanifest', { 'Accept-Encoding': 'br' });
    expect(manifest.status).toBe(200);
    expect(manifest.headers['cache-control']).toBe('no-cache');
    expect(manifest.headers['content-type']).toMatch(/^application\/manifest\+json/);
  });
});

describe('the page and the client routes', () => {
  it.each(['/', '/sign-in', '/tools/T-0042', '/index.html'])('GET %s sends index.html compressed, to be revalidated', async (path) => {
    const res = await fetchRaw(path, { 'Accept-Encoding': 'gzip, br' });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/html; charset=utf-8$/i);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers.etag).toBeTruthy();
    expect(decoded(res)).toBe(variant(INDEX, 'br'));
  });

  it('answers 304 without a body when the page has not changed, and a full answer for another encoding', async () => {
    const first = await fetchRaw('/scan', { 'Accept-Encoding': 'br' });
    const again = await fetchRaw('/scan', { 'Accept-Encoding': 'br', 'If-None-Match': first.headers.etag! });
    expect(again.status).toBe(304);
    expect(again.body.length).toBe(0);
    expect(again.headers['cache-control']).toBe('no-cache');

    const gzip = await fetchRaw('/scan', { 'Accept-Encoding': 'gzip', 'If-None-Match': first.headers.etag! });
    expect(gzip.status).toBe(200);
    expect(gzip.headers.etag).not.toBe(first.headers.etag);
    expect(decoded(gzip)).toBe(variant(INDEX, 'gz'));
  });
  it.each(['/%', '/tools/%zz', '/assets/%E0%A4%A.js'])('GET %s, a malformed percent-encoding, answers 400 BAD_REQUEST_PATH, not the page', async (path) => {
    const res = await fetchRaw(path, { 'Accept-Encoding': 'br' });
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(JSON.parse(decoded(res))).toEqual({ error: { code: 'BAD_REQUEST_PATH', message: expect.any(String) } });
  });
});

describe('API answers', () => {
  it('compresses a JSON answer over about 1 KB and leaves a small one as it is', async () => {
    await t.addCrew();
    const qm = await t.signIn('qm@example.org');
    for (let grip = 1; grip <= 6; grip++) await addBinAs(qm, blindRivetBin({ grip16: grip, location: `Drawer A${grip}` }));

    const list = await qm.agent.get('/api/bins').set('Accept-Encoding', 'gzip');
    expect(list.status).toBe(200);
    expect(list.headers['content-type']).toMatch(/^application\/json/);
    expect(list.headers['content-encoding']).toBe('gzip');
    expect(list.headers.vary).toMatch(/Accept-Encoding/);
    expect(list.body.data).toHaveLength(6);

    const me = await qm.agent.get('/api/auth/me').set('Accept-Encoding', 'gzip');
    expect(me.status).toBe(200);
    expect(JSON.stringify(me.body).length).toBeLessThan(1024);
    expect(me.headers['content-encoding']).toBeUndefined();

    const plain = await qm.agent.get('/api/bins').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.data).toHaveLength(6);

    // A download streams through as it is made: the CSV export is well over 1 KB and stays uncompressed.
    const csv = await qm.agent.get('/api/bins/export.csv').set('Accept-Encoding', 'gzip, br');
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(csv.headers['content-encoding']).toBeUndefined();
    expect(csv.text.length).toBeGreaterThan(1024);
    expect(csv.text.trim().split(/\r?\n/)).toHaveLength(7);
  });
});
