import { ASSEMBLY_STATUS_LABELS, type AssemblyStatus } from '@shared/schemas/builds';
import { Badge } from '@/components/ui/badge';

const TONE: Record<AssemblyStatus, string> = {
  planned: 'border-ink-soft bg-card',
  in_progress: 'border-brass-deep bg-warn-soft',
  done: 'border-ok bg-ok-soft',
};

/** The status in words, boxed: colour only repeats what the word says. */
export function AssemblyStatusBadge({ status }: { status: AssemblyStatus }) {
  return <Badge className={`border ${TONE[status]}`}>{ASSEMBLY_STATUS_LABELS[status]}</Badge>;
}
