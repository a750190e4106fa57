import { dueStateOf } from '@/lib/due-state';

export function DueBadge({ dueAt, now }: { dueAt: string; now?: Date }) {
  const due = dueStateOf(dueAt, now);
  const className = due.overdue ? 'bg-bad-soft text-bad' : due.soon ? 'bg-warn-soft text-warn' : 'bg-paper text-ink-soft';
  return (
    <span className={`inline-flex items-center gap-1 rounded-md px-2 py-0.5 text-sm font-semibold whitespace-nowrap ${className}`}>
      {due.overdue && <span aria-hidden>!</span>}
      {due.words}
    </span>
  );
}
