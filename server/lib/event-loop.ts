/**
 * Long work on the request thread (reading a large CSV, drawing a label sheet) is done in slices:
 * between slices the event loop answers other requests, so none waits longer than one slice.
 */
export const SLICE_MS = 10;

/** Resolves on the event loop's next turn, after the I/O that is waiting (setImmediate runs after the poll phase). */
export const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** A pause point for a loop: `await pause()` yields to the event loop once the current slice has run its time. */
export function slicePauser(sliceMs = SLICE_MS): () => Promise<void> | undefined {
  let sliceStart = performance.now();
  return () => {
    if (performance.now() - sliceStart < sliceMs) return undefined;
    return nextTurn().then(() => {
      sliceStart = performance.now();
    });
  };
}

/** Maps every item, yielding to the event loop between slices of work. */
export async function mapInSlices<T, R>(items: readonly T[], map: (item: T, index: number) => R, sliceMs = SLICE_MS): Promise<R[]> {
  const pause = slicePauser(sliceMs);
  const out: R[] = [];
  for (let i = 0; i < items.length; i++) {
    out.push(map(items[i]!, i));
    await pause();
  }
  return out;
}
