import type { DueState } from '@shared/time/chapter-time';
import { dueStateOf } from '@/lib/due-state';

/** A due state in words, coloured too: late in red, due within two days in amber. */
export function DueStateBadge({ due }: { due: DueState }) {
  const className = due.overdue ? 'bg-bad-soft text-bad' : due.soon ? 'bg-warn-soft text-warn' : 'bg-paper text-ink-soft';
  return (
    <span className={`inline-flex items-center gap-1 rounded-md px-2 py-0.5 text-sm font-semibold whitespace-nowrap ${className}`}>
      {due.overdue && <span aria-hidden>!</span>}
      {due.words}
    </span>
  );
}

export function DueBadge({ dueAt, now }: { dueAt: string; now?: Date }) {
  return <DueStateBadge due={dueStateOf(dueAt, now)} />;
}
