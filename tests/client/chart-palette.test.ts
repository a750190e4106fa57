import { describe, expect, it } from 'vitest';
import { BIN_KINDS } from '@shared/stock/kinds';
import { TOOL_CATEGORIES } from '@shared/tools/categories';
import { fillsFor } from '@/components/ui/chart-palette';

describe('chart fills', () => {
  it('gives every kind of a catalogue its own fill, and "other" always the steel grey', () => {
    for (const keys of [BIN_KINDS, TOOL_CATEGORIES]) {
      const fills = fillsFor(keys);
      expect(new Set(Object.values(fills)).size).toBe(keys.length);
      expect(fills.other).toBe('#6b7d8a');
    }
  });

  it('keeps the order of the list: the first kinds take the ink, slate blue and brass', () => {
    expect(fillsFor(['a', 'b', 'c'])).toEqual({ a: '#1d2b36', b: '#7fa7c9', c: '#f2b134' });
  });
});
