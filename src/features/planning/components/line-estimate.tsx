import type { LineEstimate, RivetLineInput } from '@shared/estimate/estimate-line';
import type { EstimateRivetKind } from '@shared/estimate/rivet-rules';
import type { LengthUnit } from '@shared/schemas/builds';
import { formatCount } from '@/lib/format';
import { diameterText, drillStepsText, FLUSH_PREP_WORDS, gripText, halfLengthText, lengthText, solidLengthText, tempFastenersText } from '../utils/words';
import { FactList } from './fact-list';

type RowLayout = Pick<RivetLineInput, 'rows' | 'rowPattern'> | undefined;

/** The holes in words: "42 (21 a row × 2 rows)", "41 (2 staggered rows of 21 and 20)". */
function holesText(line: LineEstimate, layout: RowLayout): string {
  const rows = layout?.rows ?? 1;
  if (rows <= 1) return formatCount(line.holes);
  if (layout?.rowPattern === 'staggered') return `${formatCount(line.holes)} (${rows} staggered rows of ${formatCount(line.holesPerRow)} and ${formatCount(line.holesPerRow - 1)})`;
  return `${formatCount(line.holes)} (${formatCount(line.holesPerRow)} a row × ${rows} rows)`;
}

/** One rivet line worked out: the terms a builder lays the line out with, then its warnings in words. `layout` is the line's rows as entered. */
export function LineEstimateView({ line, unit, kind, layout }: { line: LineEstimate; unit: LengthUnit; kind: EstimateRivetKind; layout: RowLayout }) {
  const facts: [string, string][] = [
    ...(line.diameter32 === undefined ? [] : [['Repair rivet', `${diameterText(line.diameter32)}, one size up`] as [string, string]]),
    ['Holes', holesText(line, layout)],
    ['Pitch', lengthText(line.pitch, unit)],
    ...(line.transversePitch === undefined ? [] : [['Transverse pitch (between rows)', lengthText(line.transversePitch, unit)] as [string, string]]),
    ['Edge distance', lengthText(line.edgeDistance, unit)],
    kind === 'solid' ? ['Rivet length', solidLengthText(line.grip, line.shopHead, unit)] : ['Grip', gripText(kind, line.grip)],
    ...(line.halfLength === null ? [] : [['Half length', halfLengthText(line.halfLength)] as [string, string]]),
    ...(line.flushPrep === null ? [] : [['Flush preparation', FLUSH_PREP_WORDS[line.flushPrep]] as [string, string]]),
    ['Drill steps', drillStepsText(line.drillSequence)],
    ['Temporary fasteners', tempFastenersText(line.tempFasteners)],
  ];
  return (
    <div className="flex flex-col gap-2">
      <FactList facts={facts} />
      {line.warnings.length > 0 && (
        <ul className="flex flex-col gap-1" aria-label="Warnings">
          {line.warnings.map((w) => (
            <li key={w.code} className="rounded-md border-l-4 border-warn bg-warn-soft px-3 py-2 text-sm">
              <strong>Caution:</strong> {w.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
