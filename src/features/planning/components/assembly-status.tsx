import { ASSEMBLY_STATUS_LABELS, type AssemblyStatus } from '@shared/schemas/builds';

const TONE: Record<AssemblyStatus, string> = {
  planned: 'border-ink-soft bg-card',
  in_progress: 'border-brass-deep bg-warn-soft',
  done: 'border-ok bg-ok-soft',
};

/** The status in words, boxed: colour only repeats what the word says. */
export function AssemblyStatusBadge({ status }: { status: AssemblyStatus }) {
  return <span className={`inline-flex items-center rounded-md border px-2 py-0.5 text-sm font-semibold whitespace-nowrap ${TONE[status]}`}>{ASSEMBLY_STATUS_LABELS[status]}</span>;
}
