import type { StationSession } from '@shared/schemas/stations';
import { ApiError, isNoConnection } from '@/lib/api-client';
import { formatQuantity } from '@/lib/format';

/** Where the station is: waiting for a badge, taking its PIN, or signed in for one person. */
export type StationStep =
  | { kind: 'badge'; notice?: string }
  | { kind: 'pin'; badge: string; notice?: string }
  /** `badge` is the one they signed in with: read again (still held up to the camera) it changes nothing. */
  | { kind: 'signed-in'; session: StationSession; badge: string };

export const NO_LABEL_YET = 'That is a tool or bin label. Scan your badge first.';

/** What a refused sign-in leads to: the PIN again with the server's words, or the badge step with why. */
export function afterRefusedSignIn(err: unknown, badge: string): StationStep | 'not-enrolled' {
  if (isNoConnection(err)) return { kind: 'badge', notice: 'The station needs a connection. Try again when the Wi-Fi is back.' };
  if (!(err instanceof ApiError)) return { kind: 'badge', notice: 'That did not work. Scan your badge again.' };
  switch (err.code) {
    case 'WRONG_PIN':
      return { kind: 'pin', badge, notice: err.message };
    case 'BADGE_LOCKED': {
      const minutes = Math.max(1, Math.ceil((err.retryAfterSeconds ?? 0) / 60));
      return {
        kind: 'badge',
        notice: err.retryAfterSeconds === undefined ? err.message : `Too many wrong PINs: this badge is locked at this station for ${formatQuantity(minutes, 'minute')}.`,
      };
    }
    case 'NO_PIN':
      return { kind: 'badge', notice: 'You have no PIN yet. Set one on your profile on your own phone, then scan your badge here again.' };
    case 'STATION_NOT_ENROLLED':
      return 'not-enrolled';
    default:
      return { kind: 'badge', notice: err.message };
  }
}
