import { STATION_COUNTDOWN_SECONDS } from '@shared/schemas/stations';

/** In the last seconds before the station signs the person out, says so; the live region is always there so it is announced. */
export function IdleCountdown({ secondsLeft }: { secondsLeft: number }) {
  const showing = secondsLeft <= STATION_COUNTDOWN_SECONDS;
  return (
    <p role="status" aria-live="polite" className={showing ? 'rounded-lg bg-brass px-4 py-3 text-center text-2xl font-bold text-ink' : 'sr-only'}>
      {showing ? `Signing out in ${secondsLeft} s. Tap anywhere to stay.` : ''}
    </p>
  );
}
