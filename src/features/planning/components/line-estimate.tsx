import type { LineEstimate } from '@shared/estimate/estimate-line';
import type { EstimateRivetKind } from '@shared/estimate/rivet-rules';
import type { LengthUnit } from '@shared/schemas/builds';
import { formatCount } from '@/lib/format';
import { drillStepsText, gripText, lengthText, tempFastenersText } from '../utils/words';
import { FactList } from './fact-list';

/** One rivet line worked out: the terms a builder lays the line out with, then its warnings in words. */
export function LineEstimateView({ line, unit, kind }: { line: LineEstimate; unit: LengthUnit; kind: EstimateRivetKind }) {
  const rows = line.holesPerRow > 0 ? line.holes / line.holesPerRow : 1;
  const facts: [string, string][] = [
    ['Holes', rows > 1 ? `${formatCount(line.holes)} (${formatCount(line.holesPerRow)} a row × ${rows} rows)` : formatCount(line.holes)],
    ['Pitch', lengthText(line.pitch, unit)],
    ['Edge distance', lengthText(line.edgeDistance, unit)],
    [kind === 'solid' ? 'Rivet length' : 'Grip', gripText(kind, line.grip)],
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
