import { describe, expect } from 'vitest';
import { estimateResponseSchema } from '@shared/schemas/estimate';
import { CERTIFICATED_CAUTION, DRILLING_CAUTION, PLANS_GOVERN_CAUTION, SOFT_RIVET_CAUTION } from '@shared/safety/estimate-cautions';
import { post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

const blind = { kind: 'blind-structural', head: 'dome', diameter32: 5 };
type Rule = { value: string; rule: string; source: string };
const ruleOf = (rules: Rule[], value: string) => rules.find((r) => r.value === value);

describe('POST /api/estimate: every number with its rule and source', () => {
  crewTest('says why a flush line is dimpled or countersunk, why a solid rivet has its shop head, and why a repair line is one size up', async ({ member }) => {
    // 1/8 in countersunk rivets: minimum sheet 0.050 in for a 100° machine countersink (TM 9-2320-363-34-2).
    const flush = (top: number, extra: object = {}) => ({ length: 12, pitch: 1, stack: [top, 0.063], rivet: { kind: 'solid', head: 'countersunk', diameter32: 4 }, ...extra });
    const res = await post(member, '/api/estimate', { unit: 'in', lines: [flush(0.032), flush(0.063), flush(0.032, { flushPrep: 'countersink' }), flush(0.063, { repair: true })] });
    expect(res.status).toBe(200);
    const [dimpled, countersunk, given, repair] = res.body.lines as { flushPrep: string; rules: Rule[] }[];
    expect(dimpled!.flushPrep).toBe('dimple');
    expect(ruleOf(dimpled!.rules, 'flushPrep')).toMatchObject({ rule: expect.stringMatching(/^Dimple/), source: 'TM 9-2320-363-34-2' });
    expect(countersunk!.flushPrep).toBe('countersink');
    expect(ruleOf(countersunk!.rules, 'flushPrep')!.rule).toMatch(/^Machine countersink/);
    // The plans' countersink on a 0.032 in sheet stays, with its rule saying it was given, and warns of a knife edge.
    expect(ruleOf(given!.rules, 'flushPrep')!.rule).toMatch(/as given on the line/);
    // Shop head 1.5D × 0.5D (FAA-H-8083-31), on every solid line.
    expect(ruleOf(countersunk!.rules, 'shopHead')!.source).toBe('FAA-H-8083-31');
    expect(ruleOf(repair!.rules, 'repair')!.rule).toMatch(/next diameter up/);
    expect(ruleOf(countersunk!.rules, 'repair')).toBeUndefined();
    // The repair line is worked at 5/32 in: its countersunk edge rule is 2.5D of 5/32 in.
    expect(ruleOf(repair!.rules, 'edgeDistance')!.rule).toBe('2.5D, countersunk head');
  });

  crewTest('names each value of a one-line estimate with its rule and a published source or common practice', async ({ member }) => {
    // 20 in, 1 in target pitch, 5/32 in structural blind rivets, edge left to the rule (2D = 0.3125 in).
    const res = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 20, pitch: 1, stack: [0.032, 0.032], rivet: blind }] });
    expect(res.status).toBe(200);
    expect(estimateResponseSchema.strict().parse(res.body)).toBeTruthy();
    const rules: Rule[] = res.body.lines[0].rules;
    expect(rules.map((r) => r.value)).toEqual(['edgeDistance', 'pitch', 'holesPerRow', 'holes', 'grip', 'drillSequence', 'tempFasteners', 'diameter']);
    for (const r of rules) {
      expect(r.rule.length, r.value).toBeGreaterThan(5);
      expect(r.source.length, r.value).toBeGreaterThan(5);
    }
    // Edge distance at least 2D (AC 43.13-1B ch. 4; TM 10-5410-229-13&P para 5-6).
    expect(ruleOf(rules, 'edgeDistance')).toEqual({ value: 'edgeDistance', rule: '2D, protruding head', source: 'AC 43.13-1B ch. 4; TM 10-5410-229-13&P para 5-6' });
    // Pitch at least 3D; the chapter's maximum (10D by default) and both published maxima, 8D and 10D.
    expect(ruleOf(rules, 'pitch')!.rule).toMatch(/at least 3D, at most the chapter’s 10D; published maxima 8D \(NAVEDTRA 14018 ch\. 13\) and 10D \(FAA-derived sources, secondary\)/);
    expect(ruleOf(rules, 'pitch')!.source).toContain('NAVEDTRA 14018 ch. 13');
    expect(ruleOf(rules, 'holesPerRow')).toMatchObject({ rule: expect.stringContaining('n = ⌈(L − 2e) / p⌉ + 1'), source: 'common practice' });
    // Blind grip bands: TM 10-5410-221-14/1 Table 4-3.
    expect(ruleOf(rules, 'grip')!.source).toBe('TM 10-5410-221-14/1 Table 4-3');
    expect(ruleOf(rules, 'drillSequence')!.source).toBe('common practice; final drill TM 10-5410-221-14/1 Table 4-3');
    expect(ruleOf(rules, 'tempFasteners')!.source).toBe('common practice; sizes NAVEDTRA 14315');
    // One row: no transverse pitch, so no rule for it.
    expect(ruleOf(rules, 'transversePitch')).toBeUndefined();
    // Waste on the totals: the chapter's setting, 5 % unless changed.
    expect(ruleOf(res.body.totals.rules, 'rivetsWithWaste')).toMatchObject({ rule: expect.stringContaining('chapter’s waste allowance of 5 %') });
  });

  crewTest('gives a countersunk line 2.5D, a solid rivet its length rule, rows their transverse pitch, and the request’s waste', async ({ member }) => {
    const res = await post(member, '/api/estimate', {
      unit: 'mm',
      wastePercent: 8,
      lines: [
        { length: 300, pitch: 20, rows: 2, rowPattern: 'staggered', stack: [1, 1], rivet: { kind: 'solid', head: 'countersunk', diameter32: 4, material: '2117-T4' } },
        { length: 300, holesPerRow: 12, rows: 2, rowSpacing: 10, edgeDistance: 8, stack: [1, 1], rivet: blind },
      ],
    });
    expect(res.status).toBe(200);
    const [solid, given] = res.body.lines as { rules: Rule[] }[];
    // Countersunk: 2.5D (FAA-H-8083-31).
    expect(ruleOf(solid!.rules, 'edgeDistance')).toEqual({ value: 'edgeDistance', rule: '2.5D, countersunk head', source: 'FAA-H-8083-31' });
    // Solid length: grip + 1.5D, next 1/16 (NAVEDTRA 14018 ch. 13; TM 10-5410-229-13&P).
    expect(ruleOf(solid!.rules, 'grip')).toMatchObject({ rule: 'L = grip + 1.5D, rounded up to the next 1/16 in', source: 'NAVEDTRA 14018 ch. 13; TM 10-5410-229-13&P' });
    expect(ruleOf(solid!.rules, 'drillSequence')!.source).toBe('common practice; final drill FAA-H-8083-31 ch. 4');
    expect(ruleOf(solid!.rules, 'holes')!.rule).toContain('one fewer in every second row');
    expect(ruleOf(solid!.rules, 'transversePitch')!.rule).toBe('75 % of the pitch, and at least 2.5D');
    // Given values say so, and what they were checked against.
    expect(ruleOf(given!.rules, 'edgeDistance')!.rule).toMatch(/^Given on the line, checked against 2D \(protruding head\)/);
    expect(ruleOf(given!.rules, 'holesPerRow')!.rule).toMatch(/^Given on the line/);
    expect(ruleOf(given!.rules, 'transversePitch')).toMatchObject({ rule: 'Given on the line, checked against 2.5D', source: 'TM 10-5410-229-13&P' });
    expect(ruleOf(res.body.totals.rules, 'rivetsWithWaste')!.rule).toContain('8 % sent with the lines');
  });

  crewTest('always carries the plans, approved data and drilling cautions, and the soft blind rivet one when a line has a general-purpose blind rivet', async ({ member }) => {
    const line = { length: 20, pitch: 1, stack: [0.032, 0.032], rivet: blind };
    const plain = await post(member, '/api/estimate', { unit: 'in', lines: [line] });
    expect(plain.body.cautions).toEqual([PLANS_GOVERN_CAUTION, CERTIFICATED_CAUTION, DRILLING_CAUTION]);
    expect(plain.body.cautions.join(' ')).toMatch(/kit’s plans and the rivet maker’s instructions govern/);
    expect(plain.body.cautions.join(' ')).toMatch(/certificated aircraft, use approved data.*licensed mechanic or inspector/);
    expect(plain.body.cautions.join(' ')).toMatch(/clamp the work.*chips.*deburr both sides.*eye protection/);
    const soft = await post(member, '/api/estimate', { unit: 'in', lines: [line, { ...line, rivet: { ...blind, kind: 'blind-general' } }] });
    expect(soft.status).toBe(200);
    expect(soft.body.cautions).toContain(SOFT_RIVET_CAUTION);
    expect(soft.body.cautions).toHaveLength(4);
  });
});
