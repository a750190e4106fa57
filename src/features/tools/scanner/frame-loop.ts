/** At most this often a frame is decoded: enough to feel instant, modest on a phone's battery. */
const MIN_INTERVAL_MS = 100;

/**
 * Calls `onFrame` with new video frames, one at a time (the next waits for the last to finish) and
 * no more often than every MIN_INTERVAL_MS. Returns a function that stops it.
 */
export function everyVideoFrame(video: HTMLVideoElement, onFrame: () => Promise<void>): () => void {
  let stopped = false;
  let last = -Infinity;
  let cancel = () => {};
  const schedule = () => {
    if (stopped) return;
    if ('requestVideoFrameCallback' in video) {
      const handle = video.requestVideoFrameCallback(tick);
      cancel = () => video.cancelVideoFrameCallback(handle);
    } else {
      const handle = requestAnimationFrame(tick);
      cancel = () => cancelAnimationFrame(handle);
    }
  };
  const tick = () => {
    const now = performance.now();
    if (now - last < MIN_INTERVAL_MS) return schedule();
    last = now;
    onFrame().then(schedule, schedule);
  };
  schedule();
  return () => {
    stopped = true;
    cancel();
  };
}
