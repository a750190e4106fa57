import { BLIND_GRIP_RANGES, blindGripForStack, solidLengthDash } from '../stock/fasteners';
import type { RivetHead } from '../stock/kinds';
import { flushPrepForSheet, flushSheetPreps, leavesKnifeEdge, MIN_COUNTERSINK_SHEET_IN, type FlushPrep, type FlushSheets } from './flush-prep';
import { cleanLength, diameterWords, lengthWords } from './length-words';
import { nextDiameter32, noLargerDiameterMessage, repairNotice } from './repair';
import { sheetRuleFinding } from './sheet-rule';
import { halfLengthOffer, shopHeadFor, type ShopHead } from './shop-head';
import {
  DEFAULT_MAX_PITCH_DIAMETERS,
  drillSequence,
  familyOf,
  MIN_PITCH_DIAMETERS,
  MIN_TRANSVERSE_DIAMETERS,
  MAX_EDGE_DIAMETERS,
  minEdgeDiameters,
  MM_PER_INCH,
  rowHoles,
  SOFT_RIVET_CAUTION,
  TEMP_FASTENER_FOR_DRILL,
  TRANSVERSE_PITCH_OF_PITCH,
  type EstimateRivetKind,
  type RowPattern,
} from './rivet-rules';

export type LengthUnit = 'in' | 'mm';

export interface RivetLineInput {
  length: number;
  rows?: number;
  /** Inline (the default) or staggered by half a pitch. */
  rowPattern?: RowPattern;
  /** The given spacing between rows, in the line's unit. */
  rowSpacing?: number;
  pitch?: number;
  holesPerRow?: number;
  edgeDistance?: number;
  stack: number[];
  structural?: boolean;
  /** Flush heads: the plans' choice for the top sheet; when absent, the minimum-gage rule decides. */
  flushPrep?: FlushPrep;
  /** The line replaces drilled-out rivets: it uses the next standard diameter up. */
  repair?: boolean;
  rivet: { kind: EstimateRivetKind; head: RivetHead; diameter32: number; material?: string };
}

export interface EstimateNotice {
  code: string;
  message: string;
}

export interface LineOptions {
  unit: LengthUnit;
  /** The build's own edge distance floor, in inches. */
  edgeFloorIn?: number | null;
  maxPitchDiameters?: number;
  /** A bin's own hole drill for this rivet, replacing the usual final drill. */
  finalDrillOverride?: string | null;
}

export interface LineEstimate {
  holesPerRow: number;
  holes: number;
  pitch: number;
  edgeDistance: number;
  /** Between rows, in the line's unit: only on lines of more than one row. */
  transversePitch?: number;
  grip: number | null;
  drillSequence: readonly string[];
  tempFasteners: Readonly<Record<string, number>>;
  warnings: readonly EstimateNotice[];
  /** Flush heads: how the top sheet takes the head; null on protruding heads. */
  flushPrep: FlushPrep | null;
  /** Solid rivets: the shop head the length allowance makes, in the line's unit; null on blind rivets. */
  shopHead: Readonly<ShopHead> | null;
  /** Solid rivets: the half-length dash below `grip` when it still fits (an offer); else null. */
  halfLength: number | null;
  /** Repair lines only: the diameter used, the next size up from the drilled-out rivets'. */
  diameter32?: number;
}

/** A line the estimator must refuse: the code and the words say why. */
export interface LineError extends EstimateNotice {
  error: true;
}

const clean = cleanLength;
const NO_WARNINGS: readonly EstimateNotice[] = Object.freeze([]);

/**
 * Temporary fasteners by size: `perStep` for each drill step. Lines with the same steps and count
 * share one frozen answer, so a long list of lines does not leave one object per line to collect.
 */
const fastenerCounts = new Map<readonly string[], Map<number, Readonly<Record<string, number>>>>();
function tempFastenersFor(steps: readonly string[], perStep: number): Readonly<Record<string, number>> {
  let bySteps = fastenerCounts.get(steps);
  if (!bySteps) fastenerCounts.set(steps, (bySteps = new Map<number, Readonly<Record<string, number>>>()));
  let counts = bySteps.get(perStep);
  if (!counts) {
    const made: Record<string, number> = {};
    for (const step of steps) {
      const size = TEMP_FASTENER_FOR_DRILL[step];
      if (size) made[size] = (made[size] ?? 0) + perStep;
    }
    if (bySteps.size < 5000) bySteps.set(perStep, (counts = Object.freeze(made)));
    else counts = made;
  }
  return counts;
}

const diaWords = diameterWords;

/**
 * One rivet line: holes, actual pitch, edge distance, grip, drill steps and temporary fasteners.
 * Lengths are in `unit`; the rivet diameter is converted to it for the spacing rules.
 */
export function estimateLine(line: RivetLineInput, options: LineOptions): LineEstimate | LineError {
  const unit = options.unit;
  /** Inches to the line's unit. */
  const scale = unit === 'mm' ? MM_PER_INCH : 1;
  const { kind, head } = line.rivet;
  const warnings: EstimateNotice[] = [];
  // Most lines have no warning: they share one frozen empty list (10,000 lines make 10,000 fewer arrays to collect).

  if (kind === 'blind-general' && line.structural) {
    return { error: true, code: 'SOFT_RIVET_ON_STRUCTURE', message: `A general-purpose blind rivet cannot go on a structural line. ${SOFT_RIVET_CAUTION}` };
  }
  // A repair uses the next standard diameter up, and every rule below is worked for it.
  const diameter32 = line.repair ? nextDiameter32(line.rivet.diameter32) : line.rivet.diameter32;
  if (diameter32 === null) return { error: true, code: 'NO_LARGER_DIAMETER', message: noLargerDiameterMessage(line.rivet.diameter32) };
  if (line.repair) warnings.push(repairNotice(line.rivet.diameter32, diameter32));
  const d = (diameter32 / 32) * scale;

  let stackSum = 0;
  let thickest = 0;
  for (const t of line.stack) {
    stackSum += t;
    if (t > thickest) thickest = t;
  }
  const sheet = sheetRuleFinding(diameter32, thickest, unit);
  if (sheet?.code === 'DIAMETER_BELOW_SHEET_THICKNESS' && line.structural) return { error: true, code: sheet.code, message: sheet.message };

  const minEdge = minEdgeDiameters(head) * d;
  let edge: number;
  if (line.edgeDistance !== undefined) {
    edge = line.edgeDistance;
    if (edge < minEdge - 1e-9) {
      warnings.push({
        code: 'EDGE_BELOW_MINIMUM',
        message: `Edge distance ${lengthWords(edge, unit)} is below the published minimum of ${minEdgeDiameters(head)}D = ${lengthWords(minEdge, unit)} for a ${diaWords(diameter32)} ${head === 'countersunk' ? 'countersunk ' : ''}rivet.`,
      });
    } else if (edge > MAX_EDGE_DIAMETERS * d + 1e-9) {
      warnings.push({
        code: 'EDGE_ABOVE_MAXIMUM',
        message: `Edge distance ${lengthWords(edge, unit)} is above the usual maximum of about ${MAX_EDGE_DIAMETERS}D = ${lengthWords(MAX_EDGE_DIAMETERS * d, unit)} for a ${diaWords(diameter32)} rivet.`,
      });
    }
  } else {
    edge = Math.max(minEdge, options.edgeFloorIn ? options.edgeFloorIn * scale : 0);
  }

  const span = line.length - 2 * edge;
  if (span <= 1e-9) {
    return {
      error: true,
      code: 'LINE_TOO_SHORT',
      message: `A line of ${lengthWords(line.length, unit)} is too short for two holes ${lengthWords(edge, unit)} from each end; it needs more than ${lengthWords(2 * edge, unit)}.`,
    };
  }
  const holesPerRow = line.holesPerRow ?? Math.ceil(span / line.pitch! - 1e-9) + 1;
  const pitch = span / (holesPerRow - 1);
  const minPitch = MIN_PITCH_DIAMETERS * d;
  if (pitch < minPitch - 1e-9) {
    return {
      error: true,
      code: 'PITCH_BELOW_MINIMUM',
      message: `${holesPerRow} holes give a pitch of ${lengthWords(pitch, unit)}, below the published minimum of 3D = ${lengthWords(minPitch, unit)} for a ${diaWords(diameter32)} rivet. Use fewer holes or a wider pitch.`,
    };
  }
  const maxD = options.maxPitchDiameters ?? DEFAULT_MAX_PITCH_DIAMETERS;
  if (pitch > maxD * d + 1e-9) {
    warnings.push({ code: 'PITCH_ABOVE_MAXIMUM', message: `The pitch of ${lengthWords(pitch, unit)} is above the chapter's maximum of ${maxD}D = ${lengthWords(maxD * d, unit)}.` });
  }

  const stackIn = stackSum / scale;
  let grip: number | null;
  let shopHead: Readonly<ShopHead> | null = null;
  let halfLength: number | null = null;
  if (familyOf(kind) === 'solid') {
    grip = solidLengthDash(stackIn, diameter32);
    shopHead = shopHeadFor(diameter32, unit);
    halfLength = halfLengthOffer(stackIn + 1.5 * (diameter32 / 32), grip);
  } else {
    grip = blindGripForStack(stackIn) ?? null;
    const longest = BLIND_GRIP_RANGES.at(-1)!;
    if (grip === null && stackIn > longest.max) {
      warnings.push({ code: 'STACK_BEYOND_LONGEST_GRIP', message: `The stack of ${stackIn.toFixed(3)} in is beyond the longest grip, −${longest.dash} (${longest.min.toFixed(3)}–${longest.max.toFixed(3)} in).` });
    } else if (grip === null) {
      grip = BLIND_GRIP_RANGES[0]!.dash;
      warnings.push({ code: 'STACK_BELOW_SHORTEST_GRIP', message: `The stack of ${stackIn.toFixed(3)} in is thinner than the shortest grip range (from ${BLIND_GRIP_RANGES[0]!.min.toFixed(3)} in).` });
    }
  }

  const rows = line.rows ?? 1;
  const holes = rowHoles(holesPerRow, rows, line.rowPattern);
  const steps = drillSequence(kind, diameter32, options.finalDrillOverride);
  const tempFasteners = tempFastenersFor(steps, Math.ceil(holes / 3));
  const edgeDistance = clean(edge);
  const flushPrep = head === 'countersunk' ? flushPrepOf(line, line.stack[0]! / scale, diameter32, unit, warnings) : null;
  // Only a line of more than one row has a transverse pitch, only a repair its diameter: other answers stay as they were.
  // Plain literals, not a spread: the estimator runs over thousands of lines.
  const transversePitch = rows > 1 ? clean(transversePitchFor(line.rowSpacing, pitch, d, diameter32, unit, warnings)) : undefined;
  const answer: LineEstimate =
    transversePitch === undefined
      ? { holesPerRow, holes, pitch: clean(pitch), edgeDistance, grip, drillSequence: steps, tempFasteners, warnings: NO_WARNINGS, flushPrep, shopHead, halfLength }
      : { holesPerRow, holes, pitch: clean(pitch), edgeDistance, transversePitch, grip, drillSequence: steps, tempFasteners, warnings: NO_WARNINGS, flushPrep, shopHead, halfLength };
  // The sheet rule's warning comes first (after a repair's): a line with no other shares that finding's list, so it makes none.
  if (sheet !== null && warnings.length === 0) answer.warnings = sheet.alone;
  else if (warnings.length > 0) {
    if (sheet !== null) warnings.splice(line.repair ? 1 : 0, 0, sheet.alone[0]!);
    answer.warnings = warnings;
  }
  if (line.repair) answer.diameter32 = diameter32;
  return answer;
}

/** The top sheet's preparation: the plans' choice (a countersink below the minimum gage warns of a knife edge), else the minimum-gage rule. */
function flushPrepOf(line: RivetLineInput, topIn: number, diameter32: number, unit: LengthUnit, warnings: EstimateNotice[]): FlushPrep {
  if (line.flushPrep === undefined) return flushPrepForSheet(topIn, diameter32);
  if (line.flushPrep === 'countersink' && leavesKnifeEdge(topIn, diameter32)) {
    warnings.push({
      code: 'COUNTERSINK_KNIFE_EDGE',
      message: `Countersinking the ${lengthWords(line.stack[0]!, unit)} top sheet for a ${diaWords(diameter32)} rivet would go through the sheet and leave a knife edge that can tear out and weaken the joint: the minimum for a machine countersink is ${lengthWords(MIN_COUNTERSINK_SHEET_IN[diameter32]! * (unit === 'mm' ? MM_PER_INCH : 1), unit)}. Dimple it instead.`,
    });
  }
  return line.flushPrep;
}

/** What a flush line's stack needs from the crib: a countersink cutter, dimple dies, or both (the sheet under a dimple countersunk to take it). */
export function flushSheetNeeds(line: RivetLineInput, flushPrep: FlushPrep, diameter32: number, unit: LengthUnit): FlushSheets {
  return flushSheetPreps(line.stack, unit === 'mm' ? MM_PER_INCH : 1, diameter32, flushPrep);
}

/** The spacing between rows: the given one (warned below 2.5D), else 75 % of the actual pitch and at least 2.5D. */
function transversePitchFor(given: number | undefined, pitch: number, d: number, diameter32: number, unit: LengthUnit, warnings: EstimateNotice[]): number {
  const min = MIN_TRANSVERSE_DIAMETERS * d;
  if (given === undefined) return Math.max(TRANSVERSE_PITCH_OF_PITCH * pitch, min);
  if (given < min - 1e-9) {
    warnings.push({
      code: 'TRANSVERSE_PITCH_BELOW_MINIMUM',
      message: `Row spacing ${lengthWords(given, unit)} is below the published minimum of ${MIN_TRANSVERSE_DIAMETERS}D = ${lengthWords(min, unit)} for a ${diaWords(diameter32)} rivet.`,
    });
  }
  return given;
}
