import type { ServiceUrgency } from '@shared/schemas/overdue';

const TONES: Record<ServiceUrgency, string> = {
  overdue: 'bg-bad-soft text-bad',
  out_of_service: 'bg-warn-soft text-warn',
  accessory_missing: 'bg-warn-soft text-warn',
  due_soon: 'bg-paper text-ink-soft',
};

/** The tool's service state in words; the colour only repeats them. */
export function UrgencyBadge({ urgency, words }: { urgency: ServiceUrgency; words: string }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-md px-2 py-0.5 text-sm font-semibold ${TONES[urgency]}`}>
      {urgency !== 'due_soon' && <span aria-hidden>!</span>}
      {words}
    </span>
  );
}
