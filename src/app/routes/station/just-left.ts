import { useMemo, useRef } from 'react';

/**
 * How long, after the station leaves a code behind (an item done with, a session ended), a camera read
 * of that same code is taken for its label or badge still held in front of the lens: the camera starts
 * afresh on the next screen. Typed or from a USB scanner, the code is taken at once.
 */
export const SAME_LABEL_QUIET_MS = 5_000;

/** The code the station has just left behind, and whether a camera read of a code is only that one. */
export function useJustLeft() {
  const left = useRef<{ code: string; at: number }>(undefined);
  return useMemo(
    () => ({
      mark: (code: string) => {
        left.current = { code, at: Date.now() };
      },
      isLeftover: (code: string): boolean => left.current?.code === code && Date.now() - left.current.at < SAME_LABEL_QUIET_MS,
    }),
    [],
  );
}
