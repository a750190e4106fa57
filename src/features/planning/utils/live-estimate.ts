import { estimate, isEstimateErrors, type EstimateResult } from '@shared/estimate/estimate';
import { estimateLine, type RivetLineInput } from '@shared/estimate/estimate-line';
import { withRules, type RuledLineEstimate } from '@shared/estimate/line-rules';
import { assemblyLineSchema, type LengthUnit } from '@shared/schemas/builds';
import { toLine, type LineValues } from './form-values';

export type LiveLine =
  | { state: 'incomplete' }
  | { state: 'error'; code: string; message: string }
  | { state: 'ok'; estimate: RuledLineEstimate; line: RivetLineInput };

export interface LiveEstimate {
  lines: LiveLine[];
  /** The whole assembly's estimate over the complete lines; null while any line is refused or none is complete. */
  result: EstimateResult | null;
  errors: number;
  incomplete: number;
}

export interface LiveOptions {
  edgeFloorIn?: number | null;
  wastePercent: number;
  /** The chapter's widest pitch, in rivet diameters, before a warning. */
  maxPitchDiameters?: number;
}

/**
 * The estimate as the form stands: each complete line on its own (so a refused line says why at the
 * line, and the others still show theirs), then the shared estimate over all of them for the totals.
 */
export function liveEstimate(unit: LengthUnit, values: readonly LineValues[], options: LiveOptions): LiveEstimate {
  const complete: Parameters<typeof estimate>[0]['lines'] = [];
  const lines = values.map((v): LiveLine => {
    const parsed = assemblyLineSchema.safeParse(toLine(v));
    if (!parsed.success) return { state: 'incomplete' };
    const lineOptions = { unit, edgeFloorIn: options.edgeFloorIn, maxPitchDiameters: options.maxPitchDiameters };
    const r = estimateLine(parsed.data, lineOptions);
    if ('error' in r) return { state: 'error', code: r.code, message: r.message };
    complete.push(parsed.data);
    // Each number with its rule and source, as the server's estimate gives them.
    return { state: 'ok', estimate: withRules(parsed.data, r, lineOptions), line: parsed.data };
  });
  const errors = lines.filter((l) => l.state === 'error').length;
  const incomplete = lines.filter((l) => l.state === 'incomplete').length;
  let result: EstimateResult | null = null;
  if (errors === 0 && complete.length > 0) {
    const r = estimate({ unit, lines: complete }, { edgeFloorIn: options.edgeFloorIn, maxPitchDiameters: options.maxPitchDiameters, defaultWastePercent: options.wastePercent });
    result = isEstimateErrors(r) ? null : r;
  }
  return { lines, result, errors, incomplete };
}
