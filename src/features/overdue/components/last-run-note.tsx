import type { JobRun } from '@shared/schemas/overdue';
import { Notice } from '@/components/ui/notice';
import { formatDateTime } from '@/lib/format';

/** When the daily reminder job last ran, what it did, and whether something went wrong. */
export function LastRunNote({ run }: { run: JobRun | null }) {
  if (!run) {
    return <Notice title="No automatic reminders yet">Gripline reminds holders of overdue tools every morning at 07:00 and e-mails the leads a digest.</Notice>;
  }
  const when = formatDateTime(run.finishedAt ?? run.startedAt);
  if (run.error) {
    return (
      <Notice tone="warn" title={`The automatic reminders on ${when} had a problem`}>
        {run.summary}. {run.error}. Those not sent will be tried again on the next run, or send them by hand below.
      </Notice>
    );
  }
  return (
    <Notice tone="ok" title={`Reminders last sent automatically on ${when}`}>
      {run.summary}. The next run is tomorrow at 07:00.
    </Notice>
  );
}
