import { describe, expect } from 'vitest';
import { assemblyEstimateSchema, assemblyListSchema, assemblySchema, buildListSchema, buildSchema, kitHoldsResultSchema, type AssemblyEstimate, type BillLine, type KitItem } from '@shared/schemas/builds';
import { addBinAs, addToolAs, blindRivetBin, del, lend, patch, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

const DAY_MS = 24 * 60 * 60 * 1000;
const blind = (diameter32: number, material?: string) => ({ kind: 'blind-structural', head: 'dome', diameter32, ...(material && { material }) });
/**
 * 20 in at a 1 in target pitch, 0.375 in from each end: ⌈19.25⌉ + 1 = 21 holes at 0.9625 in (the worked
 * check in the reference, our own arithmetic). Two 0.032 in sheets = 0.064 in: grip −2 covers
 * 0.063–0.125 in (TM 10-5410-221-14/1 Table 4-3).
 */
const twentyInchLine = (rivet: object, over: object = {}) => ({ label: 'Spar flange', length: 20, pitch: 1, edgeDistance: 0.375, stack: [0.032, 0.032], structural: true, rivet, ...over });

async function newBuild(who: SignedInAgent, body: object = { name: 'Two-seat kit' }): Promise<number> {
  const res = await post(who, '/api/builds', body);
  if (res.status !== 201) throw new Error(`could not add build: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

async function newAssembly(who: SignedInAgent, body: object, buildId?: number): Promise<number> {
  const res = await post(who, `/api/builds/${buildId ?? (await newBuild(who))}/assemblies`, { name: 'Rudder', unit: 'in', ...body });
  if (res.status !== 201) throw new Error(`could not add assembly: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

async function estimateOf(who: SignedInAgent, id: number): Promise<AssemblyEstimate> {
  const res = await who.agent.get(`/api/assemblies/${id}/estimate`);
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/json/);
  return assemblyEstimateSchema.strict().parse(res.body);
}

crewTest.override('otherMemberPerson', { email: 'other@example.org', name: 'Otto Other' });

const test = crewTest
  .extend('billOf', ({ member }) => async (lines: object[]) => (await estimateOf(member, await newAssembly(member, { lines }))).bill.filter((b) => b.lines.length > 0))
  .extend('crib', ({ t, qm, member }) => async () => {
    const tool = (body: Record<string, unknown>) => addToolAs(qm, body);
    const puller18 = await tool({ name: 'Hand rivet puller, short', category: 'hand_rivet_puller', accessories: ['Nosepiece 1/8'] });
    const puller532 = await tool({ name: 'Hand rivet puller, long', category: 'hand_rivet_puller', accessories: ['Nosepiece 3/32', 'Nosepiece 5/32'] });
    const bit40 = await tool({ name: 'Drill bit #40', category: 'drill_bit', drillSize: '#40' });
    const bit30 = await tool({ name: 'Drill bit #30', category: 'drill_bit', drillSize: '#30' });
    const tray18 = await tool({ name: 'Temporary fasteners 1/8', category: 'temporary_fastener_tray', traySize: '1/8', trayCapacity: 50 });
    const small = await tool({ name: 'Temporary fasteners 5/32, small', category: 'temporary_fastener_tray', traySize: '5/32', trayCapacity: 10 });
    const trayA = await tool({ name: 'Temporary fasteners 5/32', category: 'temporary_fastener_tray', traySize: '5/32', trayCapacity: 12 });
    const trayB = await tool({ name: 'Temporary fasteners 5/32', category: 'temporary_fastener_tray', traySize: '5/32', trayCapacity: 12 });
    const deburr = await tool({ name: 'Deburring tool', category: 'deburring_tool' });
    await lend(t, qm, bit30.code, 7 * DAY_MS);
    await lend(t, member, deburr.code, 7 * DAY_MS);
    return { puller18, puller532, bit40, bit30, tray18, small, trayA, trayB, deburr };
  });

describe('builds and assemblies', () => {
  test('lets a member plan a build with dated assemblies, listed in planned order', async ({ member }) => {
    const created = await post(member, '/api/builds', { name: 'Two-seat kit', description: 'Tail first', edgeFloorIn: 0.375 });
    expect(created.status).toBe(201);
    expect(buildSchema.strict().parse(created.body)).toMatchObject({ name: 'Two-seat kit', owner: { name: 'Mia Member' }, edgeFloorIn: 0.375, assemblies: [] });
    const buildId = created.body.id as number;

    const rudder = await post(member, `/api/builds/${buildId}/assemblies`, {
      name: 'Rudder',
      unit: 'in',
      plannedStart: '2027-02-01',
      plannedFinish: '2027-03-15',
      lines: [twentyInchLine(blind(4, '5056'))],
      extraItems: [{ binCode: 'b-0210', quantity: 24 }],
    });
    expect(rudder.status).toBe(201);
    expect(assemblySchema.strict().parse(rudder.body)).toMatchObject({
      buildId,
      buildName: 'Two-seat kit',
      status: 'planned',
      plannedStart: '2027-02-01',
      plannedFinish: '2027-03-15',
      lines: [{ label: 'Spar flange', length: 20 }],
      extraItems: [{ binCode: 'B-0210', quantity: 24 }],
    });
    await newAssembly(member, { name: 'Vertical stabiliser', plannedStart: '2027-01-05' }, buildId);
    await newAssembly(member, { name: 'Someday fairing' }, buildId);

    const list = await member.agent.get('/api/builds');
    expect(list.status).toBe(200);
    const [build] = buildListSchema.parse(list.body).data;
    expect(build!.assemblies.map((a) => a.name)).toEqual(['Vertical stabiliser', 'Rudder', 'Someday fairing']);

    const moved = await patch(member, `/api/assemblies/${rudder.body.id}`, { status: 'in_progress', plannedStart: '2027-01-20' });
    expect(moved.status).toBe(200);
    expect(moved.body).toMatchObject({ status: 'in_progress', plannedStart: '2027-01-20', plannedFinish: '2027-03-15' });
    const renamed = await patch(member, `/api/builds/${buildId}`, { name: 'Two-seat kit, tail kit', edgeFloorIn: null });
    expect(renamed.body).toMatchObject({ name: 'Two-seat kit, tail kit', edgeFloorIn: null, description: 'Tail first' });
    expect(renamed.body.assemblies).toHaveLength(3);
  });

  test('keeps each member to their own plans: others get 403, the quartermaster reads, a lead reads and changes', async ({ lead, qm, member, otherMember }) => {
    const buildId = await newBuild(member);
    const id = await newAssembly(member, { name: 'Elevator' }, buildId);

    for (const res of [
      await otherMember.agent.get(`/api/assemblies/${id}`),
      await otherMember.agent.get(`/api/assemblies/${id}/estimate`),
      await otherMember.agent.get(`/api/builds/${buildId}`),
      await patch(otherMember, `/api/assemblies/${id}`, { name: 'Mine now' }),
      await patch(otherMember, `/api/builds/${buildId}`, { name: 'Mine now' }),
      await post(otherMember, `/api/builds/${buildId}/assemblies`, { name: 'Sneaky', unit: 'in' }),
      await del(otherMember, `/api/assemblies/${id}`),
      await post(otherMember, `/api/assemblies/${id}/kit/holds`),
      await patch(qm, `/api/assemblies/${id}`, { name: 'Quartermaster edit' }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    expect((await otherMember.agent.get(`/api/assemblies/${id}`)).body.error.message).toBe('This assembly is Mia Member’s: only they, a quartermaster or a chapter lead can see it.');

    expect((await qm.agent.get(`/api/assemblies/${id}`)).status).toBe(200);
    expect((await qm.agent.get(`/api/assemblies/${id}/estimate`)).status).toBe(200);
    const byLead = await patch(lead, `/api/assemblies/${id}`, { notes: 'Check the hinge brackets first' });
    expect(byLead.status).toBe(200);
    expect(byLead.body.notes).toBe('Check the hinge brackets first');

    expect((await otherMember.agent.get('/api/builds')).body.data).toEqual([]);
    const everyone = await otherMember.agent.get('/api/builds?all=true');
    expect(everyone.status).toBe(403);
    expect((await qm.agent.get('/api/builds?all=true')).body.data).toHaveLength(1);
  });

  test('lists assemblies: a member their own, the quartermaster everyone’s or only theirs, by status', async ({ qm, member, otherMember }) => {
    await newAssembly(member, { name: 'Elevator', status: 'in_progress' });
    await newAssembly(member, { name: 'Lid', status: 'done' });
    await newAssembly(qm, { name: 'Demo panel' });
    await newAssembly(otherMember, { name: 'Trailer skin' });

    const names = async (who: SignedInAgent, query: string) => {
      const res = await who.agent.get(`/api/assemblies${query}`);
      expect(res.status).toBe(200);
      return assemblyListSchema.parse(res.body).data.map((a) => a.name).sort();
    };
    expect(await names(member, '?mine=true')).toEqual(['Elevator', 'Lid']);
    expect(await names(member, '')).toEqual(['Elevator', 'Lid']);
    expect(await names(member, '?status=in_progress&mine=true')).toEqual(['Elevator']);
    expect(await names(qm, '')).toEqual(['Demo panel', 'Elevator', 'Lid', 'Trailer skin']);
    expect(await names(qm, '?mine=true')).toEqual(['Demo panel']);
    expect((await member.agent.get('/api/assemblies?status=finished')).body.error.code).toBe('VALIDATION_FAILED');
  });

  test('answers bad input with 400 in words and unknown ids with 404', async ({ t, member }) => {
    const buildId = await newBuild(member);
    const id = await newAssembly(member, { plannedStart: '2027-03-01', plannedFinish: '2027-03-20' }, buildId);

    const noName = await post(member, '/api/builds', { name: ' ' });
    expect(noName.status).toBe(400);
    expect(noName.body.error.issues[0]).toEqual({ path: 'name', message: 'Name the build.' });
    const backwards = await post(member, `/api/builds/${buildId}/assemblies`, { name: 'Flap', unit: 'in', plannedStart: '2027-03-01', plannedFinish: '2027-02-01' });
    expect(backwards.status).toBe(400);
    // One date changed alone must still fit the other one already stored.
    const early = await patch(member, `/api/assemblies/${id}`, { plannedFinish: '2027-02-15' });
    expect(early.status).toBe(400);
    expect(early.body.error).toMatchObject({ code: 'VALIDATION_FAILED', message: 'The planned finish (2027-02-15) cannot be before the planned start (2027-03-01).' });
    const badLine = await patch(member, `/api/assemblies/${id}`, { lines: [{ length: 10, stack: [0.04], rivet: blind(4) }] });
    expect(badLine.status).toBe(400);
    expect(badLine.body.error.message).toContain('Give a target pitch or the holes per row');

    expect((await member.agent.get('/api/assemblies/9999')).body.error.code).toBe('ASSEMBLY_NOT_FOUND');
    expect((await member.agent.get('/api/builds/9999')).status).toBe(404);
    expect((await member.agent.get('/api/assemblies/abc')).status).toBe(400);
    const signedOut = await t.anonymous();
    expect((await signedOut.agent.get('/api/builds')).status).toBe(401);
  });

  test('deletes an assembly nobody drew stock for, and refuses one the ledger names with 409 ASSEMBLY_HAS_DRAWS', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    const used = await newAssembly(member, { name: 'Lid' });
    const unused = await newAssembly(member, { name: 'Drawer' });
    expect((await post(member, `/api/bins/${bin.code}/draw`, { quantity: 12, assemblyId: used })).status).toBe(201);

    const refused = await del(member, `/api/assemblies/${used}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toEqual({ code: 'ASSEMBLY_HAS_DRAWS', message: 'Lid cannot be deleted: 1 ledger entry names it. Mark it done instead.' });
    expect((await member.agent.get(`/api/assemblies/${used}`)).status).toBe(200);

    expect((await del(member, `/api/assemblies/${unused}`)).status).toBe(204);
    expect((await member.agent.get(`/api/assemblies/${unused}`)).status).toBe(404);
  });
});

describe('GET /api/assemblies/:id/estimate: the bill', () => {
  const billFor = (e: AssemblyEstimate, grip: number) => e.bill.find((b) => b.grip === grip && b.lines.length > 0)!;

  test('maps each fastener need to the bin that stocks it, with on hand against needed and how many short', async ({ qm, member }) => {
    const fiveOhFive = await addBinAs(qm, blindRivetBin({ initialQuantity: 20 }));
    const stainless = await addBinAs(qm, blindRivetBin({ material: 'stainless', stemMaterial: 'stainless', initialQuantity: 300, location: 'Shelf C1' }));
    const id = await newAssembly(member, { lines: [twentyInchLine(blind(4, '5056')), twentyInchLine(blind(4), { label: 'Any 1/8 dome, grip 2', rows: 2 })] });

    const e = await estimateOf(member, id);
    expect(e.errors).toEqual([]);
    expect(e.wastePercent).toBe(5);
    expect(e.lines.map((l) => [l.label, l.holes, l.pitch, l.grip])).toEqual([
      ['Spar flange', 21, 0.9625, 2],
      ['Any 1/8 dome, grip 2', 42, 0.9625, 2],
    ]);
    // A line naming 5056 takes the 5056 bin; one naming no material takes the bin with the most on hand.
    // Waste 5 %, rounded up per need: 21 → ⌈22.05⌉ = 23; 42 → ⌈44.1⌉ = 45.
    expect(e.bill).toEqual<BillLine[]>([
      {
        description: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)',
        kind: 'blind_structural',
        diameter32: 4,
        grip: 2,
        lines: [0],
        estimated: 21,
        withWaste: 23,
        bin: { code: fiveOhFive.code, designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)', onHand: 20, location: 'Shelf A2' },
        unstocked: null,
        shortBy: 3,
        drawn: 0,
        toDraw: 23,
      },
      expect.objectContaining({ lines: [1], estimated: 42, withWaste: 45, bin: expect.objectContaining({ code: stainless.code, onHand: 300 }), shortBy: 0 }),
    ]);
    expect(e.totals).toMatchObject({ rivets: 63, rivetsWithWaste: 68, drillHoles: { '#40': 63, '#30': 63 }, tempFasteners: { '3/32': 14, '1/8': 14 } }); // reused: max(7, 14)
    expect(e.caution).toContain('does not design structures');
  });

  test('says plainly when no bin stocks a need, and names the bin of the rivet stocked for another grip', async ({ qm, member }) => {
    // 0.063 + 0.063 = 0.126 in: grip −3, 0.126–0.187 in (TM 10-5410-221-14/1 Table 4-3); 10 in → ⌈9.25⌉ + 1 = 11 holes.
    const id = await newAssembly(member, { lines: [twentyInchLine(blind(4, '5056'), { length: 10, stack: [0.063, 0.063] })] });
    const unstocked = {
      description: 'Blind, structural, dome, 5056 · 1/8 in · grip −3 (0.126–0.187 in)',
      estimated: 11,
      withWaste: 12,
      bin: null,
      unstocked: 'No bin stocks a 1/8 in dome 5056 structural blind rivet with grip −3.',
      shortBy: 12,
    };
    expect(billFor(await estimateOf(member, id), 3)).toMatchObject(unstocked);
    // A −2 bin takes 0.063–0.125 in: 0.126 in is beyond it.
    const two = await addBinAs(qm, blindRivetBin());
    expect(billFor(await estimateOf(member, id), 3)).toMatchObject({
      ...unstocked,
      unstocked: `No bin's grip range covers the 0.126 in stack: the −3 band is 0.126–0.187 in. Bin ${two.code} has this rivet for 0.063–0.125 in.`,
    });
  });

  describe('blind rivets by the grip range each bin is stocked for', () => {
    // Stacks from the head side down; grip −3 takes 0.126–0.187 in (TM 10-5410-221-14/1 Table 4-3).
    // 10 in at a 1 in pitch, 0.375 in from each end: ⌈9.25⌉ + 1 = 11 holes; 5 % waste → ⌈11.55⌉ = 12.
    const thin = (over: object = {}) => twentyInchLine(blind(4, '5056'), { length: 10, stack: [0.04, 0.09], ...over }); // 0.130 in
    const thick = (over: object = {}) => twentyInchLine(blind(4, '5056'), { length: 10, stack: [0.08, 0.08], ...over }); // 0.160 in

    test('chooses the bin whose range covers every line’s stack: with stock first, then the tightest range', async ({ qm, billOf }) => {
      // Both −3: the table's 0.126–0.187 in (0.061 in wide) and a box reading 0.140–0.187 in (0.047 in wide).
      const wide = await addBinAs(qm, blindRivetBin({ grip16: 3, initialQuantity: 100 }));
      const narrow = await addBinAs(qm, blindRivetBin({ grip16: 3, gripMin: 0.14, gripMax: 0.187, initialQuantity: 100, location: 'Shelf A3' }));

      // 0.130 in is below the narrow box's 0.140 in: only the wide bin covers it.
      expect(await billOf([thin()])).toEqual([expect.objectContaining({ grip: 3, withWaste: 12, bin: expect.objectContaining({ code: wide.code }), unstocked: null, shortBy: 0 })]);
      // 0.160 in: both cover it; the narrow range is the tighter.
      expect(await billOf([thick()])).toEqual([
        expect.objectContaining({ bin: { code: narrow.code, designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −3 (0.140–0.187 in)', onHand: 100, location: 'Shelf A3' } }),
      ]);
      // One need of two lines, 0.130 and 0.160 in: only the wide bin covers both; 11 + 11 = 22 holes → ⌈23.1⌉ = 24.
      expect(await billOf([thin(), thick({ label: 'Rib' })])).toEqual([expect.objectContaining({ lines: [0, 1], withWaste: 24, bin: expect.objectContaining({ code: wide.code }) })]);

      // An empty narrow bin gives way to the wide one that has stock.
      expect((await post(qm, `/api/bins/${narrow.code}/count`, { counted: 0 })).status).toBe(201);
      expect(await billOf([thick()])).toEqual([expect.objectContaining({ bin: expect.objectContaining({ code: wide.code, onHand: 100 }) })]);
    });

    test('says when no bin’s range covers the stack, and names the bins of the rivet with other ranges', async ({ qm, billOf }) => {
      const two = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
      const narrow = await addBinAs(qm, blindRivetBin({ grip16: 3, gripMin: 0.14, gripMax: 0.187, initialQuantity: 100 }));
      expect(await billOf([thin()])).toEqual([
        expect.objectContaining({
          description: 'Blind, structural, dome, 5056 · 1/8 in · grip −3 (0.126–0.187 in)',
          grip: 3,
          bin: null,
          unstocked: `No bin's grip range covers the 0.130 in stack: the −3 band is 0.126–0.187 in. Bins ${two.code} (0.063–0.125 in), ${narrow.code} (0.140–0.187 in) have this rivet for other stacks.`,
          shortBy: 12,
        }),
      ]);
      // 0.130 and 0.160 in together: the narrow bin covers one line only.
      expect((await billOf([thin(), thick()]))[0]!.unstocked).toBe(
        `No bin's grip range covers the 0.130–0.160 in stacks: the −3 band is 0.126–0.187 in. Bins ${two.code} (0.063–0.125 in), ${narrow.code} (0.140–0.187 in) have this rivet for other stacks.`,
      );
    });
  });

  test('names an unstocked monel solid rivet plainly, with the universal head and no MS number', async ({ member }) => {
    // MS20470 and MS20426 designate aluminium-alloy rivets only (trade-checks.md §4). Length: 0.064 + 1.5 × 1/8 = 0.2515 in
    // → next 1/16 up is 5/16 in, −5 (NAVEDTRA 14018 ch. 13).
    const id = await newAssembly(member, { lines: [twentyInchLine({ kind: 'solid', head: 'dome', diameter32: 4, material: 'monel' })] });
    expect(billFor(await estimateOf(member, id), 5)).toMatchObject({
      description: 'Solid, universal head, monel · 1/8 in · 5/16 in long',
      bin: null,
      unstocked: 'No bin stocks a 1/8 in universal head monel solid rivet 5/16 in long (−5).',
    });
  });

  test('drills to the hole drill the matching bin names, instead of the published one', async ({ qm, member }) => {
    const line = twentyInchLine(blind(5, '5056'));
    const before = await estimateOf(member, await newAssembly(member, { lines: [line] }));
    // 5/32 blind rivet: #40 → #30 → #20 (TM 10-5410-221-14/1 Table 4-3 hole 0.160–0.164 in; step drilling, common practice).
    expect(before.lines[0]!.drillSequence).toEqual(['#40', '#30', '#20']);

    await addBinAs(qm, blindRivetBin({ diameter32: 5, holeDrill: '#21' }));
    const after = await estimateOf(member, await newAssembly(member, { lines: [line] }));
    expect(after.lines[0]!.drillSequence).toEqual(['#40', '#30', '#21']);
    expect(after.totals.drillHoles).toEqual({ '#40': 21, '#30': 21, '#21': 21 });
    expect(after.kit.filter((k) => k.role === 'drill_bit').map((k) => k.need)).toEqual(['Drill bit #40', 'Drill bit #30', 'Drill bit #21']);
  });

  test('returns refused lines in errors with 200, so the editor can show them, and still bills the extra items', async ({ qm, member }) => {
    const screws = await addBinAs(qm, { kind: 'screw', name: 'Screw #8-32 × 1/2 pan head', unitCost: 0.35, initialQuantity: 10, location: 'Hardware drawer 2' });
    const id = await newAssembly(member, {
      lines: [twentyInchLine(blind(4)), twentyInchLine(blind(4), { pitch: 0.2, edgeDistance: undefined })],
      extraItems: [
        { binCode: screws.code, quantity: 24 },
        { binCode: 'B-0999', quantity: 4 },
      ],
    });
    const e = await estimateOf(member, id);
    expect(e.errors).toEqual([expect.objectContaining({ code: 'PITCH_BELOW_MINIMUM', line: 1, message: expect.stringMatching(/^Line 2: /) })]);
    expect(e.lines).toEqual([]);
    expect(e.kit).toEqual([]);
    expect(e.bill).toEqual([
      { description: 'Screw #8-32 × 1/2 pan head', kind: 'screw', diameter32: null, grip: null, lines: [], estimated: 24, withWaste: 24, bin: { code: screws.code, designation: 'Screw #8-32 × 1/2 pan head', onHand: 10, location: 'Hardware drawer 2' }, unstocked: null, shortBy: 14, drawn: 0, toDraw: 24 },
      { description: 'B-0999', kind: 'other', diameter32: null, grip: null, lines: [], estimated: 4, withWaste: 4, bin: null, unstocked: 'No bin has the code B-0999.', shortBy: 4, drawn: 0, toDraw: 4 },
    ]);
  });

  test('tallies what was drawn for the assembly, net of returns and reversals, and nothing drawn for other work', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    const id = await newAssembly(member, { lines: [twentyInchLine(blind(4, '5056'))] });
    const first = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 15, assemblyId: id });
    await post(member, `/api/bins/${bin.code}/draw`, { quantity: 10, assemblyId: id });
    await post(member, `/api/bins/${bin.code}/return`, { quantity: 3, assemblyId: id });
    await post(member, `/api/bins/${bin.code}/draw`, { quantity: 40 }); // other work
    await post(qm, `/api/bins/${bin.code}/ledger/${first.body.id}/reverse`, { note: 'drawn twice' });

    const e = await estimateOf(member, id);
    expect(billFor(e, 2)).toMatchObject({ bin: { code: bin.code, onHand: 500 - 10 + 3 - 40 }, drawn: 10 - 3 });
  });

  test('counts a line short only by what is still to draw: what was drawn for the assembly is no longer needed from the bin', async ({ qm, member }) => {
    const screws = await addBinAs(qm, { kind: 'screw', name: 'Screw #6-32 × 3/8 pan head', unitCost: 0.2, initialQuantity: 30, location: 'Hardware drawer 3' });
    const id = await newAssembly(member, { lines: [], extraItems: [{ binCode: screws.code, quantity: 40 }] });
    expect((await estimateOf(member, id)).bill[0]).toMatchObject({ withWaste: 40, drawn: 0, shortBy: 10 });
    await post(member, `/api/bins/${screws.code}/draw`, { quantity: 25, assemblyId: id });
    // 25 drawn, 15 still to draw, 5 on hand: short by 10 (not 40 − 5 = 35).
    expect((await estimateOf(member, id)).bill[0]).toMatchObject({ withWaste: 40, drawn: 25, toDraw: 15, shortBy: 10, bin: expect.objectContaining({ onHand: 5 }) });
    await post(member, `/api/bins/${screws.code}/draw`, { quantity: 5, assemblyId: id });
    await post(qm, `/api/bins/${screws.code}/receive`, { quantity: 20 });
    // 30 drawn, 10 still to draw, 20 on hand: nothing short.
    expect((await estimateOf(member, id)).bill[0]).toMatchObject({ drawn: 30, shortBy: 0 });
  });
});

describe('the crib kit', () => {
  /** 5/32 blind rivets: 60 in, 0.5 in from each end, 1 in pitch → ⌈59⌉ + 1 = 60 holes; ⌈60/3⌉ = 20 temporary fasteners per drill step. */
  const sixtyHoles = { label: 'Skin lap', length: 60, pitch: 1, edgeDistance: 0.5, stack: [0.04, 0.04], structural: true, rivet: blind(5, '5056') };
  const short = (k: KitItem) => [k.role, k.need, k.count, k.tool?.code ?? null, k.note];

  test('picks the puller that carries the nosepiece, a bit per drill step, trays that hold the count, a deburring tool', async ({ member, crib }) => {
    const c = await crib();
    const e = await estimateOf(member, await newAssembly(member, { lines: [sixtyHoles] }));
    expect(e.totals.tempFasteners).toEqual({ '3/32': 20, '1/8': 20, '5/32': 20 });
    expect(e.kit.map(short)).toEqual([
      ['puller', 'Rivet puller for 5/32 in blind rivets', null, c.puller532.code, null],
      ['nosepiece', 'Nosepiece 5/32 in', null, c.puller532.code, null],
      ['drill_bit', 'Drill bit #40', 60, c.bit40.code, null],
      ['drill_bit', 'Drill bit #30', 60, c.bit30.code, 'all on loan'],
      ['drill_bit', 'Drill bit #20', 60, null, 'none in the crib'],
      ['temporary_fastener_tray', 'Temporary fasteners 3/32 in', 20, null, 'none in the crib'],
      ['temporary_fastener_tray', 'Temporary fasteners 1/8 in', 20, c.tray18.code, null],
      // 12 + 12 = 24 hold the 20; the tray of 10 stays on the shelf.
      ['temporary_fastener_tray', 'Temporary fasteners 5/32 in, tray 1 of 2', 20, c.trayA.code, null],
      ['temporary_fastener_tray', 'Temporary fasteners 5/32 in, tray 2 of 2', 20, c.trayB.code, null],
      ['deburring_tool', 'Deburring tool', null, c.deburr.code, 'all on loan'],
    ]);
    // The category tells the client which tool cautions the kit shows.
    expect(e.kit[3]!.tool).toEqual({ code: c.bit30.code, name: 'Drill bit #30', status: 'on_loan', category: 'drill_bit' });
  });

  test('picks a rivet gun with the set for each head, and a bucking bar', async ({ qm, member }) => {
    const plain = await addToolAs(qm, { name: 'Rivet gun, 2X', category: 'rivet_gun', accessories: ['Universal-head rivet set'] });
    const both = await addToolAs(qm, { name: 'Rivet gun, 3X', category: 'rivet_gun', accessories: ['Universal-head rivet set', 'Flush set'] });
    const bar = await addToolAs(qm, { name: 'Bucking bar, steel', category: 'bucking_bar' });
    const solid = (diameter32: number, head: string) => ({ length: 12, pitch: 1, stack: [0.032, 0.032], rivet: { kind: 'solid', head, diameter32, material: '2117-T4' } });
    const e = await estimateOf(member, await newAssembly(member, { lines: [solid(4, 'dome'), solid(3, 'countersunk')] }));
    expect(e.kit.slice(0, 4).map(short)).toEqual([
      ['rivet_gun', 'Rivet gun for 3/32, 1/8 in solid rivets', null, both.code, null],
      ['rivet_set', 'Universal-head rivet set for 1/8 in', null, both.code, null],
      ['rivet_set', 'Flush rivet set for 3/32 in', null, both.code, null],
      ['bucking_bar', 'Bucking bar', null, bar.code, null],
    ]);
    expect(e.kit.slice(0, 4).map((k) => k.tool?.category)).toEqual(['rivet_gun', 'rivet_gun', 'rivet_gun', 'bucking_bar']);
    expect(plain.code).not.toBe(both.code);
  });

  describe('flush heads: countersink cutters and dimple dies by rivet size', () => {
    const flush = (diameter32: number, stack: number[]) => ({ length: 12, pitch: 1, stack, rivet: { kind: 'solid', head: 'countersunk', diameter32, material: '2117-T4' } });
    // 1/8 in over a 0.050 in top sheet: at the 0.050 in minimum, countersunk; final drill #30 is the pilot.
    // 3/32 in over 0.025 in, then 0.032 in: both below the 0.040 in minimum, nested dimples (TM 9-2320-363-34-2 minimum gage).
    const flushLines = [flush(4, [0.05, 0.04]), flush(3, [0.025, 0.032])];
    const flushItems = (e: AssemblyEstimate) => e.kit.filter((k) => k.role === 'countersink_cutter' || k.role === 'dimple_dies').map(short);

    test('picks the cutter of the rivet size with the line’s final drill as its pilot, and the dies of the size, free ones first', async ({ t, qm, member, otherMember }) => {
      const cutter = await addToolAs(qm, { name: '100° countersink cutter, 1/8 in', category: 'countersink_cutter', rivetDiameter32: 4, drillSize: '#30' });
      // Wrong pilot, wrong size: never picked for this line.
      await addToolAs(qm, { name: '100° countersink cutter, 1/8 in, #40 pilot', category: 'countersink_cutter', rivetDiameter32: 4, drillSize: '#40' });
      await addToolAs(qm, { name: '100° countersink cutter, 3/32 in', category: 'countersink_cutter', rivetDiameter32: 3, drillSize: '#30' });
      const lentDies = await addToolAs(qm, { name: '100° dimple dies, 3/32 in', category: 'dimple_dies', rivetDiameter32: 3 });
      const freeDies = await addToolAs(qm, { name: '100° dimple dies, 3/32 in', category: 'dimple_dies', rivetDiameter32: 3 });
      await addToolAs(qm, { name: '100° dimple dies, 1/8 in', category: 'dimple_dies', rivetDiameter32: 4 });
      await lend(t, otherMember, lentDies.code, 7 * DAY_MS);
      const e = await estimateOf(member, await newAssembly(member, { lines: flushLines }));
      expect(e.lines.map((l) => l.flushPrep)).toEqual(['countersink', 'dimple']);
      expect(flushItems(e)).toEqual([
        ['countersink_cutter', '100° countersink cutter, 1/8 in, #30 pilot', null, cutter.code, null],
        ['dimple_dies', '100° dimple dies, 3/32 in', null, freeDies.code, null],
      ]);
      expect(e.kit.find((k) => k.role === 'dimple_dies')!.tool!.category).toBe('dimple_dies');

      // With the free dies on loan too, the lent pair is the pick and the kit says so.
      await lend(t, otherMember, freeDies.code, 7 * DAY_MS);
      const later = await estimateOf(member, await newAssembly(member, { lines: flushLines }));
      expect(flushItems(later)[1]).toEqual(['dimple_dies', '100° dimple dies, 3/32 in', null, lentDies.code, 'all on loan']);
    });

    test('says none in the crib when no cutter or dies of that size (or that pilot) is there', async ({ qm, member }) => {
      await addToolAs(qm, { name: '100° countersink cutter, 1/8 in, #40 pilot', category: 'countersink_cutter', rivetDiameter32: 4, drillSize: '#40' });
      await addToolAs(qm, { name: '100° countersink cutter, 5/32 in', category: 'countersink_cutter', rivetDiameter32: 5, drillSize: '#30' });
      await addToolAs(qm, { name: '100° dimple dies, 1/8 in', category: 'dimple_dies', rivetDiameter32: 4 });
      const e = await estimateOf(member, await newAssembly(member, { lines: flushLines }));
      expect(flushItems(e)).toEqual([
        ['countersink_cutter', '100° countersink cutter, 1/8 in, #30 pilot', null, null, 'none in the crib'],
        ['dimple_dies', '100° dimple dies, 3/32 in', null, null, 'none in the crib'],
      ]);
    });
  });

  test('holds the kit: free tools are set aside, tools someone else has are queued for, and it says why it skipped the rest', async ({ t, member, crib }) => {
    const c = await crib();
    const id = await newAssembly(member, { lines: [sixtyHoles] });
    const res = await post(member, `/api/assemblies/${id}/kit/holds`);
    expect(res.status).toBe(201);
    const result = kitHoldsResultSchema.strict().parse(res.body);
    expect(result.placed.map((p) => p.code)).toEqual([c.puller532.code, c.bit40.code, c.bit30.code, c.tray18.code, c.trayA.code, c.trayB.code]);
    expect(result.skipped).toEqual([{ code: c.deburr.code, reason: `You have ${c.deburr.code} on loan already.` }]);
    const count = (status: string) => (t.db.$client.prepare('select count(*) as n from holds where status = ?').get(status) as { n: number }).n;
    expect(count('waiting')).toBe(1);
    expect(count('offered')).toBe(5);
    const held = t.db.$client.prepare("select count(*) as n from tools where status = 'held'").get() as { n: number };
    expect(held.n).toBe(5);

    // Asking again holds nothing new: the kit now picks the tools set aside for this member.
    const again = await post(member, `/api/assemblies/${id}/kit/holds`);
    expect(again.body.placed).toEqual([]);
    expect(again.body.skipped).toContainEqual({ code: c.bit30.code, reason: `You are already in the queue for ${c.bit30.code}.` });
    expect(again.body.skipped).toContainEqual({ code: c.tray18.code, reason: `Already held for you: ${c.tray18.code}.` });
    const kit = (await member.agent.get(`/api/assemblies/${id}/estimate`)).body.kit as { tool: { code: string; status: string } | null; note: string | null }[];
    expect(kit.find((k) => k.tool?.code === c.puller532.code)).toMatchObject({ tool: { status: 'held_for_you' }, note: null });
  });
});

describe('/api/me/preferences', () => {
  test('keeps each person’s length unit', async ({ member, otherMember }) => {
    expect((await member.agent.get('/api/me/preferences')).body).toEqual({ preferredUnit: 'in' });
    const changed = await patch(member, '/api/me/preferences', { preferredUnit: 'mm' });
    expect(changed.status).toBe(200);
    expect(changed.body).toEqual({ preferredUnit: 'mm' });
    expect((await member.agent.get('/api/me/preferences')).body).toEqual({ preferredUnit: 'mm' });
    expect((await otherMember.agent.get('/api/me/preferences')).body).toEqual({ preferredUnit: 'in' });
    const bad = await patch(member, '/api/me/preferences', { preferredUnit: 'cm' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].message).toBe('Choose in or mm.');
  });
});
