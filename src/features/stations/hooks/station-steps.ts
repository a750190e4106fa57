import { ApiError, isNoConnection } from '@/lib/api-client';
import { formatQuantity } from '@/lib/format';

/**
 * Where the station is: waiting for a badge, taking its PIN (greeting its holder by name when the
 * station's copy knows them), or signed in for one person: by the server, or by the copy offline.
 */
export type StationStep =
  | { kind: 'badge'; notice?: string }
  | { kind: 'pin'; badge: string; name?: string; notice?: string }
  | {
      kind: 'signed-in';
      who: { id: number; name: string };
      idleSeconds: number;
      /** The one they signed in with: read again (still held up to the camera) it changes nothing. */
      badge: string;
      /** Signed in against the station's copy: what they do is queued and sent later. */
      offline: boolean;
    };

export const NO_LABEL_YET = 'That is a tool or bin label. Scan your badge first.';
/** A QR code (or a scanner's text) that is neither a label nor shaped like a badge's token. */
export const NOT_A_BADGE = 'That is not a Gripline badge. Scan the QR code on your Gripline badge.';
export const NOT_OURS = 'That code is not a Gripline label or badge. Scan a tool or bin label.';

/**
 * What a refused sign-in (the server's, or the copy's answering alike) leads to: the PIN again with
 * its words, or the badge step with why.
 */
export function afterRefusedSignIn(err: unknown, badge: string, name?: string): StationStep | 'not-enrolled' {
  if (isNoConnection(err)) return { kind: 'badge', notice: 'The station needs a connection. Try again when the Wi-Fi is back.' };
  if (!(err instanceof ApiError)) return { kind: 'badge', notice: 'That did not work. Scan your badge again.' };
  switch (err.code) {
    case 'WRONG_PIN':
      return { kind: 'pin', badge, name, notice: err.message };
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
