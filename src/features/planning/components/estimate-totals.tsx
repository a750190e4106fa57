import type { ReactNode } from 'react';
import type { EstimateTotals } from '@shared/estimate/estimate';
import { formatCount } from '@/lib/format';
import { drillHolesText, tempFastenersText } from '../utils/words';
import { FactList } from './fact-list';

/** The assembly's totals: rivets with the waste allowance, holes per drill, temporary fasteners by size. */
export function EstimateTotalsView({ totals, wastePercent, children }: { totals: EstimateTotals; wastePercent: number; children?: ReactNode }) {
  const facts: [string, string][] = [
    ['Rivets', formatCount(totals.rivets)],
    [`With ${wastePercent} % waste`, formatCount(totals.rivetsWithWaste)],
    ['Holes per drill', drillHolesText(totals.drillHoles)],
    // Reused from line to line: the most any one line needs at once, per size.
    ['Temporary fasteners at once', tempFastenersText(totals.tempFasteners)],
  ];
  return (
    <div className="flex flex-col gap-3">
      <FactList facts={facts} />
      {children}
    </div>
  );
}
