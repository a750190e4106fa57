import { describe, expect, it } from 'vitest';
import { pinLockedUntil, pinTriesLeft, stationSignInWords } from '@shared/stations/station-sign-in-rules';

const at = (minute: number) => new Date(Date.UTC(2026, 11, 3, 9, minute));

describe('the lock on a badge at a station after wrong PINs', () => {
  it('does not lock after 4 wrong PINs, and says one try is left', () => {
    const failures = [0, 1, 2, 3].map(at);
    expect(pinLockedUntil(failures, at(4))).toBeNull();
    expect(pinTriesLeft(failures, at(4))).toBe(1);
  });

  it('locks after 5 within 15 minutes, for 15 minutes from the last', () => {
    const failures = [0, 2, 4, 6, 8].map(at);
    expect(pinLockedUntil(failures, at(8))).toEqual(at(23));
    expect(pinLockedUntil(failures, at(22))).toEqual(at(23));
    expect(pinLockedUntil(failures, at(23))).toBeNull();
  });

  it('does not count wrong PINs spread over more than 15 minutes as one run', () => {
    const failures = [0, 4, 8, 12, 16].map(at);
    expect(pinLockedUntil(failures, at(16))).toBeNull();
    expect(pinTriesLeft(failures, at(16))).toBe(1);
  });

  it('gives the tries back once the window has passed', () => {
    expect(pinTriesLeft([0, 1].map(at), at(30))).toBe(5);
  });

  it('words the tries left in the singular and the plural', () => {
    expect(stationSignInWords.wrongPin(1)).toBe('That PIN is not right: 1 try left before this badge is locked here for 15 minutes.');
    expect(stationSignInWords.wrongPin(3)).toBe('That PIN is not right: 3 tries left before this badge is locked here for 15 minutes.');
  });
});
