import { useCallback, useEffect, useRef, useState } from 'react';

/**
 * Counts down from `idleSeconds` while `running`; `touch` (a scan or a tap) starts it over. Calls
 * `onEnd` once when it reaches zero. Reads the clock each tick, so a busy tab does not stretch it.
 */
export function useIdleCountdown(running: boolean, idleSeconds: number, onEnd: () => void): { secondsLeft: number; touch: () => void } {
  const deadline = useRef(0);
  const [secondsLeft, setSecondsLeft] = useState(idleSeconds);
  // A session starting or ending starts from a full minute again (set while rendering, not in an effect).
  const [wasRunning, setWasRunning] = useState(running);
  if (running !== wasRunning) {
    setWasRunning(running);
    setSecondsLeft(idleSeconds);
  }
  const onEndRef = useRef(onEnd);
  useEffect(() => {
    onEndRef.current = onEnd;
  });

  const touch = useCallback(() => {
    deadline.current = Date.now() + idleSeconds * 1000;
    setSecondsLeft(idleSeconds);
  }, [idleSeconds]);

  useEffect(() => {
    if (!running) return;
    deadline.current = Date.now() + idleSeconds * 1000;
    const timer = setInterval(() => {
      const left = Math.max(0, Math.ceil((deadline.current - Date.now()) / 1000));
      setSecondsLeft(left);
      if (left === 0) {
        clearInterval(timer);
        onEndRef.current();
      }
    }, 250);
    return () => clearInterval(timer);
  }, [running, idleSeconds]);

  return { secondsLeft, touch };
}
