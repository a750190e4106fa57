import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { estimate, isEstimateErrors, type EstimateResult } from '@shared/estimate/estimate';
import { estimateLine, type LineEstimate, type LineError, type RivetLineInput } from '@shared/estimate/estimate-line';
import { MIN_COUNTERSINK_SHEET_IN } from '@shared/estimate/flush-prep';
import { nextDiameter32 } from '@shared/estimate/repair';

const solid = (diameter32: number, head: RivetLineInput['rivet']['head'] = 'dome'): RivetLineInput['rivet'] => ({ kind: 'solid', head, diameter32, material: '2117-T4' });
const blind = (diameter32: number): RivetLineInput['rivet'] => ({ kind: 'blind-structural', head: 'dome', diameter32, material: '5056' });
const line = (over: Partial<RivetLineInput>): RivetLineInput => ({ length: 20, pitch: 1, stack: [0.032, 0.032], rivet: blind(4), ...over });
const inches = { unit: 'in' as const };
const ok = (r: LineEstimate | LineError): LineEstimate => {
  if ('error' in r) throw new Error(`${r.code}: ${r.message}`);
  return r;
};
const refused = (r: LineEstimate | LineError): LineError => {
  if (!('error' in r)) throw new Error(`expected a refusal, got ${JSON.stringify(r)}`);
  return r;
};
const codes = (r: LineEstimate) => r.warnings.map((w) => w.code);
const whole = (r: ReturnType<typeof estimate>): EstimateResult => {
  if (isEstimateErrors(r)) throw new Error(r.errors[0]!.message);
  return r;
};

describe('flush heads: countersink or dimple (TM 9-2320-363-34-2, minimum sheet gage for a 100° machine countersink)', () => {
  const flush = (diameter32: number, stack: number[], over: Partial<RivetLineInput> = {}) => line({ stack, rivet: solid(diameter32, 'countersunk'), ...over });

  it('publishes the table: 3/32 → 0.040, 1/8 → 0.050, 5/32 → 0.064, 3/16 → 0.072, 1/4 → 0.072 in', () => {
    expect(MIN_COUNTERSINK_SHEET_IN).toEqual({ 3: 0.04, 4: 0.05, 5: 0.064, 6: 0.072, 8: 0.072 });
  });

  it('countersinks a top sheet at the minimum: 1/8 in rivet, 0.050 in top sheet (minimum 0.050 in)', () => {
    const r = ok(estimateLine(flush(4, [0.05, 0.04]), inches));
    expect(r.flushPrep).toBe('countersink');
    expect(codes(r)).not.toContain('COUNTERSINK_KNIFE_EDGE');
  });

  it('dimples a top sheet below the minimum: 1/8 in rivet, 0.040 in top sheet (minimum 0.050 in)', () => {
    expect(ok(estimateLine(flush(4, [0.04, 0.04]), inches)).flushPrep).toBe('dimple');
  });

  it('reads the stack in millimetres: 1.27 mm = 0.050 in top sheet takes a 1/8 in countersink; 1.2 mm does not', () => {
    const mm = { unit: 'mm' as const };
    expect(ok(estimateLine(flush(4, [1.27, 1], { length: 500, pitch: 25 }), mm)).flushPrep).toBe('countersink');
    expect(ok(estimateLine(flush(4, [1.2, 1], { length: 500, pitch: 25 }), mm)).flushPrep).toBe('dimple');
  });

  it('gives null on protruding-head lines, solid and blind', () => {
    expect(ok(estimateLine(line({ rivet: solid(4) }), inches)).flushPrep).toBeNull();
    expect(ok(estimateLine(line({}), inches)).flushPrep).toBeNull();
  });

  it('keeps the plans’ choice to countersink, and warns of a knife edge below the minimum: 0.032 in top sheet, 1/8 in rivet', () => {
    const r = ok(estimateLine(flush(4, [0.032, 0.032], { flushPrep: 'countersink' }), inches));
    expect(r.flushPrep).toBe('countersink');
    expect(r.warnings).toContainEqual({
      code: 'COUNTERSINK_KNIFE_EDGE',
      message:
        'Countersinking the 0.032 in top sheet for a 1/8 in rivet would go through the sheet and leave a knife edge that can tear out and weaken the joint: the minimum for a machine countersink is 0.05 in. Dimple it instead.',
    });
  });

  it('keeps the plans’ choice to dimple without a warning, even where a countersink would do', () => {
    const r = ok(estimateLine(flush(4, [0.063, 0.032], { flushPrep: 'dimple' }), inches));
    expect(r.flushPrep).toBe('dimple');
    expect(codes(r)).not.toContain('COUNTERSINK_KNIFE_EDGE');
  });

  it('asks the crib kit for a cutter per size countersunk and dies per size dimpled; the sheet under a dimple is countersunk when thick enough (common practice)', () => {
    const r = whole(
      estimate({
        unit: 'in',
        lines: [
          // 1/8 in, 0.050 in top: countersunk, pilot = the solid final drill #30.
          flush(4, [0.05, 0.04]),
          // 3/16 in, 0.025 in top: dimpled; 0.072 in under it is at the 3/16 minimum → countersunk to take the dimple (pilot #11).
          flush(6, [0.025, 0.072], { length: 30, pitch: 1.5 }),
          // 5/32 in, 0.032 over 0.040: both below 0.064 → nested dimples, no cutter.
          flush(5, [0.032, 0.04]),
        ],
      }),
    );
    expect(r.flushTools).toEqual([
      { prep: 'countersink', diameter32: 4, pilot: '#30' },
      { prep: 'countersink', diameter32: 6, pilot: '#11' },
      { prep: 'dimple', diameter32: 5, pilot: '#21' },
      { prep: 'dimple', diameter32: 6, pilot: '#11' },
    ]);
  });

  it('property: for a fixed diameter, flushPrep changes exactly once as the top sheet grows, at the minimum gage', () => {
    fc.assert(
      fc.property(fc.constantFrom(3, 4, 5, 6, 8), (d) => {
        const min = MIN_COUNTERSINK_SHEET_IN[d]!;
        let changes = 0;
        let last: string | null = null;
        for (let thou = 16; thou <= 125; thou++) {
          const top = thou / 1000;
          const r = estimateLine(flush(d, [top], { length: 40, pitch: 2 }), inches);
          // A line the sheet rule refuses (rivet thinner than the sheet) says nothing about countersinking.
          if ('error' in r) continue;
          expect(r.flushPrep).toBe(top >= min - 1e-9 ? 'countersink' : 'dimple');
          if (last !== null && r.flushPrep !== last) changes++;
          last = r.flushPrep;
        }
        expect(changes).toBe(1);
      }),
    );
  });
});

describe('rivet diameter against the thickest sheet: about 3 × t (AC 43.13-1B para 4-58g; minimum t: NAVEDTRA 14018 ch. 13)', () => {
  const dia = (diameter32: number, stack: number[], over: Partial<RivetLineInput> = {}) => line({ stack, rivet: blind(diameter32), ...over });
  const sheetCodes = (r: LineEstimate) => codes(r).filter((c) => c.startsWith('DIAMETER_'));

  it('passes the two standard sizes bracketing 3t: 0.032 in → 3t = 0.096 in → 3/32 and 1/8 pass, 5/32 is large', () => {
    expect(sheetCodes(ok(estimateLine(dia(3, [0.032, 0.032]), inches)))).toEqual([]);
    expect(sheetCodes(ok(estimateLine(dia(4, [0.032, 0.032]), inches)))).toEqual([]);
    const large = ok(estimateLine(dia(5, [0.032, 0.032]), inches));
    expect(large.warnings).toContainEqual({
      code: 'DIAMETER_LARGE_FOR_SHEET',
      message: 'A 5/32 in rivet is large for a 0.032 in sheet: about 3 × the thickest sheet is 0.096 in, so 3/32 in or 1/8 in.',
    });
  });

  it('0.063 in → 3t = 0.189 in → 3/16 and 1/4 pass; 1/8 and 5/32 are small', () => {
    expect(sheetCodes(ok(estimateLine(dia(6, [0.063]), inches)))).toEqual([]);
    expect(sheetCodes(ok(estimateLine(dia(8, [0.063], { pitch: 2 }), inches)))).toEqual([]);
    expect(sheetCodes(ok(estimateLine(dia(5, [0.063]), inches)))).toEqual(['DIAMETER_SMALL_FOR_SHEET']);
    const small = ok(estimateLine(dia(4, [0.063]), inches));
    expect(small.warnings).toContainEqual({
      code: 'DIAMETER_SMALL_FOR_SHEET',
      message: 'A 1/8 in rivet is small for a 0.063 in sheet: about 3 × the thickest sheet is 0.189 in, so 3/16 in or 1/4 in.',
    });
  });

  it('takes the thickest sheet of the stack, not the first: 0.020 over 0.063 with 1/8 in is small', () => {
    expect(sheetCodes(ok(estimateLine(dia(4, [0.02, 0.063]), inches)))).toEqual(['DIAMETER_SMALL_FOR_SHEET']);
  });

  it('at the ends of the table: 0.016 in (3t = 0.048 in) passes only 3/32; 0.100 in (3t = 0.3 in) passes only 1/4', () => {
    expect(sheetCodes(ok(estimateLine(dia(3, [0.016]), inches)))).toEqual([]);
    expect(sheetCodes(ok(estimateLine(dia(4, [0.016]), inches)))).toEqual(['DIAMETER_LARGE_FOR_SHEET']);
    expect(sheetCodes(ok(estimateLine(dia(8, [0.1], { pitch: 2 }), inches)))).toEqual([]);
    expect(sheetCodes(ok(estimateLine(dia(6, [0.1]), inches)))).toEqual(['DIAMETER_SMALL_FOR_SHEET']);
  });

  it('refuses on a structural line a diameter below the thickest sheet: 3/32 in (0.094 in) through 0.125 in', () => {
    const r = refused(estimateLine(dia(3, [0.125], { structural: true }), inches));
    expect(r).toEqual({
      error: true,
      code: 'DIAMETER_BELOW_SHEET_THICKNESS',
      message: 'A 3/32 in rivet is thinner than the 0.125 in sheet: on a structural line the diameter must be at least the thickest sheet. Use a larger rivet.',
    });
  });

  it('warns instead on a non-structural line, in the same words', () => {
    const r = ok(estimateLine(dia(3, [0.125]), inches));
    expect(sheetCodes(r)).toEqual(['DIAMETER_BELOW_SHEET_THICKNESS']);
    expect(r.warnings[0]!.message).toContain('A 3/32 in rivet is thinner than the 0.125 in sheet');
  });

  it('works in millimetres: 1.6 mm sheet (0.063 in) → 1/8 in small', () => {
    expect(sheetCodes(ok(estimateLine(dia(4, [1.6], { length: 500, pitch: 25 }), { unit: 'mm' })))).toEqual(['DIAMETER_SMALL_FOR_SHEET']);
  });
});

describe('solid rivets: the shop head and half lengths (FAA-H-8083-31 ch. 4, secondary; MS20470AD4-3.5 in the reference)', () => {
  it('shows the shop head the 1.5D allowance makes: 1/8 in → 0.1875 in wide, 0.0625 in high', () => {
    expect(ok(estimateLine(line({ rivet: solid(4) }), inches)).shopHead).toEqual({ width: 0.1875, height: 0.0625 });
  });

  it('in millimetres: 1/8 in = 3.175 mm → 4.7625 mm wide, 1.5875 mm high', () => {
    expect(ok(estimateLine(line({ length: 500, pitch: 25, stack: [0.8, 0.8], rivet: solid(4) }), { unit: 'mm' })).shopHead).toEqual({ width: 4.7625, height: 1.5875 });
  });

  it('gives null on blind lines', () => {
    const r = ok(estimateLine(line({}), inches));
    expect(r.shopHead).toBeNull();
    expect(r.halfLength).toBeNull();
  });

  it('offers the half length below when it fits: 0.064 in + 1.5 × 3/32 = 0.2046 in → −4, and −3.5 = 0.21875 in fits', () => {
    const r = ok(estimateLine(line({ stack: [0.032, 0.032], rivet: solid(3) }), inches));
    expect(r.grip).toBe(4);
    expect(r.halfLength).toBe(3.5);
  });

  it('offers none when the half length is too short: 0.050 in + 1.5 × 1/8 = 0.2375 in → −4; −3.5 = 0.21875 in is short', () => {
    const r = ok(estimateLine(line({ stack: [0.05], rivet: solid(4) }), inches));
    expect(r.grip).toBe(4);
    expect(r.halfLength).toBeNull();
  });
});

describe('repair lines: the next diameter up for drilled-out rivets (common practice; AC 43.13-1B ch. 4 as restated)', () => {
  const repair = (over: Partial<RivetLineInput>) => line({ repair: true, stack: [0.05, 0.05], ...over });

  it('steps 3 → 4 → 5 → 6 → 8, and 8 has none', () => {
    expect([3, 4, 5, 6, 8].map(nextDiameter32)).toEqual([4, 5, 6, 8, null]);
  });

  it('lays out a 1/8 in repair with 5/32 in rivets: edge 2D = 0.3125 in, 20 in line → ⌈19.375⌉ + 1 = 21 holes at 0.96875 in', () => {
    const r = ok(estimateLine(repair({}), inches));
    expect(r).toMatchObject({
      diameter32: 5,
      holesPerRow: 21,
      holes: 21,
      pitch: 0.96875,
      edgeDistance: 0.3125,
      grip: 2,
      drillSequence: ['#40', '#30', '#20'],
      tempFasteners: { '3/32': 7, '1/8': 7, '5/32': 7 },
    });
    expect(r.warnings).toEqual([
      { code: 'REPAIR_NEXT_SIZE', message: 'Repair: 1/8 in holes drilled out, 5/32 in rivets; edge distance and pitch re-checked for 5/32 in.' },
    ]);
  });

  it('re-checks the pitch for the larger rivet: 11 holes over 4.5 in are fine at 1/8 in but 0.3875 in < 3 × 5/32 = 0.46875 in', () => {
    ok(estimateLine(line({ length: 4.5, pitch: undefined, holesPerRow: 11, stack: [0.05, 0.05] }), inches));
    expect(refused(estimateLine(repair({ length: 4.5, pitch: undefined, holesPerRow: 11 }), inches)).code).toBe('PITCH_BELOW_MINIMUM');
  });

  it('refuses a 1/4 in repair: no larger standard diameter', () => {
    const r = refused(estimateLine(repair({ pitch: 2, rivet: solid(8) }), inches));
    expect(r.code).toBe('NO_LARGER_DIAMETER');
    expect(r.message).toContain('1/4 in');
  });

  it('leaves diameter32 off lines that are not repairs', () => {
    expect(ok(estimateLine(line({}), inches))).not.toHaveProperty('diameter32');
  });

  it('counts the needs, nosepieces and lengths at the larger diameter: solid 3/16 → 1/4, grip 0.1 + 0.375 = 0.475 in → −8', () => {
    const r = whole(estimate({ unit: 'in', wastePercent: 0, lines: [repair({ length: 20, pitch: 2, stack: [0.1], rivet: solid(6) })] }));
    expect(r.needs.map((n) => [n.kind, n.diameter32, n.grip, n.rivets])).toEqual([['solid', 8, 8, 11]]);
    expect(r.nosepieces).toEqual([{ kind: 'solid', diameter32: 8, head: 'dome' }]);
    expect(r.lines[0]!.shopHead).toEqual({ width: 0.375, height: 0.125 });
  });
});
