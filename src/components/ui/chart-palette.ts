/**
 * The fills of a chart's series, in order: the app's own ink, brass and signal colours from
 * src/index.css first, then muted shop tones. Neighbours differ in lightness as well as hue, and the
 * table beside every chart carries each figure in words. "Other" is always steel.
 */
const PALETTE = [
  '#1d2b36', // ink
  '#7fa7c9', // pale slate blue
  '#f2b134', // brass
  '#1f6f43', // ok green
  '#a9c7a0', // sage
  '#8a5a00', // brass deep
  '#a2281b', // bad red
  '#e3a396', // clay
  '#6b4f8a', // plum
  '#c9b8e0', // lilac
  '#2f6f8f', // deep teal
  '#e8d59e', // sand
  '#9c4f2f', // rust
] as const;
const OTHER = '#6b7d8a'; // steel

/** One fill per key of a fixed list (a catalogue's kinds, in their own order), so a kind keeps its colour on every chart. */
export function fillsFor<K extends string>(keys: readonly K[]): Record<K, string> {
  let next = 0;
  return Object.fromEntries(keys.map((key) => [key, key === 'other' ? OTHER : PALETTE[next++ % PALETTE.length]!])) as Record<K, string>;
}
