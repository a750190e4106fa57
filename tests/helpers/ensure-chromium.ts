import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { CHROMIUM, chromiumFacts, chromiumStep } from './chromium-check';

/** First step of `npm test`: Chromium is there, or gets installed (root with apt), or the run stops here. */
const step = chromiumStep(chromiumFacts());
if (step.kind === 'install') {
  console.log(`Installing Debian's Chromium for the browser tests: ${step.command}`);
  const result = spawnSync('sh', ['-c', step.command], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  if (result.status !== 0 || !existsSync(CHROMIUM)) {
    console.error(`Installing Chromium failed; run it yourself, then npm test again:\n\n  ${step.command}\n`);
    process.exit(1);
  }
}
if (step.kind === 'stop') {
  console.error(step.message);
  process.exit(1);
}
