import type { ToolCategory } from '../tools/categories';

/** The cautions shown beside tools that can hurt, in the order a list of them reads. */
export const TOOL_CAUTION_KEYS = ['drilling', 'compressed_air', 'rivet_gun', 'dimple_dies', 'eye_protection', 'hearing_protection'] as const;
export type ToolCautionKey = (typeof TOOL_CAUTION_KEYS)[number];

export interface ToolCaution {
  key: ToolCautionKey;
  title: string;
  text: string;
}

const TEXTS: Record<ToolCautionKey, Omit<ToolCaution, 'key'>> = {
  drilling: {
    title: 'Drilling',
    text: 'Clamp the work down; never hold a part in your hand against a turning bit. Chips are sharp and fly: sweep them with a brush, not your hand. Deburr both sides of every hole.',
  },
  compressed_air: {
    title: 'Air tools and compressed air',
    text: 'Never point an air line or an air tool at skin, yours or anyone else’s. Disconnect the air before you change a bit, a set or a nosepiece.',
  },
  rivet_gun: {
    title: 'Rivet gun',
    text: 'Never pull the trigger unless the set is on the rivet and the bucking bar is held behind it: a gun fired into the air can throw its set.',
  },
  dimple_dies: {
    title: 'Dimple dies',
    text: 'Keep your fingers clear of the dies: a squeezer or a dimpling frame closes them hard enough to crush a fingertip. Hold the sheet by its edge, away from the dies.',
  },
  eye_protection: {
    title: 'Eye protection',
    text: 'Wear safety glasses: chips, rivet stems and broken bits fly.',
  },
  hearing_protection: {
    title: 'Hearing protection',
    text: 'Wear ear plugs or ear muffs: rivet guns and air tools are loud enough to damage hearing, also for the person bucking.',
  },
};

/**
 * Which cautions each kind of tool carries. Drill motors and drill bits: drilling. Air drills,
 * pneumatic rivet pullers and rivet guns: compressed air and hearing. Rivet guns and the bucking
 * bars behind them: the rivet gun's trigger. A countersink cutter cuts like a bit: drilling. Dimple
 * dies close on the sheet: fingers clear. Eye protection with all of these.
 */
const BY_CATEGORY: Record<ToolCategory, readonly ToolCautionKey[]> = {
  hand_rivet_puller: [],
  pneumatic_rivet_puller: ['compressed_air', 'eye_protection', 'hearing_protection'],
  air_drill: ['drilling', 'compressed_air', 'eye_protection', 'hearing_protection'],
  rivet_gun: ['compressed_air', 'rivet_gun', 'eye_protection', 'hearing_protection'],
  bucking_bar: ['rivet_gun', 'eye_protection', 'hearing_protection'],
  drill_bit: ['drilling', 'eye_protection'],
  countersink_cutter: ['drilling', 'eye_protection'],
  dimple_dies: ['dimple_dies', 'eye_protection'],
  temporary_fastener_tray: [],
  deburring_tool: [],
  spacing_fan: [],
  torque_wrench: [],
  measuring: [],
  other: [],
};

/** The closing line under any list of tool cautions. */
export const TOOL_CAUTION_CLOSING =
  'The tool maker’s instructions govern how each tool is used, and a powered tool only after the chapter has signed you off for it.';

/** The cautions for tools of these categories, each once, in the fixed order; empty when none applies. */
export function toolCautions(categories: Iterable<ToolCategory>): ToolCaution[] {
  const keys = new Set<ToolCautionKey>();
  for (const category of categories) for (const key of BY_CATEGORY[category]) keys.add(key);
  return TOOL_CAUTION_KEYS.filter((key) => keys.has(key)).map((key) => ({ key, ...TEXTS[key] }));
}
