import { describe, expect, it } from 'vitest';
import { blindGripForStack, blindGripRange, fastenerDesignation, inchFraction, solidLengthDash, solidRivetNumber, type FastenerSpec } from '@shared/stock/fasteners';
import { RIVET_SET_WORDS, rivetHeadChoices, rivetHeadLabel } from '@shared/stock/kinds';

const rivet = (over: Partial<FastenerSpec>): FastenerSpec => ({
  kind: 'solid_rivet',
  head: 'dome',
  material: '2117-T4',
  stemMaterial: null,
  diameter32: 4,
  grip16: null,
  length16: 6,
  ...over,
});

describe('solid rivet numbers (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1)', () => {
  it('decodes the published check: MS20470AD4-6 is a universal-head 2117-T4 rivet, 1/8 in diameter, 3/8 in long', () => {
    const spec = rivet({ head: 'dome', material: '2117-T4', diameter32: 4, length16: 6 });
    expect(solidRivetNumber(spec)).toBe('MS20470AD4-6');
    expect(inchFraction(spec.diameter32!, 32)).toBe('1/8');
    expect(inchFraction(spec.length16!, 16)).toBe('3/8');
  });

  it('uses MS20426 for 100° countersunk heads and writes half lengths with .5 (MS20470AD4-3.5 form)', () => {
    expect(solidRivetNumber(rivet({ head: 'countersunk', diameter32: 3, length16: 4 }))).toBe('MS20426AD3-4');
    expect(solidRivetNumber(rivet({ head: 'dome', diameter32: 4, length16: 3.5 }))).toBe('MS20470AD4-3.5');
  });

  it.each([
    ['1100', 'A'],
    ['2117-T4', 'AD'],
    ['2017-T4', 'D'],
    ['2024-T4', 'DD'],
    ['5056', 'B'],
  ])('material %s has the letter %s (NAVEDTRA 14315 Table 3-1)', (material, letter) => {
    expect(solidRivetNumber(rivet({ material, diameter32: 5, length16: 8 }))).toBe(`MS20470${letter}5-8`);
  });

  // The two standards designate aluminium-alloy rivets only (trade-checks.md §4: material codes A, AD, D, DD, B).
  it.each(['monel', 'stainless', 'copper', 'steel', 'aluminium'])('prints no MS number for a %s solid rivet, only a plain description', (material) => {
    expect(solidRivetNumber(rivet({ material }))).toBeUndefined();
    expect(solidRivetNumber(rivet({ material, head: 'countersunk' }))).toBeUndefined();
    expect(fastenerDesignation(rivet({ material }))).toBe(`Solid, universal head, ${material} · 1/8 in · 3/8 in long`);
    expect(fastenerDesignation(rivet({ material, head: 'countersunk', diameter32: 3, length16: 4 }))).toBe(`Solid, 100° countersunk, ${material} · 3/32 in · 1/4 in long`);
  });
});

describe('solid rivet length (NAVEDTRA 14018 ch. 13: L = grip + 1.5D, next standard length up)', () => {
  it('gives dash -4 for a 0.050 in grip with a 1/8 in rivet (0.2375 in → 4/16)', () => {
    expect(solidLengthDash(0.05, 4)).toBe(4);
  });
  it('keeps an exact sixteenth as it is: grip 0.0625 + 1.5 × 1/8 = 0.25 in → -4', () => {
    expect(solidLengthDash(0.0625, 4)).toBe(4);
  });
});

describe('blind rivet grip dashes (TM 10-5410-221-14/1 Table 4-3)', () => {
  it.each([
    [1, 0.02, 0.062],
    [2, 0.063, 0.125],
    [3, 0.126, 0.187],
    [4, 0.188, 0.25],
    [5, 0.251, 0.312],
    [6, 0.313, 0.375],
    [8, 0.376, 0.5],
  ])('grip -%i covers %f–%f in', (dash, min, max) => {
    expect(blindGripRange(dash)).toEqual({ min, max });
    expect(blindGripForStack(min)).toBe(dash);
    expect(blindGripForStack(max)).toBe(dash);
  });

  it('has no -7 row, and rounds the stack to 0.001 in before choosing', () => {
    expect(blindGripRange(7)).toBeUndefined();
    expect(blindGripForStack(0.0625)).toBe(2); // 0.0625 rounds to 0.063 (our own arithmetic)
    expect(blindGripForStack(0.032 + 0.032)).toBe(2);
    expect(blindGripForStack(0.6)).toBeUndefined();
  });

  it('writes the readable form with the grip range beside the dash', () => {
    const spec: FastenerSpec = { kind: 'blind_structural', head: 'dome', material: '5056', stemMaterial: null, diameter32: 4, grip16: 2, length16: null };
    expect(fastenerDesignation(spec)).toBe('Blind, structural, dome, 5056 · 1/8 in · grip −2 (0.063–0.125 in)');
    expect(fastenerDesignation({ ...spec, kind: 'blind_general', head: 'countersunk', diameter32: 5, grip16: 3, stemMaterial: 'aluminium' })).toBe(
      'Blind, general purpose, 100° countersunk, 5056, aluminium stem · 5/32 in · grip −3 (0.126–0.187 in)',
    );
  });
});

describe('head words (trade-checks.md §4: MS20470 is the universal head)', () => {
  it('calls the protruding head of a solid rivet the universal head, and keeps dome for blind rivets', () => {
    expect(rivetHeadLabel('dome', true)).toBe('universal head');
    expect(rivetHeadLabel('dome', false)).toBe('dome');
    expect(rivetHeadLabel('countersunk', true)).toBe('100° countersunk');
    expect(rivetHeadLabel('flange', false)).toBe('large flange');
  });

  // Solid rivet heads: MS20470 universal and MS20426 100° countersunk (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1).
  it('offers a solid rivet the universal and 100° countersunk heads only, and a blind rivet the large flange too', () => {
    expect(rivetHeadChoices(true)).toEqual([
      { value: 'dome', label: 'Universal head' },
      { value: 'countersunk', label: '100° countersunk' },
    ]);
    expect(rivetHeadChoices(false).map((c) => c.label)).toEqual(['Dome', '100° countersunk', 'Large flange']);
    // A form that already holds a large flange keeps it listed, so the field shows it beside the refusal.
    expect(rivetHeadChoices(true, 'flange').map((c) => c.value)).toEqual(['dome', 'countersunk', 'flange']);
    expect(rivetHeadChoices(true, 'countersunk').map((c) => c.value)).toEqual(['dome', 'countersunk']);
  });

  it('names a rivet gun set the way the crib kit does: universal-head for protruding heads, flush for countersunk', () => {
    expect(RIVET_SET_WORDS).toEqual({ dome: 'universal-head rivet set', flange: 'universal-head rivet set', countersunk: 'flush rivet set' });
  });
});
