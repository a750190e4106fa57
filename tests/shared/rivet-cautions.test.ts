import { describe, expect, it } from 'vitest';
import { BIN_KINDS } from '@shared/stock/kinds';
import { binLabelCaution, rivetBinCaution } from '@shared/stock/rivet-cautions';

describe('rivetBinCaution', () => {
  it('asks for the length of a solid rivet: grip plus 1.5 D, rounded up to the next 1/16 in', () => {
    // Solid rivet length = grip + 1.5 D, then the next standard length up (NAVEDTRA 14018 ch. 13; TM 10-5410-229-13&P).
    const text = rivetBinCaution('solid_rivet')!;
    expect(text).toContain('check the length against the sheet stack: grip plus 1.5 times the diameter, rounded up to the next 1/16 in');
    expect(text).toContain('(material, head, diameter and length)');
    expect(text).not.toMatch(/grip\)|check the grip/);
  });

  it('asks for the grip of a blind rivet, and says a general-purpose one is not for structure', () => {
    // Blind rivets are numbered by grip (TM 10-5410-221-14/1 Table 4-3); general-purpose pull-type
    // blind rivets are not approved for aircraft structure (AC 43.13-1B p. 4-24).
    for (const kind of ['blind_structural', 'blind_general'] as const) {
      expect(rivetBinCaution(kind)).toContain('(material, head, diameter and grip) and check the grip against the sheet stack.');
    }
    expect(rivetBinCaution('blind_general')).toMatch(/^General-purpose blind rivets are not for structural joints\. /);
    expect(rivetBinCaution('blind_structural')).not.toContain('not for structural');
  });

  it('names what governs on every rivet bin, and has nothing to say on other bins', () => {
    for (const kind of BIN_KINDS) {
      const text = rivetBinCaution(kind);
      if (['blind_structural', 'blind_general', 'solid_rivet'].includes(kind)) expect(text).toMatch(/approved data and a licensed mechanic govern\.$/);
      else expect(text).toBeUndefined();
    }
  });
});

describe('binLabelCaution', () => {
  it('puts "Not for structure" on a general-purpose blind rivet bin label only', () => {
    expect(BIN_KINDS.filter((kind) => binLabelCaution(kind) !== undefined)).toEqual(['blind_general']);
    expect(binLabelCaution('blind_general')).toBe('Not for structure');
  });
});
