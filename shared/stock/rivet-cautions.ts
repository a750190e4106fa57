import { isRivetKind, type BinKind } from './kinds';

/**
 * The caution a rivet bin's page shows: what to match against the kit's plans and what to check
 * against the sheet stack. A solid rivet is chosen by its length (grip plus 1.5 D for the shop head,
 * rounded up to the next 1/16 in), a blind rivet by its grip. Undefined for bins that hold no rivets.
 */
export function rivetBinCaution(kind: BinKind): string | undefined {
  if (!isRivetKind(kind)) return undefined;
  const choice =
    kind === 'solid_rivet'
      ? 'Use the rivet the kit’s plans call for (material, head, diameter and length) and check the length against the sheet stack: grip plus 1.5 times the diameter, rounded up to the next 1/16 in.'
      : 'Use the rivet the kit’s plans call for (material, head, diameter and grip) and check the grip against the sheet stack.';
  const structure = kind === 'blind_general' ? 'General-purpose blind rivets are not for structural joints. ' : '';
  return `${structure}${choice} The plans, the rivet maker’s instructions and, for certificated aircraft, approved data and a licensed mechanic govern.`;
}

/** The short line a bin's label carries under its designation: general-purpose blind rivets are not for structure. */
export function binLabelCaution(kind: BinKind): string | undefined {
  return kind === 'blind_general' ? 'Not for structure' : undefined;
}
