import type { SignedInAgent, TestApp } from './test-app';
import { patch, post } from './crib';

export const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * One rivet line of exactly 100 rivets: 2 rows of 50 holes over 24 in, a 0.064 in stack (grip −2),
 * 1/8 in dome 5056 structural blind rivets. Pitch (24 − 2 × 0.25) / 49 = 0.48 in lies between 3D
 * and 10D, so the estimator accepts it; with the default 5 % waste the need is ⌈105⌉ = 105.
 */
export const hundredRivetLine = {
  length: 24,
  rows: 2,
  holesPerRow: 50,
  stack: [0.032, 0.032],
  structural: true,
  rivet: { kind: 'blind-structural', head: 'dome', diameter32: 4, material: '5056' },
};

/** A screw bin body for extra items. */
export const screwBin = (over: Record<string, unknown> = {}) => ({
  kind: 'screw',
  name: 'Screw #8-32 × 1/2 pan head, stainless',
  unit: 'each',
  packSize: 50,
  unitCost: 0.09,
  supplier: 'Harbour Hardware Co.',
  supplierPart: 'PS832-8',
  leadTimeDays: 7,
  location: 'Drawer C4',
  initialQuantity: 200,
  ...over,
});

/** Creates a build for `who` and one assembly in it; returns the assembly id. */
export async function addAssembly(who: SignedInAgent, body: Record<string, unknown>): Promise<number> {
  const build = await post(who, '/api/builds', { name: 'Two-seat kit' });
  if (build.status !== 201) throw new Error(`could not add build: ${build.status} ${JSON.stringify(build.body)}`);
  const res = await post(who, `/api/builds/${(build.body as { id: number }).id}/assemblies`, { unit: 'in', ...body });
  if (res.status !== 201) throw new Error(`could not add assembly: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

export async function setAssemblyStatus(who: SignedInAgent, id: number, status: string): Promise<void> {
  const res = await patch(who, `/api/assemblies/${id}`, { status });
  if (res.status !== 200) throw new Error(`could not set status: ${res.status} ${JSON.stringify(res.body)}`);
}

/** Draws as `who`, naming the assembly when given; fails the setup loudly otherwise. */
export async function drawFrom(who: SignedInAgent, code: string, quantity: number, assemblyId?: number): Promise<number> {
  const res = await post(who, `/api/bins/${code}/draw`, { quantity, ...(assemblyId !== undefined && { assemblyId }) });
  if (res.status !== 201) throw new Error(`could not draw: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

/** The test clock's day plus `days`, as YYYY-MM-DD. */
export const dayFrom = (t: TestApp, days: number) => new Date(t.clock.now.getTime() + days * DAY_MS).toISOString().slice(0, 10);
