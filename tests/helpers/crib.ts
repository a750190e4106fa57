import type { SignedInAgent, TestApp } from './test-app';

/** Requests that change something carry the agent's CSRF token. */
export const post = (who: SignedInAgent, path: string, body: unknown = {}) => who.agent.post(path).set('X-CSRF-Token', who.csrf).send(body as object);
export const patch = (who: SignedInAgent, path: string, body: unknown) => who.agent.patch(path).set('X-CSRF-Token', who.csrf).send(body as object);
export const del = (who: SignedInAgent, path: string) => who.agent.delete(path).set('X-CSRF-Token', who.csrf);

/** Adds a tool as `who` (a quartermaster or lead); fails the test setup loudly otherwise. */
export async function addToolAs(who: SignedInAgent, body: Record<string, unknown>): Promise<{ id: number; code: string; status: string }> {
  const res = await post(who, '/api/tools', body);
  if (res.status !== 201) throw new Error(`could not add tool: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; code: string; status: string };
}

/** Checks a tool out to `who`, due back `dueInMs` after the test clock's now; returns the loan id. */
export async function lend(t: TestApp, who: SignedInAgent, code: string, dueInMs: number): Promise<number> {
  const res = await post(who, `/api/tools/${code}/checkout`, { dueAt: new Date(t.clock.now.getTime() + dueInMs).toISOString() });
  if (res.status !== 201) throw new Error(`could not check out: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

/** A blind structural rivet bin body: 1/8 in dome 5056, grip -2, with opening stock. */
export const blindRivetBin = (over: Record<string, unknown> = {}) => ({
  kind: 'blind_structural',
  head: 'dome',
  material: '5056',
  stemMaterial: 'steel',
  diameter32: 4,
  grip16: 2,
  unit: 'each',
  packSize: 100,
  unitCost: 0.12,
  supplier: 'Cedar Valley Fastener Supply',
  leadTimeDays: 10,
  reorderPoint: 200,
  reorderQty: 450,
  location: 'Shelf A2',
  initialQuantity: 500,
  ...over,
});

/** Adds a bin as `who` (a quartermaster or lead); fails the test setup loudly otherwise. */
export async function addBinAs(who: SignedInAgent, body: Record<string, unknown>): Promise<{ id: number; code: string; onHand: number }> {
  const res = await post(who, '/api/bins', body);
  if (res.status !== 201) throw new Error(`could not add bin: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; code: string; onHand: number };
}
