import { readEnv } from './env';
import { startGripline } from './main';

const running = await startGripline(readEnv());
console.log(`Gripline is running at ${running.url}  (stop with Ctrl+C)`);

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
