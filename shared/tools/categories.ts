import { valuesOf } from '../words/labelled-values';

/**
 * Every tool category, one row each: its words, and its default loan period in days (chapter practice,
 * editable per tool): powered and calibrated tools come back sooner so others can use them; bits and
 * hand tools follow a project.
 */
const CATEGORIES = {
  hand_rivet_puller: { label: 'Hand rivet puller', loanDays: 14 },
  pneumatic_rivet_puller: { label: 'Pneumatic rivet puller', loanDays: 7 },
  air_drill: { label: 'Air drill', loanDays: 7 },
  rivet_gun: { label: 'Rivet gun', loanDays: 7 },
  bucking_bar: { label: 'Bucking bar', loanDays: 14 },
  drill_bit: { label: 'Drill bit', loanDays: 14 },
  countersink_cutter: { label: '100° countersink cutter', loanDays: 14 },
  dimple_dies: { label: '100° dimple dies', loanDays: 14 },
  temporary_fastener_tray: { label: 'Temporary fastener tray', loanDays: 14 },
  deburring_tool: { label: 'Deburring tool', loanDays: 14 },
  spacing_fan: { label: 'Rivet spacing fan', loanDays: 14 },
  torque_wrench: { label: 'Torque wrench', loanDays: 3 },
  measuring: { label: 'Measuring tool', loanDays: 7 },
  other: { label: 'Other', loanDays: 7 },
} as const satisfies Record<string, { label: string; loanDays: number }>;
export type ToolCategory = keyof typeof CATEGORIES;
export const TOOL_CATEGORIES = valuesOf(CATEGORIES);

const column = <K extends 'label' | 'loanDays'>(key: K) =>
  Object.fromEntries(TOOL_CATEGORIES.map((c) => [c, CATEGORIES[c][key]])) as Record<ToolCategory, (typeof CATEGORIES)[ToolCategory][K]>;
export const CATEGORY_LABELS: Record<ToolCategory, string> = column('label');
export const DEFAULT_LOAN_DAYS: Record<ToolCategory, number> = column('loanDays');

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
