import { describe, expect } from 'vitest';
import { estimateResponseSchema } from '@shared/schemas/estimate';
import { post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

const rivet = { kind: 'blind-structural', head: 'dome', diameter32: 5 };

describe('POST /api/estimate', () => {
  crewTest('answers the contract for two lines, in inches', async ({ member }) => {
    const res = await post(member, '/api/estimate', {
      unit: 'in',
      lines: [
        { length: 20, pitch: 1, edgeDistance: 0.375, stack: [0.032, 0.032], structural: true, rivet },
        { length: 12, holesPerRow: 11, rows: 2, stack: [0.025, 0.04], rivet: { kind: 'solid', head: 'countersunk', diameter32: 4, material: '2117-T4' } },
      ],
    });
    expect(res.status).toBe(200);
    expect(estimateResponseSchema.strict().parse(res.body)).toBeTruthy();
    // Worked check (our own arithmetic from the hole-count rule): 20 in, e 0.375, p 1.0 → 21 holes at 0.9625 in.
    const { rules: _rules, ...first } = res.body.lines[0];
    expect(first).toEqual({
      holesPerRow: 21,
      holes: 21,
      pitch: 0.9625,
      edgeDistance: 0.375,
      grip: 2,
      drillSequence: ['#40', '#30', '#20'],
      tempFasteners: { '3/32': 7, '1/8': 7, '5/32': 7 },
      // 3 × 0.032 in = 0.096 in: 3/32 or 1/8 in (AC 43.13-1B para 4-58g), so 5/32 in is large.
      warnings: [{ code: 'DIAMETER_LARGE_FOR_SHEET', message: 'A 5/32 in rivet is large for a 0.032 in sheet: about 3 × the thickest sheet is 0.096 in, so 3/32 in or 1/8 in.' }],
      flushPrep: null,
      shopHead: null,
      halfLength: null,
    });
    // Solid 1/8 countersunk: e = 2.5D = 0.3125 in; 11 holes over 11.375 in → 1.1375 in; grip 0.065 + 0.1875 = 0.2525 in → 5/16,
    // and the half length −4.5 (0.28125 in) fits. Top sheet 0.025 in is below the 0.050 in countersink minimum: dimpled.
    expect(res.body.lines[1]).toMatchObject({
      holesPerRow: 11,
      holes: 22,
      pitch: 1.1375,
      edgeDistance: 0.3125,
      grip: 5,
      drillSequence: ['#40', '#30'],
      flushPrep: 'dimple',
      shopHead: { width: 0.1875, height: 0.0625 },
      halfLength: 4.5,
      warnings: [],
    });
    // The chapter's default waste of 5 %: 21 → ⌈22.05⌉ = 23, 22 → ⌈23.1⌉ = 24.
    const { rules: _totalsRules, ...totals } = res.body.totals;
    expect(totals).toEqual({
      rivets: 43,
      rivetsWithWaste: 47,
      drillHoles: { '#40': 43, '#30': 43, '#20': 21 },
      // Reused from line to line (common practice): per size the larger of the two lines, 7 and 8.
      tempFasteners: { '3/32': 8, '1/8': 8, '5/32': 7 },
    });
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(['DIAMETER_LARGE_FOR_SHEET']);
  });

  crewTest('lays out staggered rows with their transverse pitch, and warns on a row spacing below 2.5D', async ({ member }) => {
    // 1/8 in blind rivets, 20.5 in line, edge 2D = 0.25 in → 21 holes a row at 1 in (our own arithmetic).
    const rows = { length: 20.5, pitch: 1, rows: 2, stack: [0.032, 0.032], rivet: { ...rivet, diameter32: 4 } };
    const res = await post(member, '/api/estimate', {
      unit: 'in',
      wastePercent: 0,
      lines: [
        // Staggered by half a pitch (FAA-H-8083-31, secondary): 21 + 20 = 41 holes; rows 75 % of 1 in = 0.75 in apart.
        { ...rows, rowPattern: 'staggered' },
        // Given 0.25 in: below 2.5D = 0.3125 in (TM 10-5410-229-13&P), kept but warned.
        { ...rows, rowPattern: 'inline', rowSpacing: 0.25 },
      ],
    });
    expect(res.status).toBe(200);
    expect(estimateResponseSchema.strict().parse(res.body)).toBeTruthy();
    expect(res.body.lines[0]).toMatchObject({ holesPerRow: 21, holes: 41, pitch: 1, transversePitch: 0.75, warnings: [] });
    expect(res.body.lines[1]).toMatchObject({ holes: 42, transversePitch: 0.25 });
    expect(res.body.warnings).toEqual([
      { code: 'TRANSVERSE_PITCH_BELOW_MINIMUM', message: 'Line 2: Row spacing 0.25 in is below the published minimum of 2.5D = 0.3125 in for a 1/8 in rivet.' },
    ]);
    expect(res.body.totals.rivets).toBe(83);
    const bad = await post(member, '/api/estimate', { unit: 'in', lines: [{ ...rows, rowPattern: 'zigzag' }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toContain('inline or staggered');
  });

  crewTest('reports warnings at the line and at the top', async ({ member }) => {
    const res = await post(member, '/api/estimate', { unit: 'mm', wastePercent: 0, lines: [{ length: 300, holesPerRow: 3, edgeDistance: 5, stack: [1, 1], rivet }] });
    expect(res.status).toBe(200);
    // 1 mm sheets: 3t = 0.118 in, 3/32 or 1/8 in, so the 5/32 in rivet is large too.
    const expected = ['DIAMETER_LARGE_FOR_SHEET', 'EDGE_BELOW_MINIMUM', 'PITCH_ABOVE_MAXIMUM'];
    expect(res.body.lines[0].warnings.map((w: { code: string }) => w.code)).toEqual(expected);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(expected);
    expect(res.body.lines[0].pitch).toBe(145);
    expect(res.body.totals.rivetsWithWaste).toBe(3);
  });

  crewTest.for([
    ['PITCH_BELOW_MINIMUM', { length: 20, pitch: 0.2, stack: [0.04], rivet }],
    ['LINE_TOO_SHORT', { length: 0.6, pitch: 1, stack: [0.04], rivet }],
    ['SOFT_RIVET_ON_STRUCTURE', { length: 20, pitch: 1, stack: [0.04], structural: true, rivet: { ...rivet, kind: 'blind-general' } }],
  ] as const)('refuses impossible input with 400 %s', async ([code, bad], { member }) => {
    const res = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 10, pitch: 1, stack: [0.04], rivet }, bad] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe(code);
    expect(res.body.error.message).toMatch(/^Line 2: /);
    expect(res.body.error.issues[0].path).toBe('lines.1');
  });

  describe('builder rules', () => {
    const solid = (diameter32: number, head = 'dome') => ({ kind: 'solid', head, diameter32, material: '2117-T4' });

    crewTest('flush heads: countersinks at the minimum gage, dimples below it, keeps the plans’ choice and warns of a knife edge (TM 9-2320-363-34-2)', async ({ member }) => {
      const flush = { length: 20, pitch: 1, rivet: solid(4, 'countersunk') };
      const res = await post(member, '/api/estimate', {
        unit: 'in',
        lines: [
          // 1/8 in: minimum 0.050 in. 0.050 in top sheet → countersink; 0.040 in → dimple.
          { ...flush, stack: [0.05, 0.04] },
          { ...flush, stack: [0.04, 0.04] },
          // The plans ask for a countersink in 0.032 in: kept, with the knife-edge warning.
          { ...flush, stack: [0.032, 0.032], flushPrep: 'countersink' },
          { length: 20, pitch: 1, stack: [0.032, 0.032], rivet },
        ],
      });
      expect(res.status).toBe(200);
      expect(estimateResponseSchema.strict().parse(res.body)).toBeTruthy();
      expect(res.body.lines.map((l: { flushPrep: string | null }) => l.flushPrep)).toEqual(['countersink', 'dimple', 'countersink', null]);
      expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('COUNTERSINK_KNIFE_EDGE');
      const onDome = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 20, pitch: 1, stack: [0.04], flushPrep: 'dimple', rivet }] });
      expect(onDome.status).toBe(400);
      expect(onDome.body.error.message).toContain('only for countersunk heads');
      const badPrep = await post(member, '/api/estimate', { unit: 'in', lines: [{ ...flush, stack: [0.04], flushPrep: 'drill' }] });
      expect(badPrep.status).toBe(400);
      expect(badPrep.body.error.message).toContain('countersink or dimple');
    });

    crewTest('diameter against the thickest sheet: warns outside the sizes bracketing 3t, refuses below t on a structural line (AC 43.13-1B para 4-58g; NAVEDTRA 14018)', async ({ member }) => {
      // 0.063 in: 3t = 0.189 in → 3/16 or 1/4 in; 1/8 in is small.
      const small = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 20, pitch: 1, stack: [0.063], rivet: { ...rivet, diameter32: 4 } }] });
      expect(small.status).toBe(200);
      expect(small.body.warnings).toEqual([
        { code: 'DIAMETER_SMALL_FOR_SHEET', message: 'Line 1: A 1/8 in rivet is small for a 0.063 in sheet: about 3 × the thickest sheet is 0.189 in, so 3/16 in or 1/4 in.' },
      ]);
      // 3/32 in (0.094 in) through a 0.125 in sheet on a structural line: refused.
      const thin = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 20, pitch: 1, stack: [0.125], structural: true, rivet: { ...rivet, diameter32: 3 } }] });
      expect(thin.status).toBe(400);
      expect(thin.body.error.code).toBe('DIAMETER_BELOW_SHEET_THICKNESS');
      expect(thin.body.error.message).toBe('Line 1: A 3/32 in rivet is thinner than the 0.125 in sheet: on a structural line the diameter must be at least the thickest sheet. Use a larger rivet.');
    });

    crewTest('solid rivets: the shop head beside the length and the half-length offer; null on blind lines (FAA-H-8083-31 ch. 4, secondary)', async ({ member }) => {
      const res = await post(member, '/api/estimate', {
        unit: 'mm',
        lines: [
          // 3/32 in = 2.38125 mm: shop head 3.571875 mm wide, 1.190625 mm high. Stack 1.6256 mm = 0.064 in:
          // 0.064 + 0.140625 = 0.204625 in → −4; −3.5 (0.21875 in) fits.
          { length: 500, pitch: 20, stack: [0.8128, 0.8128], rivet: solid(3) },
          { length: 500, pitch: 20, stack: [0.8128, 0.8128], rivet: { ...rivet, diameter32: 3 } },
        ],
      });
      expect(res.status).toBe(200);
      expect(res.body.lines[0]).toMatchObject({ grip: 4, halfLength: 3.5, shopHead: { width: 3.571875, height: 1.190625 } });
      expect(res.body.lines[1]).toMatchObject({ shopHead: null, halfLength: null });
    });

    crewTest('repair lines: the next diameter up, re-checked, and 1/4 in refused (common practice; AC 43.13-1B ch. 4 as restated)', async ({ member }) => {
      const res = await post(member, '/api/estimate', { unit: 'in', wastePercent: 0, lines: [{ length: 20, pitch: 1, stack: [0.05, 0.05], repair: true, rivet: { ...rivet, diameter32: 4 } }] });
      expect(res.status).toBe(200);
      expect(estimateResponseSchema.strict().parse(res.body)).toBeTruthy();
      // 5/32 in: edge 2D = 0.3125 in, span 19.375 in → 21 holes at 0.96875 in; final drill #20.
      expect(res.body.lines[0]).toMatchObject({ diameter32: 5, holes: 21, pitch: 0.96875, edgeDistance: 0.3125, drillSequence: ['#40', '#30', '#20'] });
      expect(res.body.warnings).toEqual([
        { code: 'REPAIR_NEXT_SIZE', message: 'Line 1: Repair: 1/8 in holes drilled out, 5/32 in rivets; edge distance and pitch re-checked for 5/32 in.' },
      ]);
      const none = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 20, pitch: 2, stack: [0.1], repair: true, rivet: solid(8) }] });
      expect(none.status).toBe(400);
      expect(none.body.error.code).toBe('NO_LARGER_DIAMETER');
      const notBool = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 20, pitch: 1, stack: [0.05], repair: 'yes', rivet }] });
      expect(notBool.status).toBe(400);
      expect(notBool.body.error.message).toContain('repair is true or false');
    });
  });

  crewTest('answers malformed bodies with 400 VALIDATION_FAILED in words, and needs a signed-in person', async ({ t, member }) => {
    const noPitch = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 10, stack: [0.04], rivet }] });
    expect(noPitch.status).toBe(400);
    expect(noPitch.body.error.code).toBe('VALIDATION_FAILED');
    expect(noPitch.body.error.message).toContain('Give a target pitch or the holes per row');
    const badDia = await post(member, '/api/estimate', { unit: 'in', lines: [{ length: 10, pitch: 1, stack: [0.04], rivet: { ...rivet, diameter32: 7 } }] });
    expect(badDia.status).toBe(400);
    const badUnit = await post(member, '/api/estimate', { unit: 'cm', lines: [] });
    expect(badUnit.status).toBe(400);
    const anon = await t.anonymous();
    expect((await post(anon, '/api/estimate', { unit: 'in', lines: [{ length: 10, pitch: 1, stack: [0.04], rivet }] })).status).toBe(401);
  });

  // Solid rivet heads: MS20470 universal and MS20426 100° countersunk (AC 43.13-1B para 4-57a;
  // NAVEDTRA 14315 Table 3-1); a large flange is a blind-rivet head.
  crewTest('refuses a solid rivet line with a large flange head: 400 naming the head, in words', async ({ member }) => {
    const line = (kind: string, head: string) => ({ length: 10, pitch: 1, stack: [0.04], rivet: { kind, head, diameter32: 4, material: '2117-T4' } });
    const res = await post(member, '/api/estimate', { unit: 'in', lines: [line('solid', 'dome'), line('solid', 'flange')] });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'lines.1.rivet.head', message: 'A solid rivet’s head is universal or 100° countersunk; large flange is a blind-rivet head.' }]);
    expect((await post(member, '/api/estimate', { unit: 'in', lines: [line('solid', 'countersunk'), line('blind-general', 'flange')] })).status).toBe(200);
  });
});
