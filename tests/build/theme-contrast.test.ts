import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

/**
 * The colour tokens of src/index.css's @theme, checked pair by pair as they are used.
 * Source: WCAG 2.2, success criterion 1.4.3 and its definition of contrast ratio
 * ((L1 + 0.05) / (L2 + 0.05), L the relative luminance of the sRGB colour); 4.5:1 for text,
 * 3:1 for the boundaries of user interface components and focus indicators (success criterion 1.4.11).
 */
const css = readFileSync(new URL('../../src/index.css', import.meta.url), 'utf8');
const theme = css.slice(css.indexOf('@theme'), css.indexOf('}', css.indexOf('@theme')));

function token(name: string): string {
  const hex = new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6});`, 'i').exec(theme)?.[1];
  if (!hex) throw new Error(`--color-${name} is not a six-digit hex colour in src/index.css`);
  return hex;
}

function relativeLuminance(hex: string): number {
  const channel = (i: number) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel(1) + 0.7152 * channel(3) + 0.0722 * channel(5);
}

function contrastRatio(a: string, b: string): number {
  const [la, lb] = [relativeLuminance(a), relativeLuminance(b)];
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

const PAGE_BACKGROUNDS = ['paper', 'card'];
const TEXT_ON_LIGHT = ['ink', 'ink-soft', 'steel', 'brass-deep', 'ok', 'warn', 'bad'];
const SOFT_BACKGROUNDS = ['ok-soft', 'warn-soft', 'bad-soft'];

describe('the contrast ratio of WCAG 2.2', () => {
  it('is 21:1 for black on white and 1:1 for a colour on itself', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrastRatio('#6b7d8a', '#6b7d8a')).toBe(1);
  });

  it('finds the old grey text token under 4.5:1 on the page and on cards', () => {
    expect(contrastRatio('#6b7d8a', token('paper'))).toBeCloseTo(3.81, 2);
    expect(contrastRatio('#6b7d8a', token('card'))).toBeCloseTo(4.19, 2);
  });
});

describe('the theme tokens', () => {
  for (const fg of TEXT_ON_LIGHT) {
    for (const bg of [...PAGE_BACKGROUNDS, ...SOFT_BACKGROUNDS]) {
      it(`text in ${fg} on ${bg} reaches 4.5:1`, () => {
        expect(contrastRatio(token(fg), token(bg))).toBeGreaterThanOrEqual(4.5);
      });
    }
  }

  it('light text on the ink header and buttons reaches 4.5:1', () => {
    expect(contrastRatio(token('card'), token('ink'))).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio(token('brass'), token('ink'))).toBeGreaterThanOrEqual(4.5);
  });

  for (const bg of PAGE_BACKGROUNDS) {
    it(`a form control's edge and the focus ring reach 3:1 on ${bg}`, () => {
      expect(contrastRatio(token('edge'), token(bg))).toBeGreaterThanOrEqual(3);
      expect(contrastRatio(token('focus'), token(bg))).toBeGreaterThanOrEqual(3);
    });
  }

  it('the focus ring on the ink header reaches 3:1', () => {
    expect(contrastRatio(token('focus-on-ink'), token('ink'))).toBeGreaterThanOrEqual(3);
  });
});
