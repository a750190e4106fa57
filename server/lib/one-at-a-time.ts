/**
 * Runs async work for the same key one after another in this process (each waits for the one
 * before it to settle), so a check and the write it depends on cannot interleave across awaits.
 */
export function oneAtATime() {
  const queues = new Map<string, Promise<unknown>>();
  return <T>(key: string, work: () => Promise<T>): Promise<T> => {
    const run = (queues.get(key) ?? Promise.resolve()).then(work);
    const settled = run.catch(() => undefined);
    queues.set(key, settled);
    void settled.then(() => {
      if (queues.get(key) === settled) queues.delete(key);
    });
    return run;
  };
}
