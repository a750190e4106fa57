import { daysLateWords } from '@shared/time/chapter-time';

/** A week or more late reads as a problem, less as a caution; the words say it either way. */
export function LateBadge({ daysLate }: { daysLate: number }) {
  const tone = daysLate >= 7 ? 'bg-bad-soft text-bad' : 'bg-warn-soft text-warn';
  return (
    <span className={`inline-flex items-center gap-1 rounded-md px-2 py-0.5 text-sm font-semibold whitespace-nowrap ${tone}`}>
      <span aria-hidden>!</span>
      {daysLateWords(daysLate)}
    </span>
  );
}
