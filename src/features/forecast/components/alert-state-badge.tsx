import { ALERT_STATE_LABELS, type AlertState } from '@shared/schemas/forecast';

const TONES: Record<AlertState, string> = {
  open: 'border-warn bg-warn-soft text-warn',
  ordered: 'border-ink-soft bg-card text-ink',
  closed: 'border-ok bg-ok-soft text-ok',
  dismissed: 'border-steel bg-paper text-ink-soft',
};

/** The state in words; the colour only repeats it. */
export function AlertStateBadge({ state }: { state: AlertState }) {
  return <span className={`inline-flex rounded-full border-2 px-3 py-1 text-sm font-semibold whitespace-nowrap ${TONES[state]}`}>{ALERT_STATE_LABELS[state]}</span>;
}
