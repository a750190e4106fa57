import { Notice } from '@/components/ui/notice';
import { formatTimeAgo } from '@/lib/format';
import { useNow } from '../hooks';

/** Says plainly that the page shows the device's copy (the phone's, or a crib station's), and how old it is. */
export function OfflineCopyNote({ takenAt, device = 'phone' }: { takenAt: string; device?: 'phone' | 'station' }) {
  const now = useNow();
  return (
    <Notice tone="warn" title={`Offline copy from ${formatTimeAgo(takenAt, now)}`}>
      No connection to Gripline. What you do here waits on this {device} and is sent when the connection is back.
    </Notice>
  );
}

/** Holds, photos, history and the quartermaster's work need the server. */
export function NeedsConnection({ what }: { what: string }) {
  return (
    <p className="rounded-lg border border-rule bg-paper px-3 py-2 text-sm">
      <strong>Needs a connection:</strong> {what}.
    </p>
  );
}

/** The phone has no copy for this member yet, so it cannot recognise the label offline. */
export function NoOfflineCopy({ code }: { code: string }) {
  return (
    <Notice tone="warn" title="Needs a connection">
      This phone has no offline copy of the catalogue yet, so it cannot open {code} without the connection. The copy is kept once you have been
      online and signed in for a moment.
    </Notice>
  );
}

/** The label's code is not in the copy: a new tool or bin, or a misread label. */
export function NotInOfflineCopy({ code, kind, takenAt }: { code: string; kind: 'tool' | 'bin'; takenAt: string }) {
  return (
    <Notice tone="warn" title={`${code} is not in the offline copy`}>
      The copy from {formatTimeAgo(takenAt)} has no {kind} {code}. Check the label, or open it again when the connection is back.
    </Notice>
  );
}
