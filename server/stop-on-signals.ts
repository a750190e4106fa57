import type { RunningGripline } from './main';

/** Ctrl+C or a service manager's SIGTERM closes Gripline cleanly, once. */
export function stopOnSignals(running: RunningGripline): void {
  let stopping = false;
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.on(signal, () => {
      if (stopping) return;
      stopping = true;
      running.close().then(
        () => process.exit(0),
        (err: unknown) => {
          console.error(err);
          process.exit(1);
        },
      );
    });
  }
}
