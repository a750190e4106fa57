import { describe, expect, it } from 'vitest';
import { estimate, isEstimateErrors } from '@shared/estimate/estimate';
import type { RivetLineInput } from '@shared/estimate/estimate-line';
import { PUBLISHED_PITCH_MAXIMA_WORDS } from '@shared/estimate/line-rules';

const line = (over: Partial<RivetLineInput> = {}): RivetLineInput => ({ length: 20, pitch: 1, stack: [0.032, 0.032], rivet: { kind: 'blind-structural', head: 'dome', diameter32: 4 }, ...over });

function lines(input: RivetLineInput[], options: Parameters<typeof estimate>[1] = {}) {
  const r = estimate({ unit: 'in', lines: input }, options);
  if (isEstimateErrors(r)) throw new Error(r.errors[0]!.message);
  return r.lines;
}

describe('the rules of a line', () => {
  it('are one shared, frozen list for lines that take the same rules, and another for a different rule', () => {
    const [a, b, c, d] = lines([line(), line({ length: 30, pitch: 1.2 }), line({ rivet: { kind: 'blind-structural', head: 'countersunk', diameter32: 4 } }), line({ rows: 2 })]);
    expect(a!.rules).toBe(b!.rules);
    expect(Object.isFrozen(a!.rules)).toBe(true);
    expect(Object.isFrozen(a!.rules[0])).toBe(true);
    expect(c!.rules).not.toBe(a!.rules);
    expect(c!.rules[0]!.rule).toBe('2.5D, countersunk head');
    // A second row brings the transverse pitch rule, and only then.
    expect(d!.rules.map((r) => r.value)).toContain('transversePitch');
    expect(a!.rules.map((r) => r.value)).not.toContain('transversePitch');
  });

  it('name the chapter’s maximum pitch beside both published maxima', () => {
    expect(PUBLISHED_PITCH_MAXIMA_WORDS).toBe('8D (NAVEDTRA 14018 ch. 13) and 10D (FAA-derived sources, secondary)');
    const [eight] = lines([line()], { maxPitchDiameters: 8 });
    expect(eight!.rules.find((r) => r.value === 'pitch')!.rule).toContain('at most the chapter’s 8D');
  });

  it('say the edge came from the build’s floor only when the floor is above the published minimum', () => {
    // 1/8 in: 2D = 0.25 in. A floor of 0.375 in sets the edge; a floor of 0.2 in does not.
    const [floor] = lines([line()], { edgeFloorIn: 0.375 });
    const [minimum] = lines([line()], { edgeFloorIn: 0.2 });
    expect(floor!.edgeDistance).toBe(0.375);
    expect(floor!.rules[0]!.rule).toMatch(/build’s edge distance floor/);
    expect(minimum!.edgeDistance).toBe(0.25);
    expect(minimum!.rules[0]!.rule).toBe('2D, protruding head');
  });

  it('hold for millimetre lines too', () => {
    // 5/32 in countersunk in mm: 2.5D = 9.921875 mm, the minimum, not a floor.
    const r = estimate({ unit: 'mm', lines: [line({ length: 500, pitch: 25, stack: [1, 1], rivet: { kind: 'solid', head: 'countersunk', diameter32: 5 } })] });
    if (isEstimateErrors(r)) throw new Error(r.errors[0]!.message);
    expect(r.lines[0]!.edgeDistance).toBeCloseTo(9.921875, 6);
    expect(r.lines[0]!.rules[0]!.rule).toBe('2.5D, countersunk head');
  });
});

describe('every computed value has its rule', () => {
  it('on varied lines: one rule per value the line shows, the transverse pitch exactly when there are rows', async () => {
    const { seededRandom } = await import('@shared/random/seeded');
    const rnd = seededRandom(7);
    const kinds = ['blind-structural', 'blind-general', 'solid'] as const;
    const heads = ['dome', 'countersunk', 'flange'] as const;
    const input: RivetLineInput[] = Array.from({ length: 300 }, (_, i) => ({
      length: 10 + rnd() * 30,
      ...(i % 4 === 0 ? { holesPerRow: 8 + (i % 5) } : { pitch: 0.6 + rnd() }),
      ...(i % 3 === 0 ? {} : { edgeDistance: 0.3 + rnd() * 0.2 }),
      rows: 1 + (i % 3),
      ...(i % 2 === 0 ? { rowPattern: 'staggered' as const } : {}),
      ...(i % 5 === 0 ? { rowSpacing: 0.5 } : {}),
      ...(i % 7 === 0 ? { repair: true } : {}),
      stack: [0.032, 0.04],
      rivet: { kind: kinds[i % 3]!, head: heads[(i >> 1) % 3]!, diameter32: [3, 4, 5][i % 3]! },
    }));
    const out = lines(input, { edgeFloorIn: 0.35, maxPitchDiameters: 8 });
    out.forEach((l, i) => {
      const values = l.rules.map((r) => r.value);
      const shown = ['edgeDistance', 'pitch', 'holesPerRow', 'holes', ...(l.transversePitch === undefined ? [] : ['transversePitch']), 'grip', 'drillSequence', 'tempFasteners',
        ...(l.flushPrep === null ? [] : ['flushPrep']), ...(l.shopHead === null ? [] : ['shopHead']), 'diameter', ...(input[i]!.repair ? ['repair'] : [])];
      expect(values, `line ${i}`).toEqual(shown);
      expect(l.flushPrep !== null, `line ${i}`).toBe(input[i]!.rivet.head === 'countersunk');
      expect(l.transversePitch !== undefined, `line ${i}`).toBe((input[i]!.rows ?? 1) > 1);
      for (const r of l.rules) expect(r.source.length, `line ${i} ${r.value}`).toBeGreaterThan(0);
    });
    // A few choices make a few lists.
    expect(new Set(out.map((l) => l.rules)).size).toBeLessThan(60);
  });
});
