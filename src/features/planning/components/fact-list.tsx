import type { LineRule } from '@shared/estimate/line-rules';
import { WhyRule } from './why-rule';

/** A term, its value, and the rules behind the value (a "Why?" beside it when there are any). */
export type Fact = readonly [term: string, value: string, why?: readonly LineRule[]];

/** Terms and their values side by side, values in the figures' font, a "Why?" at the end of the row. */
export function FactList({ facts }: { facts: readonly Fact[] }) {
  return (
    <dl className="grid grid-cols-[fit-content(35%)_minmax(0,1fr)_auto] items-center gap-x-2 gap-y-1 text-base">
      {facts.map(([term, value, why]) => (
        <div key={term} className="contents">
          <dt className="col-start-1 text-sm text-steel">{term}</dt>
          <dd className="font-mono">{value}</dd>
          {why && why.length > 0 && <WhyRule about={term} rules={why} />}
        </div>
      ))}
    </dl>
  );
}
