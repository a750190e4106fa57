import type { BinKind } from '@shared/stock/kinds';

/**
 * One fill per bin kind for the spend chart: the app's own ink, brass and signal colours from
 * src/index.css first, then a few muted shop tones beside them. Neighbours in BIN_KINDS order differ
 * in lightness as well as hue, and the table under the chart carries every figure in words.
 */
export const KIND_COLOURS: Record<BinKind, string> = {
  blind_structural: '#1d2b36', // ink
  blind_general: '#7fa7c9', // pale slate blue
  solid_rivet: '#f2b134', // brass
  screw: '#1f6f43', // ok green
  nut: '#a9c7a0', // sage
  washer: '#8a5a00', // brass deep
  drill_bit: '#a2281b', // bad red
  deburring_blade: '#e3a396', // clay
  sealant_primer: '#6b4f8a', // plum
  other: '#6b7d8a', // steel
};
