import { STATION_LOCK_MINUTES, STATION_PIN_TRIES } from '../schemas/stations';

/**
 * What a station says when it refuses a badge or a PIN, and when a badge is locked there. The
 * server says it online; the station says the same when it checks against its copy offline.
 */
export const stationSignInWords = {
  badgeNotRecognised: 'This badge is not recognised: it may have been reprinted. Ask a quartermaster for a new one.',
  noPin: 'You have no PIN yet: set one on your profile, then scan your badge again.',
  badgeLocked: (minutes: number) => `Too many wrong PINs: this badge is locked at this station for ${minutes} more minute${minutes === 1 ? '' : 's'}. Your own sign-in elsewhere still works.`,
  wrongPin: (triesLeft: number) =>
    `That PIN is not right: ${triesLeft} ${triesLeft === 1 ? 'try' : 'tries'} left before this badge is locked here for ${STATION_LOCK_MINUTES} minutes.`,
} as const;

const LOCK_MS = STATION_LOCK_MINUTES * 60_000;

/**
 * When a badge's lock at a station ends, or null when it is not locked: STATION_PIN_TRIES wrong PINs
 * within STATION_LOCK_MINUTES of the last of them lock it for STATION_LOCK_MINUTES from that last one.
 */
export function pinLockedUntil(failures: readonly Date[], now: Date): Date | null {
  const recent = failures.filter((at) => at.getTime() > now.getTime() - LOCK_MS && at.getTime() <= now.getTime());
  if (recent.length === 0) return null;
  const latest = Math.max(...recent.map((at) => at.getTime()));
  const run = failures.filter((at) => at.getTime() > latest - LOCK_MS && at.getTime() <= latest).length;
  if (run < STATION_PIN_TRIES) return null;
  return new Date(latest + LOCK_MS);
}

/** Wrong PINs left before the lock, counting those within the window before `now`. */
export function pinTriesLeft(failures: readonly Date[], now: Date): number {
  const recent = failures.filter((at) => at.getTime() > now.getTime() - LOCK_MS && at.getTime() <= now.getTime()).length;
  return Math.max(0, STATION_PIN_TRIES - recent);
}
