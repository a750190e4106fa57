import type { LineEstimate, RivetLineInput } from '@shared/estimate/estimate-line';
import type { LineRule } from '@shared/estimate/line-rules';
import type { EstimateRivetKind } from '@shared/estimate/rivet-rules';
import type { LengthUnit } from '@shared/schemas/builds';
import { formatCount } from '@/lib/format';
import { diameterText, drillStepsText, FLUSH_PREP_WORDS, gripText, halfLengthText, lengthText, solidLengthText, tempFastenersText } from '../utils/words';
import { FactList, type Fact } from './fact-list';
import { rulesFor } from './why-rule';

type RowLayout = Pick<RivetLineInput, 'rows' | 'rowPattern'> | undefined;

/** The holes in words: "42 (21 a row × 2 rows)", "41 (2 staggered rows of 21 and 20)". */
function holesText(line: LineEstimate, layout: RowLayout): string {
  const rows = layout?.rows ?? 1;
  if (rows <= 1) return formatCount(line.holes);
  if (layout?.rowPattern === 'staggered') return `${formatCount(line.holes)} (${rows} staggered rows of ${formatCount(line.holesPerRow)} and ${formatCount(line.holesPerRow - 1)})`;
  return `${formatCount(line.holes)} (${formatCount(line.holesPerRow)} a row × ${rows} rows)`;
}

/**
 * One rivet line worked out: the terms a builder lays the line out with, each with its rule and source
 * behind a "Why?", then its warnings in words. `layout` is the line's rows as entered.
 */
export function LineEstimateView({ line, unit, kind, layout }: { line: LineEstimate & { rules?: readonly LineRule[] }; unit: LengthUnit; kind: EstimateRivetKind; layout: RowLayout }) {
  const why = (...values: LineRule['value'][]) => rulesFor(line.rules, ...values);
  const facts: Fact[] = [
    ...(line.diameter32 === undefined ? [] : [['Repair rivet', `${diameterText(line.diameter32)}, one size up`, why('repair')] as const]),
    ['Holes', holesText(line, layout), why('holesPerRow', 'holes')],
    ['Pitch', lengthText(line.pitch, unit), why('pitch')],
    ...(line.transversePitch === undefined ? [] : [['Transverse pitch (between rows)', lengthText(line.transversePitch, unit), why('transversePitch')] as const]),
    ['Edge distance', lengthText(line.edgeDistance, unit), why('edgeDistance')],
    kind === 'solid' ? ['Rivet length', solidLengthText(line.grip, line.shopHead, unit), why('grip', 'shopHead')] : ['Grip', gripText(kind, line.grip), why('grip')],
    ...(line.halfLength === null ? [] : [['Half length', halfLengthText(line.halfLength)] as const]),
    ...(line.flushPrep === null ? [] : [['Flush preparation', FLUSH_PREP_WORDS[line.flushPrep], why('flushPrep')] as const]),
    ['Drill steps', drillStepsText(line.drillSequence), why('drillSequence')],
    ['Temporary fasteners', tempFastenersText(line.tempFasteners), why('tempFasteners')],
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
