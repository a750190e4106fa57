import { describe, expect, it } from 'vitest';
import { ALL_DRILLS, FRACTIONAL_DRILLS, NUMBER_AND_LETTER_DRILLS, findDrill } from '@shared/drills/drill-sizes';

const inch = (name: string) => findDrill(name)?.inch;

describe('twist drill sizes', () => {
  it('matches the published decimal sizes of the numbered drills', () => {
    // ASME B94.11M "Twist Drills" (also Machinery's Handbook, "Twist drill sizes").
    const published: [string, number][] = [
      ['#1', 0.228],
      ['#11', 0.191],
      ['#12', 0.189],
      ['#20', 0.161],
      ['#21', 0.159],
      ['#30', 0.1285],
      ['#31', 0.12],
      ['#34', 0.111],
      ['#35', 0.11],
      ['#40', 0.098],
      ['#41', 0.096],
      ['#60', 0.04],
    ];
    for (const [name, value] of published) expect(inch(name), name).toBe(value);
  });

  it('carries #61 to #80 as recalled from the same standard', () => {
    // ASME B94.11M, recalled from memory (to be confirmed against a copy): #61 .0390, #69 .0292, #80 .0135.
    expect(inch('#61')).toBe(0.039);
    expect(inch('#69')).toBe(0.0292);
    expect(inch('#80')).toBe(0.0135);
  });

  it('matches the published letter sizes; E is exactly 1/4 in', () => {
    // ASME B94.11M letter drills.
    expect(inch('A')).toBe(0.234);
    expect(inch('E')).toBe(0.25);
    expect(inch('F')).toBe(0.257);
    expect(inch('Z')).toBe(0.413);
  });

  it('derives millimetres as inch × 25.4, matching the published mm column within 0.001 mm', () => {
    // ASME B94.11M mm column (as printed in the reference table): #40 2.489, #21 4.039, F 6.528, #13 4.699.
    const mm: [string, number][] = [
      ['#40', 2.489],
      ['#21', 4.039],
      ['#13', 4.699],
      ['F', 6.528],
      ['#1', 5.791],
    ];
    for (const [name, value] of mm) expect(Math.abs(findDrill(name)!.mm - value), name).toBeLessThanOrEqual(0.001);
    for (const d of ALL_DRILLS) expect(Math.abs(d.mm - d.inch * 25.4)).toBeLessThan(0.0005 + 1e-9);
  });

  it('runs backwards by number: #1 is the largest numbered drill, #80 the smallest, letters continue above #1', () => {
    const numbered = NUMBER_AND_LETTER_DRILLS.filter((d) => d.series === 'number');
    expect(numbered).toHaveLength(80);
    for (let i = 1; i < numbered.length; i++) expect(numbered[i]!.inch).toBeLessThan(numbered[i - 1]!.inch);
    const letters = NUMBER_AND_LETTER_DRILLS.filter((d) => d.series === 'letter');
    expect(letters).toHaveLength(26);
    for (let i = 1; i < letters.length; i++) expect(letters[i]!.inch).toBeGreaterThan(letters[i - 1]!.inch);
    expect(letters[0]!.inch).toBeGreaterThan(numbered[0]!.inch);
  });

  it('has fractional drills by 64ths in lowest terms, and finds drills by the names builders use', () => {
    expect(FRACTIONAL_DRILLS.map((d) => d.name).slice(0, 4)).toEqual(['1/64', '1/32', '3/64', '1/16']);
    expect(inch('1/8')).toBe(0.125);
    expect(findDrill('40')?.name).toBe('#40');
    expect(findDrill(' f ')?.name).toBe('F');
    expect(findDrill('#81')).toBeUndefined();
  });
});
