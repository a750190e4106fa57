/**
 * Estimate throughput: 1,000 and 10,000 rivet lines through the shared estimate, the code the API
 * and the assembly editor run. Prints the median time of several runs and the 10x-input ratio.
 */
import { estimate, isEstimateErrors } from '../../shared/estimate/estimate';
import type { RivetLineInput } from '../../shared/estimate/estimate-line';
import { seededRandom } from '../../shared/random/seeded';
import { median } from './median';

const kinds = ['blind-structural', 'blind-general', 'solid'] as const;
const heads = ['dome', 'countersunk', 'flange'] as const;
const gauges = [0.016, 0.02, 0.025, 0.032, 0.04, 0.05, 0.063];

/**
 * Deterministic, varied lines as builders lay them out: lengths 6–48 in, a pitch in the usual 4D–8D
 * range (trade-checks §3: "usually 4D–8D"), two or three sheets. One line in fifty has a pitch past
 * the 10D maximum, so warnings are part of the work too.
 */
function lines(n: number): RivetLineInput[] {
  const rnd = seededRandom(42);
  return Array.from({ length: n }, (_, i) => ({
    length: 6 + rnd() * 42,
    pitch: (([3, 4, 5][i % 3]! / 32) * (i % 50 === 0 ? 11 : 4 + rnd() * 4)),
    rows: 1 + (i % 2),
    stack: Array.from({ length: 2 + (i % 2) }, () => gauges[Math.floor(rnd() * gauges.length)]!),
    rivet: { kind: kinds[i % 3]!, head: heads[i % 2]!, diameter32: [3, 4, 5][i % 3]!, material: i % 3 === 2 ? '2117-T4' : '5056' },
  }));
}


/**
 * Median time of one estimate. Each sample times a batch of runs lasting at least SAMPLE_MIN_MS, so a
 * small input pays its share of the garbage collection its runs cause, as a large one does.
 */
const SAMPLE_MIN_MS = 20;
function time(input: { unit: 'in'; lines: RivetLineInput[] }, samples = 15): number {
  const once = () => {
    const r = estimate(input);
    if (isEstimateErrors(r)) throw new Error(`bench input refused: ${r.errors[0]!.message}`);
  };
  let batch = 1;
  for (let start = performance.now(); performance.now() - start < SAMPLE_MIN_MS; batch++) once();
  const times: number[] = [];
  for (let i = 0; i < samples; i++) {
    const start = performance.now();
    for (let k = 0; k < batch; k++) once();
    times.push((performance.now() - start) / batch);
  }
  return median(times);
}

const small = { unit: 'in' as const, lines: lines(1_000) };
const large = { unit: 'in' as const, lines: lines(10_000) };
for (let i = 0; i < 5; i++) {
  estimate(small);
  estimate(large);
}
// Alternating rounds, so a burst of load on the shared machine hits both sizes alike.
const rounds = Array.from({ length: 5 }, () => ({ small: time(small), large: time(large) }));
const smallMs = median(rounds.map((r) => r.small));
const largeMs = median(rounds.map((r) => r.large));
const ratio = median(rounds.map((r) => r.large / r.small));
console.log(`estimate  1,000 lines: ${smallMs.toFixed(2)} ms (median of 5 rounds x 15 batched samples)`);
console.log(`estimate 10,000 lines: ${largeMs.toFixed(2)} ms (target < 50 ms)`);
console.log(`estimate 10x-input time ratio: ${ratio.toFixed(2)} (median of the round ratios; target < 12)`);
