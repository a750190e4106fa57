/**
 * How long GET /api/health takes to answer while the server does something else: the measure of
 * whether heavy work (a large import, a label sheet) holds up every other request.
 */
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { RequestListener } from 'node:http';

const POLL_GAP_MS = 5;
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export async function listen(app: RequestListener): Promise<{ server: Server; base: string; close(): Promise<void> }> {
  const server = createServer(app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  return {
    server,
    base: `http://127.0.0.1:${port}`,
    close: () => {
      server.closeAllConnections();
      return new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

async function timedHealth(base: string): Promise<number> {
  const start = performance.now();
  const res = await fetch(`${base}/api/health`);
  await res.arrayBuffer();
  if (res.status !== 200) throw new Error(`GET /api/health answered ${res.status}`);
  return performance.now() - start;
}

/** `count` health answers one after another on an otherwise idle server: the baseline. */
export async function idleHealthLatencies(base: string, count: number): Promise<number[]> {
  const latencies: number[] = [];
  for (let i = 0; i < count; i++) {
    latencies.push(await timedHealth(base));
    await sleep(POLL_GAP_MS);
  }
  return latencies;
}

/**
 * Starts `work`, asks for /api/health over and over until it settles, and answers with its result
 * and every health answer's time (in ms, from the request leaving to the whole answer read).
 */
export async function healthLatenciesDuring<T>(base: string, work: () => Promise<T>): Promise<{ result: T; latencies: number[] }> {
  let settled = false;
  const latencies: number[] = [];
  const running = work().finally(() => {
    settled = true;
  });
  const polling = (async () => {
    while (!settled) {
      latencies.push(await timedHealth(base));
      await sleep(POLL_GAP_MS);
    }
  })();
  try {
    return { result: await running, latencies };
  } finally {
    // The polling stops once the work settles, also when it failed; its own failure shows in the latencies' absence.
    await polling.catch(() => undefined);
  }
}

/** A bins CSV of `count` new screws, each its own name (no two the same bin). */
export function screwsCsv(count: number): string {
  const header = 'code,kind,name,unit,pack_size,unit_cost,supplier,location,notes,opening_stock';
  const rows = Array.from({ length: count }, (_, i) => `,screw,"Screw #8-32 × ${i + 1}/64 pan head, stainless",each,50,0.09,Cedar Valley Fastener Supply,Drawer C${(i % 9) + 1},"Batch ${i}, counted",${(i % 20) + 1}`);
  return [header, ...rows].join('\r\n');
}
