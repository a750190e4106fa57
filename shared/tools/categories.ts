import { valuesOf } from '../words/labelled-values';

/** What a tool is, with its words. */
export const CATEGORY_LABELS = {
  hand_rivet_puller: 'Hand rivet puller',
  pneumatic_rivet_puller: 'Pneumatic rivet puller',
  air_drill: 'Air drill',
  rivet_gun: 'Rivet gun',
  bucking_bar: 'Bucking bar',
  drill_bit: 'Drill bit',
  countersink_cutter: '100° countersink cutter',
  dimple_dies: '100° dimple dies',
  temporary_fastener_tray: 'Temporary fastener tray',
  deburring_tool: 'Deburring tool',
  spacing_fan: 'Rivet spacing fan',
  torque_wrench: 'Torque wrench',
  measuring: 'Measuring tool',
  other: 'Other',
} as const;
export type ToolCategory = keyof typeof CATEGORY_LABELS;
export const TOOL_CATEGORIES = valuesOf(CATEGORY_LABELS);

/**
 * Default loan period in days per category (chapter practice, editable per tool): powered and
 * calibrated tools come back sooner so others can use them; bits and hand tools follow a project.
 */
export const DEFAULT_LOAN_DAYS: Record<ToolCategory, number> = {
  hand_rivet_puller: 14,
  pneumatic_rivet_puller: 7,
  air_drill: 7,
  rivet_gun: 7,
  bucking_bar: 14,
  drill_bit: 14,
  countersink_cutter: 14,
  dimple_dies: 14,
  temporary_fastener_tray: 14,
  deburring_tool: 14,
  spacing_fan: 14,
  torque_wrench: 3,
  measuring: 7,
  other: 7,
};

/** Categories made for one rivet size: the tool records the size (a countersink cutter also its pilot drill). */
export const RIVET_SIZED_CATEGORIES = ['countersink_cutter', 'dimple_dies'] as const satisfies readonly ToolCategory[];
export const isRivetSized = (category: ToolCategory | undefined): boolean => (RIVET_SIZED_CATEGORIES as readonly (ToolCategory | undefined)[]).includes(category);

/** Categories that are powered tools: the cautions about eye and hearing protection apply. */
export const POWERED_CATEGORIES: readonly ToolCategory[] = ['pneumatic_rivet_puller', 'air_drill', 'rivet_gun'];

export const TOOL_STATUSES = ['available', 'on_loan', 'held', 'out_of_service', 'lost', 'retired'] as const;
export type ToolStatus = (typeof TOOL_STATUSES)[number];

export const STATUS_LABELS: Record<ToolStatus, string> = {
  available: 'Available',
  on_loan: 'On loan',
  held: 'Held for the next person',
  out_of_service: 'Out of service',
  lost: 'Lost',
  retired: 'Retired',
};

/** Temporary fastener sizes (inch), keyed by size, never by colour alone: two sizes share black. */
export const TEMPORARY_FASTENER_SIZES = ['1/16', '3/32', '1/8', '5/32', '3/16', '1/4', '3/8'] as const;
export type TemporaryFastenerSize = (typeof TEMPORARY_FASTENER_SIZES)[number];
