import { describe, expect } from 'vitest';
import { assemblyEstimateSchema, type AssemblyEstimate } from '@shared/schemas/builds';
import { SOFT_RIVET_CAUTION } from '@shared/safety/estimate-cautions';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

const rivet = (diameter32: number, kind = 'blind-structural') => ({ kind, head: 'dome', diameter32, material: '5056' });

/** The member's estimate of a new assembly with these lines on a new build with these settings. */
const test = crewTest.extend('estimateFor', ({ member }) => async (build: object, lines: object[]): Promise<AssemblyEstimate> => {
  const b = await post(member, '/api/builds', { name: 'Two-seat kit', ...build });
  const a = await post(member, `/api/builds/${b.body.id}/assemblies`, { name: 'Rudder', unit: 'in', lines });
  expect(a.status).toBe(201);
  const res = await member.agent.get(`/api/assemblies/${a.body.id}/estimate`);
  expect(res.status).toBe(200);
  return assemblyEstimateSchema.strict().parse(res.body);
});

describe('the assembly estimate carries rules and cautions', () => {
  test('says the build’s edge floor set the edge distance, with the rules of every other number and the chapter’s waste', async ({ estimateFor }) => {
    // 1/8 in blind rivet: 2D = 0.25 in; the build's floor of 0.375 in is larger, so it sets the edge.
    const e = await estimateFor({ edgeFloorIn: 0.375 }, [{ length: 20, pitch: 1, stack: [0.032, 0.032], rivet: rivet(4) }]);
    expect(e.lines[0]!.edgeDistance).toBe(0.375);
    const edge = e.lines[0]!.rules.find((r) => r.value === 'edgeDistance')!;
    expect(edge.rule).toContain('build’s edge distance floor');
    expect(e.lines[0]!.rules.map((r) => r.value)).toEqual(['edgeDistance', 'pitch', 'holesPerRow', 'holes', 'grip', 'drillSequence', 'tempFasteners', 'diameter']);
    expect(e.totals.rules.find((r) => r.value === 'rivetsWithWaste')!.rule).toContain('chapter’s waste allowance of 5 %');
    expect(e.cautions).not.toContain(SOFT_RIVET_CAUTION);
    expect(e.cautions.join(' ')).toContain('licensed mechanic or inspector');
  });

  test('names the bin’s own hole drill when a bin overrides the final drill, and adds the soft blind rivet caution', async ({ qm, estimateFor }) => {
    await addBinAs(qm, blindRivetBin({ diameter32: 5, holeDrill: '#21' }));
    const e = await estimateFor({}, [
      { length: 20, pitch: 1, edgeDistance: 0.375, stack: [0.032, 0.032], rivet: rivet(5) },
      { length: 10, pitch: 1, stack: [0.032, 0.032], rivet: rivet(4, 'blind-general') },
    ]);
    expect(e.lines[0]!.drillSequence).toEqual(['#40', '#30', '#21']);
    expect(e.lines[0]!.rules.find((r) => r.value === 'drillSequence')).toMatchObject({ rule: expect.stringContaining('bin’s own hole drill, #21'), source: 'common practice; the bin’s hole drill' });
    expect(e.lines[1]!.rules.find((r) => r.value === 'drillSequence')!.rule).not.toContain('bin’s own');
    expect(e.cautions).toContain(SOFT_RIVET_CAUTION);
  });

  test('keeps the cautions when a line is refused', async ({ estimateFor }) => {
    const e = await estimateFor({}, [{ length: 20, pitch: 0.2, stack: [0.032], rivet: rivet(4, 'blind-general') }]);
    expect(e.errors).toHaveLength(1);
    expect(e.cautions).toContain(SOFT_RIVET_CAUTION);
  });
});
