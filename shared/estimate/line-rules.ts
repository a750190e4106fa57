import type { RivetHead } from '../stock/kinds';
import type { LengthUnit, LineEstimate, RivetLineInput } from './estimate-line';
import {
  DEFAULT_MAX_PITCH_DIAMETERS,
  familyOf,
  MAX_EDGE_DIAMETERS,
  MIN_PITCH_DIAMETERS,
  MIN_TRANSVERSE_DIAMETERS,
  minEdgeDiameters,
  MM_PER_INCH,
  PILOT_DRILL,
  TRANSVERSE_PITCH_OF_PITCH,
} from './rivet-rules';

/**
 * The published sources by the short names of trade-checks.md and the constants' doc comments.
 * "Common practice" is shop practice with no published source; "(secondary)" marks a restatement.
 */
export const SOURCES = {
  acRepairs: 'AC 43.13-1B ch. 4',
  acDiameter: 'AC 43.13-1B para 4-58g',
  armyRiveting: 'TM 10-5410-229-13&P',
  armyRivetingEdge: 'TM 10-5410-229-13&P para 5-6',
  armyBlindChart: 'TM 10-5410-221-14/1 Table 4-3',
  armyCountersink: 'TM 9-2320-363-34-2',
  faaAirframe: 'FAA-H-8083-31',
  faaAirframeDrills: 'FAA-H-8083-31 ch. 4',
  navyStructures: 'NAVEDTRA 14018 ch. 13',
  navyFasteners: 'NAVEDTRA 14315',
  faaDerived: 'FAA-derived sources',
  common: 'common practice',
} as const;

const both = (...sources: string[]) => sources.join('; ');

/** The two published maximum pitches: the sources disagree, so the chapter's maximum is a setting. */
export const PUBLISHED_PITCH_MAXIMA = [
  { diameters: 8, source: SOURCES.navyStructures },
  { diameters: 10, source: `${SOURCES.faaDerived}, secondary` },
] as const;
/** "8D (NAVEDTRA 14018 ch. 13) and 10D (FAA-derived sources, secondary)": for the rules and the settings' help. */
export const PUBLISHED_PITCH_MAXIMA_WORDS = PUBLISHED_PITCH_MAXIMA.map((m) => `${m.diameters}D (${m.source})`).join(' and ');

/** Every value a rule can explain: a line's numbers, the totals' numbers. */
export const RULE_VALUES = [
  'edgeDistance',
  'pitch',
  'holesPerRow',
  'holes',
  'transversePitch',
  'grip',
  'drillSequence',
  'tempFasteners',
  'rivetsWithWaste',
  'flushPrep',
  'shopHead',
  'diameter',
  'repair',
] as const;
export type RuleValue = (typeof RULE_VALUES)[number];

/** Why a number is what it is: the rule that gave it and where the rule is published. */
export interface LineRule {
  value: RuleValue;
  rule: string;
  source: string;
}

export type RuledLineEstimate = LineEstimate & { rules: readonly LineRule[] };

const rule = (value: RuleValue, text: string, source: string): LineRule => Object.freeze({ value, rule: text, source });
const D = (n: number) => `${n}D`;
const headWords = (countersunk: boolean) => (countersunk ? 'countersunk head' : 'protruding head');

/**
 * The rule texts, one place for each: the estimate's lines and totals use them, and so may the
 * estimator's flush, shop head, diameter and repair checks (`flushPrep`, `shopHead`, `diameter`, `repair`).
 */
export const RULES = {
  edgeMinimum: (countersunk: boolean) =>
    rule('edgeDistance', `${D(minEdgeDiameters(countersunk ? 'countersunk' : 'dome'))}, ${headWords(countersunk)}`, countersunk ? SOURCES.faaAirframe : both(SOURCES.acRepairs, SOURCES.armyRivetingEdge)),
  edgeFloor: (countersunk: boolean) =>
    rule('edgeDistance', `The build’s edge distance floor, more than the ${D(minEdgeDiameters(countersunk ? 'countersunk' : 'dome'))} minimum for a ${headWords(countersunk)}`, `the build’s setting; ${SOURCES.common}`),
  edgeGiven: (countersunk: boolean) =>
    rule(
      'edgeDistance',
      `Given on the line, checked against ${D(minEdgeDiameters(countersunk ? 'countersunk' : 'dome'))} (${headWords(countersunk)}) and about ${D(MAX_EDGE_DIAMETERS)} at most`,
      both(countersunk ? SOURCES.faaAirframe : both(SOURCES.acRepairs, SOURCES.armyRivetingEdge), `${SOURCES.faaAirframe} (secondary) for ${D(MAX_EDGE_DIAMETERS)}`),
    ),
  pitch: (maxDiameters: number) =>
    rule(
      'pitch',
      `Spread evenly, (L − 2e) / (n − 1); at least ${D(MIN_PITCH_DIAMETERS)}, at most the chapter’s ${D(maxDiameters)}; published maxima ${PUBLISHED_PITCH_MAXIMA_WORDS}`,
      both(SOURCES.acRepairs, SOURCES.armyRiveting, SOURCES.navyStructures),
    ),
  holesPerRowByPitch: rule('holesPerRow', 'n = ⌈(L − 2e) / p⌉ + 1: end holes at the edge distance, the rest evenly spaced no wider than the target pitch', SOURCES.common),
  holesPerRowGiven: rule('holesPerRow', 'Given on the line: end holes at the edge distance, the rest evenly between', SOURCES.common),
  holesOneRow: rule('holes', 'One row: the holes of the row', SOURCES.common),
  holesInline: rule('holes', 'The holes of a row times the rows', SOURCES.common),
  holesStaggered: rule('holes', 'The holes of a row times the rows, one fewer in every second row (staggered half a pitch along)', SOURCES.common),
  transverseDefault: rule(
    'transversePitch',
    `${TRANSVERSE_PITCH_OF_PITCH * 100} % of the pitch, and at least ${D(MIN_TRANSVERSE_DIAMETERS)}`,
    both(`${SOURCES.faaAirframe} (secondary)`, SOURCES.armyRiveting),
  ),
  transverseGiven: rule('transversePitch', `Given on the line, checked against ${D(MIN_TRANSVERSE_DIAMETERS)}`, SOURCES.armyRiveting),
  gripBlind: rule('grip', 'The grip dash whose 1/16 in band covers the stack, rounded to 0.001 in', SOURCES.armyBlindChart),
  gripSolid: rule('grip', 'L = grip + 1.5D, rounded up to the next 1/16 in', both(SOURCES.navyStructures, SOURCES.armyRiveting)),
  drillSteps: (solid: boolean) =>
    rule(
      'drillSequence',
      `Pilot ${PILOT_DRILL}, then the final drill of each smaller rivet size, then this rivet’s final drill`,
      both(SOURCES.common, `final drill ${solid ? SOURCES.faaAirframeDrills : SOURCES.armyBlindChart}`),
    ),
  drillStepsBinHole: (drill: string) =>
    rule('drillSequence', `Pilot ${PILOT_DRILL}, then the final drill of each smaller rivet size, then the bin’s own hole drill, ${drill}`, both(SOURCES.common, 'the bin’s hole drill')),
  tempFasteners: rule('tempFasteners', 'About every third hole, ⌈holes / 3⌉ for each drill step, each the size that fits that step’s hole', both(SOURCES.common, `sizes ${SOURCES.navyFasteners}`)),
  wasteChapter: (percent: number) => rule('rivetsWithWaste', `The chapter’s waste allowance of ${percent} %, added to each fastener and rounded up`, 'the chapter’s planning settings'),
  wasteRequest: (percent: number) => rule('rivetsWithWaste', `The waste allowance of ${percent} % sent with the lines, added to each fastener and rounded up`, 'given with the estimate'),
  wasteDefault: (percent: number) => rule('rivetsWithWaste', `The usual waste allowance of ${percent} %, added to each fastener and rounded up`, SOURCES.common),
  tempFastenersAtOnce: rule('tempFasteners', 'The most any one line needs at once, per size: they come out of one line and go into the next', SOURCES.common),
  flushCountersink: rule('flushPrep', 'Machine countersink: the head’s sheet is at least the minimum gage for a 100° machine countersink of this rivet', SOURCES.armyCountersink),
  flushDimple: rule('flushPrep', 'Dimple: the head’s sheet is thinner than the minimum gage for a 100° machine countersink; countersink the part beneath to take the dimple', SOURCES.armyCountersink),
  shopHead: rule('shopHead', 'Shop head about 1.5D wide and 0.5D high: what the length allowance is for', SOURCES.faaAirframe),
  diameter: rule('diameter', 'About 3 times the thickest sheet', both(SOURCES.acDiameter, SOURCES.navyStructures)),
  flushGiven: (prep: 'countersink' | 'dimple') =>
    rule('flushPrep', `${prep === 'countersink' ? 'Machine countersink' : 'Dimple'}, as given on the line (the plans’ choice), checked against the minimum gage for a 100° machine countersink`, SOURCES.armyCountersink),
  repair: rule('repair', 'A drilled-out rivet is replaced by the next diameter up; edge distance and pitch are checked again for it', SOURCES.common),
} as const;

/** What the rules of a line depend on, beyond the line itself. */
export interface RuleOptions {
  unit: LengthUnit;
  edgeFloorIn?: number | null;
  maxPitchDiameters?: number;
  finalDrillOverride?: string | null;
}

const EDGE_MIN = 0;
const EDGE_FLOOR = 1;
const EDGE_GIVEN = 2;

/**
 * The rules of one line, from the line as entered and its estimate. Lines that take the same rules
 * share one frozen list: a rule set is keyed by a few choices (family, head, edge, spacing, rows),
 * the chapter's maximum pitch and a bin's own hole drill, so 20,000 lines make a handful of lists.
 */
export function lineRules(line: RivetLineInput, estimate: LineEstimate, options: RuleOptions): readonly LineRule[] {
  const { kind, head } = line.rivet;
  // A repair line is worked one size up: its edge rule is for the diameter used.
  const diameter32 = estimate.diameter32 ?? line.rivet.diameter32;
  const countersunk = head === 'countersunk';
  const minEdge = (minEdgeDiameters(head) * diameter32 * (options.unit === 'mm' ? MM_PER_INCH : 1)) / 32;
  const edge = line.edgeDistance !== undefined ? EDGE_GIVEN : estimate.edgeDistance > minEdge + 1e-6 ? EDGE_FLOOR : EDGE_MIN;
  const rows = line.rows ?? 1;
  const layout = rows <= 1 ? 0 : line.rowPattern === 'staggered' ? 2 : 1;
  const code =
    (familyOf(kind) === 'solid' ? 1 : 0) | (countersunk ? 2 : 0) | (edge << 2) | (line.holesPerRow !== undefined ? 16 : 0) | (layout << 5) | (layout > 0 && line.rowSpacing !== undefined ? 128 : 0) |
    ((estimate.flushPrep === null ? 0 : estimate.flushPrep === 'countersink' ? 1 : 2) << 8) |
    (line.flushPrep !== undefined ? 1024 : 0) |
    (line.repair ? 2048 : 0);
  const maxD = options.maxPitchDiameters ?? DEFAULT_MAX_PITCH_DIAMETERS;
  const drill = options.finalDrillOverride ?? '';
  const byCode = setsFor(maxD, drill);
  let rules = byCode.get(code);
  if (!rules) byCode.set(code, (rules = buildRules(code, head, maxD, drill)));
  return rules;
}

/** Rule sets by maximum pitch, then by a bin's hole drill ('' for none), then by the line's code. */
const ruleSets = new Map<number, Map<string, Map<number, readonly LineRule[]>>>();
/** The last lookup: the lines of one estimate share the maximum and, mostly, the drill. */
let last: { maxD: number; drill: string; sets: Map<number, readonly LineRule[]> } | undefined;
function setsFor(maxD: number, drill: string): Map<number, readonly LineRule[]> {
  if (last && last.maxD === maxD && last.drill === drill) return last.sets;
  const sets = lookUpSets(maxD, drill);
  last = { maxD, drill, sets };
  return sets;
}
function lookUpSets(maxD: number, drill: string): Map<number, readonly LineRule[]> {
  let byDrill = ruleSets.get(maxD);
  if (!byDrill) {
    byDrill = new Map();
    // The maximum is a chapter setting and drills come from bins: few of each, but keep the memory bounded.
    if (ruleSets.size < 100) ruleSets.set(maxD, byDrill);
  }
  let byCode = byDrill.get(drill);
  if (!byCode) {
    byCode = new Map();
    if (byDrill.size < 100) byDrill.set(drill, byCode);
  }
  return byCode;
}

function buildRules(code: number, head: RivetHead, maxD: number, drill: string): readonly LineRule[] {
  const solid = (code & 1) === 1;
  const countersunk = head === 'countersunk';
  const edge = (code >> 2) & 3;
  const layout = (code >> 5) & 3;
  const rules: LineRule[] = [
    edge === EDGE_GIVEN ? RULES.edgeGiven(countersunk) : edge === EDGE_FLOOR ? RULES.edgeFloor(countersunk) : RULES.edgeMinimum(countersunk),
    RULES.pitch(maxD),
    code & 16 ? RULES.holesPerRowGiven : RULES.holesPerRowByPitch,
    layout === 2 ? RULES.holesStaggered : layout === 1 ? RULES.holesInline : RULES.holesOneRow,
  ];
  if (layout > 0) rules.push(code & 128 ? RULES.transverseGiven : RULES.transverseDefault);
  rules.push(solid ? RULES.gripSolid : RULES.gripBlind, drill ? RULES.drillStepsBinHole(drill) : RULES.drillSteps(solid), RULES.tempFasteners);
  const flush = (code >> 8) & 3;
  if (flush > 0) {
    const prep = flush === 1 ? 'countersink' : 'dimple';
    rules.push(code & 1024 ? RULES.flushGiven(prep) : prep === 'countersink' ? RULES.flushCountersink : RULES.flushDimple);
  }
  if (solid) rules.push(RULES.shopHead);
  rules.push(RULES.diameter);
  if (code & 2048) rules.push(RULES.repair);
  return Object.freeze(rules);
}

/** Where the waste allowance came from: sent with the lines, the chapter's setting, or the usual default. */
export type WasteOrigin = 'request' | 'chapter' | 'default';

const totalsSets = new Map<string, readonly LineRule[]>();
/** The rules of the totals: the waste allowance and the temporary fasteners held at once. */
export function totalsRules(wastePercent: number, origin: WasteOrigin): readonly LineRule[] {
  const key = `${origin}|${wastePercent}`;
  let rules = totalsSets.get(key);
  if (!rules) {
    const waste = origin === 'request' ? RULES.wasteRequest(wastePercent) : origin === 'chapter' ? RULES.wasteChapter(wastePercent) : RULES.wasteDefault(wastePercent);
    rules = Object.freeze([waste, RULES.tempFastenersAtOnce]);
    if (totalsSets.size < 1000) totalsSets.set(key, rules);
  }
  return rules;
}

/** A line's estimate with its rules set on it (the estimate object is the caller's own, fresh from `estimateLine`). */
export function withRules(line: RivetLineInput, estimate: LineEstimate, options: RuleOptions): RuledLineEstimate {
  const ruled = estimate as RuledLineEstimate;
  ruled.rules = lineRules(line, estimate, options);
  return ruled;
}
