import { valuesOf } from '../words/labelled-values';

/** What a bin holds, with its words. The first three are rivets and carry a fastener spec. */
export const BIN_KIND_LABELS = {
  blind_structural: 'Blind rivet – structural',
  blind_general: 'Blind rivet – general purpose',
  solid_rivet: 'Solid rivet',
  screw: 'Screw',
  nut: 'Nut',
  washer: 'Washer',
  drill_bit: 'Drill bit',
  deburring_blade: 'Deburring blade',
  sealant_primer: 'Sealant or primer',
  other: 'Other',
} as const;
export type BinKind = keyof typeof BIN_KIND_LABELS;
export const BIN_KINDS = valuesOf(BIN_KIND_LABELS);

export const RIVET_KINDS = ['blind_structural', 'blind_general', 'solid_rivet'] as const satisfies readonly BinKind[];
export type RivetKind = (typeof RIVET_KINDS)[number];
export const isRivetKind = (kind: BinKind): kind is RivetKind => (RIVET_KINDS as readonly string[]).includes(kind);
export const isBlindKind = (kind: BinKind) => kind === 'blind_structural' || kind === 'blind_general';

/** Head styles: dome (the universal head on a solid rivet), 100° countersunk, large flange. */
export const RIVET_HEADS = ['dome', 'countersunk', 'flange'] as const;
export type RivetHead = (typeof RIVET_HEADS)[number];
export const RIVET_HEAD_LABELS: Record<RivetHead, string> = {
  dome: 'dome',
  countersunk: '100° countersunk',
  flange: 'large flange',
};

/** Head words for a solid rivet: its protruding head (MS20470) is the universal head; blind rivets keep dome. */
const SOLID_RIVET_HEAD_LABELS: Record<RivetHead, string> = { ...RIVET_HEAD_LABELS, dome: 'universal head' };

/** How a head is named on screen: `solid` for solid rivets, which the trade calls by other words. */
export const rivetHeadLabel = (head: RivetHead, solid: boolean): string => (solid ? SOLID_RIVET_HEAD_LABELS : RIVET_HEAD_LABELS)[head];

const firstUpper = (text: string): string => text.replace(/^./, (c) => c.toUpperCase());

/**
 * The heads a solid rivet comes with: universal (MS20470) and 100° countersunk (MS20426), the solid
 * rivet heads the references name (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1). A large flange
 * is a blind-rivet head.
 */
export const SOLID_RIVET_HEADS = ['dome', 'countersunk'] as const satisfies readonly RivetHead[];
export const isSolidRivetHead = (head: RivetHead): boolean => (SOLID_RIVET_HEADS as readonly RivetHead[]).includes(head);
export const SOLID_RIVET_HEAD_WORDS = 'A solid rivet’s head is universal or 100° countersunk; large flange is a blind-rivet head.';

/**
 * A form's head choices, worded for the rivet: "Universal head" on a solid rivet, "Dome" on a blind one; the stored value is the same.
 * A solid rivet is offered its own heads only; a form that still holds another (`current`) keeps it listed, so the field shows what the form holds and the refusal beside it makes sense.
 */
export const rivetHeadChoices = (solid: boolean, current?: RivetHead | null): { value: RivetHead; label: string }[] =>
  RIVET_HEADS.filter((h) => !solid || isSolidRivetHead(h) || h === current).map((h) => ({ value: h, label: firstUpper(rivetHeadLabel(h, solid)) }));

/** The rivet gun set for a solid rivet's head, in the words the crib kit and the assembly editor share. */
export const RIVET_SET_WORDS: Record<RivetHead, string> = { dome: 'universal-head rivet set', flange: 'universal-head rivet set', countersunk: 'flush rivet set' };

/** The rivet gun set for a solid rivet's head as a sentence starts it: "Universal-head rivet set". */
export const rivetSetSentence = (head: RivetHead): string => firstUpper(RIVET_SET_WORDS[head]);

/** Body materials and grades as the trade names them. */
export const RIVET_MATERIALS = ['5056', '2117-T4', '2024-T4', '2017-T4', '1100', 'aluminium', 'monel', 'stainless', 'steel', 'copper'] as const;
export type RivetMaterial = (typeof RIVET_MATERIALS)[number];

/** Mandrel (stem) materials of blind rivets. */
export const STEM_MATERIALS = ['steel', 'stainless', 'aluminium'] as const;
export type StemMaterial = (typeof STEM_MATERIALS)[number];

/** Kinds of ledger entry. A transfer writes one entry on each bin; a reversal names the entry it undoes. */
export const MOVEMENT_KINDS = ['receive', 'draw', 'return_unused', 'count', 'transfer_out', 'transfer_in', 'write_off', 'reversal'] as const;
export type MovementKind = (typeof MOVEMENT_KINDS)[number];

export const MOVEMENT_LABELS: Record<MovementKind, string> = {
  receive: 'Received',
  draw: 'Drawn',
  return_unused: 'Returned unused',
  count: 'Count adjustment',
  transfer_out: 'Moved out',
  transfer_in: 'Moved in',
  write_off: 'Written off',
  reversal: 'Reversal',
};

export const BIN_CODE_PATTERN = /^B-\d{4,6}$/;
