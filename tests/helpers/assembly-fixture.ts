import type { Assembly, AssemblyEstimate, Build } from '@shared/schemas/builds';

/**
 * A rudder in progress: one 20 in line at 1 in pitch, 0.375 in edges, two 0.032 in sheets, 5/32 in
 * structural blind rivets (the worked check of trade-checks.md §3: 21 holes), and 24 screws.
 */
export function rudderFixture(over: Partial<Assembly> = {}): Assembly {
  return assemblyFixture(7, {
    name: 'Rudder',
    status: 'in_progress',
    plannedStart: '2027-01-10',
    plannedFinish: '2027-02-01',
    lines: [{ label: 'Skin to spar', length: 20, pitch: 1, edgeDistance: 0.375, stack: [0.032, 0.032], structural: true, rivet: { kind: 'blind-structural', head: 'dome', diameter32: 5 } }],
    extraItems: [{ binCode: 'B-0210', quantity: 24 }],
    ...over,
  });
}

/** An assembly as GET /api/assemblies/:id sends it. */
export function assemblyFixture(id: number, over: Partial<Assembly> = {}): Assembly {
  return {
    id,
    buildId: 1,
    buildName: 'Two-seat low wing',
    owner: { id: 2, name: 'Ruth Lindqvist' },
    name: `Assembly ${id}`,
    status: 'planned',
    plannedStart: null,
    plannedFinish: null,
    unit: 'in',
    lines: [],
    extraItems: [],
    notes: '',
    updatedAt: '2026-12-01T10:00:00.000Z',
    ...over,
  };
}

/** A build as GET /api/builds/:id sends it. */
export function buildFixture(id: number, over: Partial<Build> = {}): Build {
  return { id, owner: { id: 2, name: 'Ruth Lindqvist' }, name: 'Two-seat low wing', description: '', edgeFloorIn: null, assemblies: [], ...over };
}

/** An estimate answer with nothing in it; tests fill what they check. */
export function estimateFixture(assemblyId: number, over: Partial<AssemblyEstimate> = {}): AssemblyEstimate {
  return {
    assemblyId,
    unit: 'in',
    wastePercent: 5,
    lines: [],
    totals: { rivets: 0, rivetsWithWaste: 0, drillHoles: {}, tempFasteners: {}, rules: [] },
    warnings: [],
    errors: [],
    bill: [],
    kit: [],
    caution: 'Gripline plans stock and tools; the kit’s plans, approved data and licensed practice govern.',
    cautions: [],
    ...over,
  };
}
