import { readEnv } from './env';
import { startGripline } from './main';
import { stopOnSignals } from './stop-on-signals';

const running = await startGripline(readEnv());
console.log(`Gripline is running at ${running.url}  (stop with Ctrl+C)`);
stopOnSignals(running);
