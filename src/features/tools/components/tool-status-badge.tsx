import { STATUS_LABELS, type ToolStatus } from '@shared/tools/categories';

/** The tool's state in words, with a mark and colour as extra cues (never colour alone). */
const LOOK: Record<ToolStatus, { mark: string; className: string }> = {
  available: { mark: '●', className: 'bg-ok-soft text-ok' },
  on_loan: { mark: '◐', className: 'bg-paper text-ink-soft border border-rule' },
  held: { mark: '◆', className: 'bg-warn-soft text-warn' },
  out_of_service: { mark: '✕', className: 'bg-bad-soft text-bad' },
  lost: { mark: '?', className: 'bg-bad-soft text-bad' },
  retired: { mark: '–', className: 'bg-paper text-steel border border-rule' },
};

export function ToolStatusBadge({ status }: { status: ToolStatus }) {
  const look = LOOK[status];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-md px-2 py-0.5 text-sm font-semibold whitespace-nowrap ${look.className}`}>
      <span aria-hidden>{look.mark}</span>
      {STATUS_LABELS[status]}
    </span>
  );
}
