import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { estimate, isEstimateErrors, type EstimateResult } from '@shared/estimate/estimate';
import { estimateLine, type LineEstimate, type RivetLineInput } from '@shared/estimate/estimate-line';
import { lengthWords } from '@shared/estimate/length-words';
import { drillSequence } from '@shared/estimate/rivet-rules';
import { blindGripRange } from '@shared/stock/fasteners';

const blind18: RivetLineInput['rivet'] = { kind: 'blind-structural', head: 'dome', diameter32: 4, material: '5056' };
const line = (over: Partial<RivetLineInput>): RivetLineInput => ({ length: 20, pitch: 1, stack: [0.032, 0.032], rivet: blind18, ...over });
const ok = (r: ReturnType<typeof estimateLine>): LineEstimate => {
  if ('error' in r) throw new Error(`${r.code}: ${r.message}`);
  return r;
};
const whole = (r: ReturnType<typeof estimate>): EstimateResult => {
  if (isEstimateErrors(r)) throw new Error(r.errors[0]!.message);
  return r;
};

describe('holes and pitch (common practice: end holes at the edge distance, the rest evenly spaced)', () => {
  it('gives 21 holes at 0.9625 in for L = 20 in, e = 0.375 in, p = 1.0 in (worked check, our own arithmetic)', () => {
    const r = ok(estimateLine(line({ edgeDistance: 0.375 }), { unit: 'in' }));
    expect(r).toMatchObject({ holesPerRow: 21, holes: 21, pitch: 0.9625, edgeDistance: 0.375 });
  });

  it('works the same in millimetres: 508 mm, e 9.525 mm, p 25.4 mm → 21 holes at 24.4475 mm', () => {
    const r = ok(estimateLine(line({ length: 508, edgeDistance: 9.525, pitch: 25.4, stack: [0.8128, 0.8128] }), { unit: 'mm' }));
    expect(r.holesPerRow).toBe(21);
    expect(r.pitch).toBeCloseTo(24.4475, 6);
    expect(r.grip).toBe(2);
  });

  it('uses an explicit hole count and multiplies by rows', () => {
    const r = ok(estimateLine(line({ pitch: undefined, holesPerRow: 11, rows: 2, edgeDistance: 0.5 }), { unit: 'in' }));
    expect(r).toMatchObject({ holesPerRow: 11, holes: 22, pitch: 1.9 });
  });
});

describe('rows: inline or staggered, spaced by the transverse pitch (FAA-H-8083-31, secondary; TM 10-5410-229-13&P: rows never less than 2 1/2 times the diameter)', () => {
  // 1/8 in rivet, default edge 2D = 0.25 in, 20.5 in line → span 20 in → 21 holes at exactly 1 in (our own arithmetic).
  const exact = (over: Partial<RivetLineInput>) => line({ length: 20.5, ...over });

  it('spaces two inline rows at 75 % of the actual pitch: 1/8 in rivets at 1 in pitch → 0.75 in', () => {
    const r = ok(estimateLine(exact({ rows: 2 }), { unit: 'in' }));
    expect(r).toMatchObject({ holesPerRow: 21, holes: 42, pitch: 1, transversePitch: 0.75 });
    expect(r.warnings).toEqual([]);
  });

  it('takes 75 % of the actual pitch, not the target: 20 in, e 0.375 in, target 1 in → 0.9625 in actual → 0.721875 in', () => {
    expect(ok(estimateLine(line({ edgeDistance: 0.375, rows: 2 }), { unit: 'in' })).transversePitch).toBe(0.721875);
  });

  it('never spaces rows closer than 2.5D: 1/8 in at 0.4 in pitch → 75 % is 0.3 in, 2.5D is 0.3125 in', () => {
    // 4.5 in line, e 0.25 in → span 4 in → 11 holes at 0.4 in (3.2D, above the 3D minimum).
    const r = ok(estimateLine(line({ length: 4.5, pitch: 0.4, rows: 3 }), { unit: 'in' }));
    expect(r).toMatchObject({ holesPerRow: 11, pitch: 0.4, transversePitch: 0.3125 });
  });

  it('staggers rows by half a pitch, one hole fewer in every second row: 21 per row → 21 + 20 = 41, three rows 21 + 20 + 21 = 62', () => {
    const two = ok(estimateLine(exact({ rows: 2, rowPattern: 'staggered' }), { unit: 'in' }));
    expect(two).toMatchObject({ holesPerRow: 21, holes: 41, pitch: 1, transversePitch: 0.75 });
    // Temporary fasteners every third hole (common practice): ⌈41/3⌉ = 14 per step.
    expect(two.tempFasteners).toEqual({ '3/32': 14, '1/8': 14 });
    expect(ok(estimateLine(exact({ rows: 3, rowPattern: 'staggered' }), { unit: 'in' })).holes).toBe(62);
    expect(ok(estimateLine(exact({ rows: 3, rowPattern: 'inline' }), { unit: 'in' })).holes).toBe(63);
  });

  it('uses a given row spacing as it is, and warns when it is below 2.5D: 0.25 in for 1/8 in (2.5D = 0.3125 in)', () => {
    expect(ok(estimateLine(exact({ rows: 2, rowSpacing: 0.5 }), { unit: 'in' }))).toMatchObject({ transversePitch: 0.5, warnings: [] });
    const r = ok(estimateLine(exact({ rows: 2, rowSpacing: 0.25 }), { unit: 'in' }));
    expect(r.transversePitch).toBe(0.25);
    expect(r.warnings).toEqual([
      { code: 'TRANSVERSE_PITCH_BELOW_MINIMUM', message: 'Row spacing 0.25 in is below the published minimum of 2.5D = 0.3125 in for a 1/8 in rivet.' },
    ]);
  });

  it('works in millimetres: 1/8 in = 3.175 mm, 2.5D = 7.94 mm; 25.4 mm pitch → 19.05 mm; 7 mm given warns', () => {
    const mm = (over: Partial<RivetLineInput>) => line({ length: 520.7, pitch: 25.4, stack: [0.8, 0.8], rows: 2, ...over });
    expect(ok(estimateLine(mm({}), { unit: 'mm' })).transversePitch).toBeCloseTo(19.05, 6);
    const r = ok(estimateLine(mm({ rowSpacing: 7 }), { unit: 'mm' }));
    expect(r.warnings.map((w) => w.message)).toEqual(['Row spacing 7 mm is below the published minimum of 2.5D = 7.94 mm for a 1/8 in rivet.']);
  });

  it('leaves a one-row line as it was: no transverse pitch, no row warning', () => {
    const r = ok(estimateLine(exact({ rowSpacing: 0.1, rowPattern: 'staggered' }), { unit: 'in' }));
    expect(r).not.toHaveProperty('transversePitch');
    expect(r).toMatchObject({ holes: 21, warnings: [] });
  });

  it('counts a staggered line in the totals and warns at the top with the line number', () => {
    const r = whole(estimate({ unit: 'in', wastePercent: 0, lines: [exact({}), exact({ rows: 2, rowPattern: 'staggered', rowSpacing: 0.25 })] }));
    expect(r.totals.rivets).toBe(62);
    expect(r.warnings.map((w) => w.message)).toEqual([expect.stringMatching(/^Line 2: Row spacing 0.25 in is below/)]);
  });
});

describe('edge distance', () => {
  it('defaults to 2D, 2.5D for countersunk heads (AC 43.13-1B ch. 4; FAA-H-8083-31)', () => {
    expect(ok(estimateLine(line({}), { unit: 'in' })).edgeDistance).toBe(0.25);
    expect(ok(estimateLine(line({ rivet: { ...blind18, head: 'countersunk' } }), { unit: 'in' })).edgeDistance).toBe(0.3125);
  });
  it('takes the build floor when larger (common practice: kit standards near 3/8 in)', () => {
    expect(ok(estimateLine(line({}), { unit: 'in', edgeFloorIn: 0.375 })).edgeDistance).toBe(0.375);
    expect(ok(estimateLine(line({ length: 508, pitch: 25.4, stack: [0.8, 0.8] }), { unit: 'mm', edgeFloorIn: 0.375 })).edgeDistance).toBeCloseTo(9.525, 6);
  });
  it('warns when a given edge distance is below the published minimum', () => {
    const r = ok(estimateLine(line({ edgeDistance: 0.2 }), { unit: 'in' }));
    expect(r.warnings.map((w) => w.code)).toEqual(['EDGE_BELOW_MINIMUM']);
  });
  it('warns when a given edge distance is above about 4D (FAA-H-8083-31 as restated, a secondary source): 1/8 in → 0.5 in', () => {
    expect(ok(estimateLine(line({ edgeDistance: 0.5 }), { unit: 'in' })).warnings).toEqual([]);
    const r = ok(estimateLine(line({ edgeDistance: 0.55 }), { unit: 'in' }));
    expect(r.warnings.map((w) => w.code)).toEqual(['EDGE_ABOVE_MAXIMUM']);
    expect(r.warnings[0]!.message).toBe('Edge distance 0.55 in is above the usual maximum of about 4D = 0.5 in for a 1/8 in rivet.');
    // 5/32 in rivet in millimetres: 4D = 15.875 mm. Sheets of 1.3 mm (0.051 in): 3t = 0.154 in, so 5/32 in suits them.
    const mm = ok(estimateLine(line({ length: 508, pitch: 25.4, stack: [1.3, 1.3], edgeDistance: 16, rivet: { ...blind18, diameter32: 5 } }), { unit: 'mm' }));
    expect(mm.warnings.map((w) => w.code)).toEqual(['EDGE_ABOVE_MAXIMUM']);
  });
});

describe('pitch limits (minimum 3D: AC 43.13-1B, NAVEDTRA 14018; maximum a setting, default 10D)', () => {
  it('refuses a pitch below 3D', () => {
    const r = estimateLine(line({ pitch: 0.3 }), { unit: 'in' });
    expect(r).toMatchObject({ error: true, code: 'PITCH_BELOW_MINIMUM' });
  });
  it('warns above the maximum, and the maximum follows the setting', () => {
    const wide = line({ length: 10, pitch: undefined, holesPerRow: 3, edgeDistance: 0.5 }); // pitch 4.5 in
    expect(ok(estimateLine(wide, { unit: 'in' })).warnings.map((w) => w.code)).toEqual(['PITCH_ABOVE_MAXIMUM']);
    expect(ok(estimateLine(line({ pitch: 1.1 }), { unit: 'in', maxPitchDiameters: 8 })).warnings.map((w) => w.code)).toEqual(['PITCH_ABOVE_MAXIMUM']);
    expect(ok(estimateLine(line({ pitch: 1.1 }), { unit: 'in' })).warnings).toEqual([]);
  });
  it('writes lengths in its cautions at the precision of the tables: inches to 0.0001, millimetres to 0.01', () => {
    const inches = ok(estimateLine(line({ length: 9.453125, pitch: undefined, holesPerRow: 3, edgeDistance: 0.5 }), { unit: 'in' })); // pitch 4.2265625 in
    expect(inches.warnings[0]!.message).toContain('The pitch of 4.2266 in is above');
    expect(lengthWords(inches.pitch, 'in')).toBe('4.2266 in');
    const mm = ok(estimateLine(line({ length: 240.1234, pitch: undefined, holesPerRow: 3, edgeDistance: 12.7, stack: [0.8, 0.8] }), { unit: 'mm' }));
    expect(mm.warnings[0]!.message).toContain('The pitch of 107.36 mm is above');
    expect(mm.warnings.map((w) => w.message).join(' ')).not.toMatch(/\d\.\d{3,} mm/);
  });
  it('says plainly when a line is too short for two holes', () => {
    const r = estimateLine(line({ length: 0.5 }), { unit: 'in' });
    expect(r).toMatchObject({ error: true, code: 'LINE_TOO_SHORT' });
    expect((r as { message: string }).message).toContain('too short for two holes');
  });
});

describe('grip', () => {
  it('picks the blind grip dash whose range covers the stack (TM 10-5410-221-14/1 Table 4-3)', () => {
    expect(ok(estimateLine(line({ stack: [0.032, 0.032] }), { unit: 'in' })).grip).toBe(2); // 0.064 in → −2 (0.063–0.125)
    expect(ok(estimateLine(line({ stack: [0.063, 0.063, 0.063] }), { unit: 'in' })).grip).toBe(4); // 0.189 in → −4 (0.188–0.250)
  });
  it('gives the solid rivet length dash: grip 0.050 in, D 1/8 → −4 (NAVEDTRA 14018 ch. 13)', () => {
    const solid = ok(estimateLine(line({ stack: [0.025, 0.025], rivet: { kind: 'solid', head: 'dome', diameter32: 4 } }), { unit: 'in' }));
    expect(solid.grip).toBe(4);
  });
  it('warns beyond the longest grip, naming it', () => {
    const r = ok(estimateLine(line({ stack: [0.25, 0.3] }), { unit: 'in' }));
    expect(r.grip).toBeNull();
    expect(r.warnings).toContainEqual({ code: 'STACK_BEYOND_LONGEST_GRIP', message: expect.stringContaining('−8') });
  });
});

describe('drill steps and temporary fasteners', () => {
  it('steps a 5/32 blind rivet #40 → #30 → #20 (common practice; TM 10-5410-221-14/1 hole ranges)', () => {
    expect(drillSequence('blind-structural', 5)).toEqual(['#40', '#30', '#20']);
  });
  it('steps a 3/16 solid rivet through the solid final drills #40 → #30 → #21 → #11 (FAA-H-8083-31 ch. 4)', () => {
    expect(drillSequence('solid', 6)).toEqual(['#40', '#30', '#21', '#11']);
    expect(drillSequence('solid', 3)).toEqual(['#40']);
    expect(drillSequence('solid', 8)).toEqual(['#40', '#30', '#21', '#11', 'F']);
  });
  it('takes a bin’s own hole drill as the last step', () => {
    expect(drillSequence('blind-structural', 6, '#10')).toEqual(['#40', '#30', '#20', '#10']);
  });
  it('needs ⌈holes/3⌉ temporary fasteners per step, by the step’s size (common practice: every third hole)', () => {
    const r = ok(estimateLine(line({ edgeDistance: 0.375, rivet: { ...blind18, diameter32: 5 } }), { unit: 'in' }));
    expect(r.holes).toBe(21);
    expect(r.drillSequence).toEqual(['#40', '#30', '#20']);
    expect(r.tempFasteners).toEqual({ '3/32': 7, '1/8': 7, '5/32': 7 });
  });
});

describe('the whole estimate', () => {
  it('sums lines, drills and fasteners, applies the waste to each need, rounded up, and counts temporary fasteners as reused', () => {
    const r = whole(
      estimate({
        unit: 'in',
        wastePercent: 5,
        lines: [line({ edgeDistance: 0.375 }), line({ edgeDistance: 0.375, rows: 2 }), line({ length: 10, edgeDistance: 0.5, rivet: { kind: 'solid', head: 'countersunk', diameter32: 3 } })],
      }),
    );
    // 21 + 42 blind 1/8 grip −2 = 63 → ⌈66.15⌉ = 67; solid 3/32: ⌈9/1⌉+1 = 10 holes → ⌈10.5⌉ = 11,
    // length 0.064 + 1.5 × 3/32 = 0.2046 in → next 1/16 up is 4/16 (our own arithmetic).
    expect(r.totals.rivets).toBe(73);
    expect(r.needs.map((n) => [n.kind, n.diameter32, n.grip, n.rivets, n.withWaste])).toEqual([
      ['blind-structural', 4, 2, 63, 67],
      ['solid', 3, 4, 10, 11],
    ]);
    expect(r.totals.rivetsWithWaste).toBe(78);
    expect(r.totals.drillHoles).toEqual({ '#40': 73, '#30': 63 });
    // Temporary fasteners come out of one line and go into the next (common practice): the kit needs
    // the most any one line needs, per size, not the sum: max(7, 14, 4) and max(7, 14).
    expect(r.totals.tempFasteners).toEqual({ '3/32': 14, '1/8': 14 });
    expect(r.nosepieces).toEqual([
      { kind: 'blind', diameter32: 4, head: 'dome' },
      { kind: 'solid', diameter32: 3, head: 'countersunk' },
    ]);
  });

  it('refuses a general-purpose blind rivet on a structural line, with the caution', () => {
    const r = estimate({ unit: 'in', lines: [line({}), line({ structural: true, rivet: { ...blind18, kind: 'blind-general' } })] });
    expect(isEstimateErrors(r)).toBe(true);
    if (!isEstimateErrors(r)) return;
    expect(r.errors).toEqual([expect.objectContaining({ code: 'SOFT_RIVET_ON_STRUCTURE', line: 1, message: expect.stringContaining('AC 43.13-1B') })]);
  });
});

describe('properties', () => {
  const lineArb = fc.record({
    length: fc.double({ min: 1, max: 200, noNaN: true }),
    pitch: fc.double({ min: 0.5, max: 3, noNaN: true }),
    diameter32: fc.constantFrom(3, 4, 5, 6),
    stack: fc.array(fc.double({ min: 0.016, max: 0.09, noNaN: true }), { minLength: 1, maxLength: 4 }),
  });

  it('a longer line never has fewer holes', () => {
    fc.assert(
      fc.property(lineArb, fc.double({ min: 0, max: 50, noNaN: true }), (l, extra) => {
        const rivet = { ...blind18, diameter32: l.diameter32 };
        const a = estimateLine({ ...l, rivet }, { unit: 'in' });
        const b = estimateLine({ ...l, length: l.length + extra, rivet }, { unit: 'in' });
        if ('error' in a || 'error' in b) return;
        expect(b.holesPerRow).toBeGreaterThanOrEqual(a.holesPerRow);
      }),
    );
  });

  it('the actual pitch never exceeds the target nor falls below 3D', () => {
    fc.assert(
      fc.property(lineArb, (l) => {
        const rivet = { ...blind18, diameter32: l.diameter32 };
        const r = estimateLine({ ...l, rivet }, { unit: 'in' });
        if ('error' in r) {
          expect(['PITCH_BELOW_MINIMUM', 'LINE_TOO_SHORT']).toContain(r.code);
          return;
        }
        expect(r.pitch).toBeLessThanOrEqual(l.pitch + 1e-9);
        expect(r.pitch).toBeGreaterThanOrEqual((3 * l.diameter32) / 32 - 1e-9);
      }),
    );
  });

  const rowsArb = fc.integer({ min: 2, max: 20 });

  it('staggered rows never have more holes than the same rows inline (one fewer in every second row)', () => {
    fc.assert(
      fc.property(lineArb, rowsArb, (l, rows) => {
        const rivet = { ...blind18, diameter32: l.diameter32 };
        const inline = estimateLine({ ...l, rows, rivet }, { unit: 'in' });
        const staggered = estimateLine({ ...l, rows, rowPattern: 'staggered', rivet }, { unit: 'in' });
        if ('error' in inline || 'error' in staggered) return;
        expect(staggered.holes).toBeLessThanOrEqual(inline.holes);
        expect(inline.holes - staggered.holes).toBe(Math.floor(rows / 2));
      }),
    );
  });

  it('the transverse pitch is never below 2.5D unless given, and a given one is kept', () => {
    fc.assert(
      fc.property(lineArb, rowsArb, fc.option(fc.double({ min: 0.01, max: 2, noNaN: true }), { nil: undefined }), (l, rows, rowSpacing) => {
        const rivet = { ...blind18, diameter32: l.diameter32 };
        const r = estimateLine({ ...l, rows, rowSpacing, rivet }, { unit: 'in' });
        if ('error' in r) return;
        const floor = (2.5 * l.diameter32) / 32;
        if (rowSpacing === undefined) {
          expect(r.transversePitch).toBeGreaterThanOrEqual(floor - 1e-9);
          expect(r.transversePitch).toBeCloseTo(Math.max(0.75 * r.pitch, floor), 5);
        } else {
          expect(r.transversePitch).toBeCloseTo(rowSpacing, 6);
          expect(r.warnings.some((w) => w.code === 'TRANSVERSE_PITCH_BELOW_MINIMUM')).toBe(rowSpacing < floor - 1e-9);
        }
      }),
    );
  });

  it('a blind grip covers its stack, and a solid length covers stack + 1.5D', () => {
    fc.assert(
      fc.property(lineArb, (l) => {
        const stack = Math.round(l.stack.reduce((s, t) => s + t, 0) * 1000) / 1000;
        const blind = estimateLine({ ...l, pitch: 10, rivet: { ...blind18, diameter32: l.diameter32 } }, { unit: 'in' });
        const solid = estimateLine({ ...l, pitch: 10, rivet: { kind: 'solid', head: 'dome', diameter32: l.diameter32 } }, { unit: 'in' });
        if ('error' in blind || 'error' in solid) return;
        if (blind.grip !== null && stack >= 0.02) {
          const range = blindGripRange(blind.grip)!;
          expect(stack).toBeGreaterThanOrEqual(range.min);
          expect(stack).toBeLessThanOrEqual(range.max);
        }
        expect(solid.grip! / 16).toBeGreaterThanOrEqual(stack + (1.5 * l.diameter32) / 32 - 0.001);
        expect(solid.grip! / 16 - 1 / 16).toBeLessThan(l.stack.reduce((s, t) => s + t, 0) + (1.5 * l.diameter32) / 32);
      }),
    );
  });
});
