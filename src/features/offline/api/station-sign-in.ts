import { argon2Verify, sha256 } from 'hash-wasm';
import type { StationCopy, StationCopyPerson } from '@shared/schemas/stations';
import { pinLockedUntil, pinTriesLeft, stationSignInWords } from '@shared/stations/station-sign-in-rules';
import { ApiError } from '@/lib/api-client';
import { offlineDb, type StoredStationCopy } from '../db';

// hash-wasm, not WebCrypto: a station on plain http (the crib's own network) has no secure context.

/** How the station's copy names a badge: the SHA-256 of its token, in hex. */
export const badgeHashOf = (badge: string): Promise<string> => sha256(badge);

/** Whose badge this is by the copy, or undefined when it is no working badge in it. */
export async function holderOf(copy: StationCopy, badge: string): Promise<StationCopyPerson | undefined> {
  const hash = await badgeHashOf(badge);
  return copy.people.find((p) => p.badgeHash === hash);
}

async function failuresOf(stationId: number, badgeHash: string): Promise<Date[]> {
  return ((await offlineDb.stationPinFailures.get([stationId, badgeHash]))?.at ?? []).map((at) => new Date(at));
}

/** Keeps a wrong PIN; only the last half hour matters to the lock, so older ones are dropped. */
async function recordFailure(stationId: number, badgeHash: string, now: Date): Promise<Date[]> {
  const kept = (await failuresOf(stationId, badgeHash)).filter((at) => at.getTime() > now.getTime() - 30 * 60_000);
  const at = [...kept, now];
  await offlineDb.stationPinFailures.put({ stationId, badgeHash, at: at.map((d) => d.toISOString()) });
  return at;
}

function locked(until: Date, now: Date): ApiError {
  const seconds = Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 1000));
  return new ApiError(429, 'BADGE_LOCKED', stationSignInWords.badgeLocked(Math.ceil(seconds / 60)), [], seconds);
}

/**
 * Badge and PIN checked against the station's copy while the server is out of reach. Refuses with
 * the server's own codes and words (an ApiError as the server would answer), so the screen treats
 * both alike; wrong PINs are counted per badge at this station and kept, so a reload keeps a lock.
 */
export async function signInFromCopy({ stationId, copy }: StoredStationCopy, badge: string, pin: string, now: Date = new Date()): Promise<StationCopyPerson> {
  const badgeHash = await badgeHashOf(badge);
  const person = copy.people.find((p) => p.badgeHash === badgeHash);
  if (!person) throw new ApiError(401, 'BADGE_NOT_RECOGNISED', stationSignInWords.badgeNotRecognised);
  const until = pinLockedUntil(await failuresOf(stationId, badgeHash), now);
  if (until) throw locked(until, now);
  if (person.pinHash === null) throw new ApiError(401, 'NO_PIN', stationSignInWords.noPin);
  if (await argon2Verify({ password: pin, hash: person.pinHash })) return person;
  const failures = await recordFailure(stationId, badgeHash, now);
  const lockNow = pinLockedUntil(failures, now);
  if (lockNow) throw locked(lockNow, now);
  throw new ApiError(401, 'WRONG_PIN', stationSignInWords.wrongPin(pinTriesLeft(failures, now)));
}
