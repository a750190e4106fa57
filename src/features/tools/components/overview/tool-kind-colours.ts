import type { ToolCategory } from '@shared/tools/categories';

/**
 * One fill per tool kind for the loans chart, from the app's ink, brass and signal colours first,
 * then muted shop tones; neighbours in catalogue order differ in lightness as well as hue, and the
 * table beside the chart carries every figure in words.
 */
export const TOOL_KIND_COLOURS: Record<ToolCategory, string> = {
  hand_rivet_puller: '#1d2b36', // ink
  pneumatic_rivet_puller: '#7fa7c9', // pale slate blue
  air_drill: '#f2b134', // brass
  rivet_gun: '#1f6f43', // ok green
  bucking_bar: '#a9c7a0', // sage
  drill_bit: '#8a5a00', // brass deep
  temporary_fastener_tray: '#a2281b', // bad red
  deburring_tool: '#e3a396', // clay
  spacing_fan: '#6b4f8a', // plum
  torque_wrench: '#c9b8e0', // lilac
  measuring: '#2f6f8f', // deep teal
  other: '#6b7d8a', // steel
};
