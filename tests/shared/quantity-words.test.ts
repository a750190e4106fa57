import { describe, expect, it } from 'vitest';
import { countWords, quantityWords, unitWord, ordinalWords } from '@shared/stock/quantity-words';

describe('unitWord: one plural rule for the units bins are counted in', () => {
  it.each([
    ['each', 'each', 'each'],
    ['tube', 'tube', 'tubes'],
    ['box', 'box', 'boxes'],
    ['pack', 'pack', 'packs'],
    ['roll', 'roll', 'rolls'],
    ['sheet', 'sheet', 'sheets'],
    ['pair', 'pair', 'pairs'],
    ['bottle', 'bottle', 'bottles'],
    ['can', 'can', 'cans'],
    ['brush', 'brush', 'brushes'],
    ['batch', 'batch', 'batches'],
    ['assembly', 'assembly', 'assemblies'],
    ['tray', 'tray', 'trays'],
    ['ft', 'ft', 'ft'],
    ['in', 'in', 'in'],
    ['mm', 'mm', 'mm'],
    ['lb', 'lb', 'lb'],
    ['oz', 'oz', 'oz'],
    ['gal', 'gal', 'gal'],
    ['dozen', 'dozen', 'dozen'],
    ['pcs', 'pcs', 'pcs'],
    ['EA', 'EA', 'EA'],
    ['6 oz tube', '6 oz tube', '6 oz tubes'],
    ['Tube', 'Tube', 'Tubes'],
  ])('%s: 1 %s, 4 %s', (unit, one, many) => {
    expect(unitWord(1, unit)).toBe(one);
    expect(unitWord(4, unit)).toBe(many);
    expect(unitWord(0, unit)).toBe(many);
  });
});

describe('quantityWords and countWords', () => {
  it('writes thousands with a separator and the unit in the number it goes with', () => {
    expect(quantityWords(4, 'tube')).toBe('4 tubes');
    expect(quantityWords(1, 'tube')).toBe('1 tube');
    expect(quantityWords(1206, 'each')).toBe('1,206 each');
    expect(quantityWords(12000, 'sheet')).toBe('12,000 sheets');
    expect(countWords(1206)).toBe('1,206');
    expect(countWords(-1206)).toBe('-1,206');
  });

  it('takes a fraction that rounds to one as one', () => {
    expect(quantityWords(1.2, 'box')).toBe('1 box');
    expect(quantityWords(-1, 'box')).toBe('-1 box');
  });
});

describe('ordinalWords', () => {
  it('writes a place in line as English does: 1st, 2nd, 3rd, 4th, 11th, 12th, 13th, 21st, 102nd', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 102].map(ordinalWords)).toEqual(['1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '102nd']);
  });
});
