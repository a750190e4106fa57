import type { ReactNode } from 'react';
import type { EstimateTotals } from '@shared/estimate/estimate';
import { formatCount } from '@/lib/format';
import { drillHolesText, tempFastenersText } from '../utils/words';
import { FactList, type Fact } from './fact-list';
import { rulesFor } from './why-rule';

/** The assembly's totals: rivets with the waste allowance, holes per drill, temporary fasteners by size; a "Why?" beside the waste and the fasteners. */
export function EstimateTotalsView({ totals, wastePercent, children }: { totals: EstimateTotals; wastePercent: number; children?: ReactNode }) {
  const facts: Fact[] = [
    ['Rivets', formatCount(totals.rivets)],
    [`With ${wastePercent} % waste`, formatCount(totals.rivetsWithWaste), rulesFor(totals.rules, 'rivetsWithWaste')],
    ['Holes per drill', drillHolesText(totals.drillHoles)],
    // Reused from line to line: the most any one line needs at once, per size.
    ['Temporary fasteners at once', tempFastenersText(totals.tempFasteners), rulesFor(totals.rules, 'tempFasteners')],
  ];
  return (
    <div className="flex flex-col gap-3">
      <FactList facts={facts} />
      {children}
    </div>
  );
}
