/**
 * Forecast bench (run with tsx): the whole per-bin forecast of the Forecast page and the alert check,
 * for 50 and for 500 bins over 26 weeks with 200 planned assemblies, each needing 1–6 bins, and
 * 26 weeks of draw history. One pass = spread the assemblies, bucket the draws by week, then
 * binForecast for every bin. Synthetic data from a seeded generator, so every run sees the same.
 * Warm-up passes first (so the JIT has compiled the code), then the median of timed samples.
 */
import { performance } from 'node:perf_hooks';
import { seededRandom as seeded } from '@shared/random/seeded';
import { binForecast } from '@shared/forecast/bin-forecast';
import { spreadAssemblyDemand, weekIndexOf, weekStarts, weeklyDrawHistory, type DrawEntry, type PlannedAssembly } from '@shared/forecast/demand';
import { median } from './median';

const WEEKS = 26;
const ASSEMBLIES = 200;
const DRAWS_PER_BIN_WEEK = 3;
const WARMUP_PASSES = 30;
const SAMPLES = 15;
/** A pass of 50 bins takes a fraction of a millisecond: each sample times a batch of passes this long at least. */
const SAMPLE_MIN_MS = 25;
const ROUNDS = 7;
const GOAL_MS_500 = 200;
const GOAL_RATIO = 12;
const DAY_MS = 86_400_000;
const NOW = new Date('2026-12-02T15:30:00Z');

type SyntheticBin = { id: number; onHand: number; leadTimeDays: number; packSize: number; unitCost: number };
type Scenario = { bins: SyntheticBin[]; assemblies: PlannedAssembly<number>[]; draws: DrawEntry<number>[]; receiptsByBin: Map<number, { at: Date; quantity: number }[]> };

function scenario(binCount: number, seed: number): Scenario {
  const random = seeded(seed);
  const between = (lo: number, hi: number) => lo + Math.floor(random() * (hi - lo + 1));
  const bins: SyntheticBin[] = Array.from({ length: binCount }, (_, i) => ({
    id: i + 1,
    onHand: between(0, 3000),
    leadTimeDays: [7, 10, 14, 21, 28][between(0, 4)]!,
    packSize: [1, 25, 100, 250, 1000][between(0, 4)]!,
    unitCost: between(1, 5000) / 10_000 + between(0, 3),
  }));
  const assemblies: PlannedAssembly<number>[] = Array.from({ length: ASSEMBLIES }, () => {
    const need = new Map<number, number>();
    const binsNeeded = between(1, 6);
    while (need.size < Math.min(binsNeeded, binCount)) need.set(between(1, binCount), between(10, 900));
    if (random() < 0.1) return { remainingNeed: need, plannedStart: null, plannedFinish: null };
    const startDay = between(-30, 200);
    return { remainingNeed: need, plannedStart: new Date(NOW.getTime() + startDay * DAY_MS), plannedFinish: new Date(NOW.getTime() + (startDay + between(3, 90)) * DAY_MS) };
  });
  const draws: DrawEntry<number>[] = [];
  for (const bin of bins) {
    for (let k = 0; k < WEEKS * DRAWS_PER_BIN_WEEK; k++) {
      const at = new Date(NOW.getTime() - between(1, WEEKS * 7 + 3) * DAY_MS);
      draws.push({ binId: bin.id, at, quantity: random() < 0.1 ? -between(1, 10) : between(1, 60) });
    }
  }
  const receiptsByBin = new Map<number, { at: Date; quantity: number }[]>();
  for (const bin of bins) if (random() < 0.2) receiptsByBin.set(bin.id, [{ at: new Date(NOW.getTime() + between(-3, 40) * DAY_MS), quantity: between(1, 10) * bin.packSize }]);
  return { bins, assemblies, draws, receiptsByBin };
}

/** One full pass, as the forecast service would run it; returns the alert count so nothing is optimised away. */
function forecastAll({ bins, assemblies, draws, receiptsByBin }: Scenario): number {
  const weeks = weekStarts(NOW, WEEKS);
  const planned = spreadAssemblyDemand(assemblies, weeks);
  const history = weeklyDrawHistory(draws, NOW, WEEKS);
  let alerts = 0;
  for (const bin of bins) {
    const receipts = receiptsByBin.get(bin.id) ?? [];
    const forecast = binForecast({
      onHand: bin.onHand,
      leadTimeDays: bin.leadTimeDays,
      packSize: bin.packSize,
      unitCost: bin.unitCost,
      weeklyPlanned: planned.get(bin.id) ?? null,
      history: history.get(bin.id) ?? [],
      expectedReceipts: receipts.map((r) => ({ week: weekIndexOf(r.at, weeks), quantity: r.quantity })),
      serviceLevel: 0.95,
      orderCost: 12,
      holdingRate: 0.25,
    });
    if (forecast.needsAlert) alerts++;
  }
  return alerts;
}


function measure(binCount: number) {
  const data = scenario(binCount, 417 + binCount);
  let alerts = 0;
  for (let i = 0; i < WARMUP_PASSES; i++) alerts = forecastAll(data);
  const t0 = performance.now();
  for (let i = 0; i < 5; i++) alerts = forecastAll(data);
  const batch = Math.max(1, Math.ceil(SAMPLE_MIN_MS / ((performance.now() - t0) / 5)));
  const times: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const start = performance.now();
    for (let j = 0; j < batch; j++) alerts = forecastAll(data);
    times.push((performance.now() - start) / batch);
  }
  return { binCount, draws: data.draws.length, alerts, batch, medianMs: median(times), minMs: Math.min(...times), maxMs: Math.max(...times) };
}

// Interleave the sizes so both see the same machine load; the headline uses the median of the rounds.
const rounds = Array.from({ length: ROUNDS }, () => [measure(50), measure(500)] as const);
const small = median(rounds.map(([s]) => s.medianMs));
const large = median(rounds.map(([, l]) => l.medianMs));
const ratio = median(rounds.map(([s, l]) => l.medianMs / s.medianMs));

console.log(`Gripline forecast bench: ${WEEKS} weeks, ${ASSEMBLIES} assemblies (1–6 bins each), ${DRAWS_PER_BIN_WEEK} ledger draws per bin-week of history`);
console.log(`per size and round: ${WARMUP_PASSES} warm-up passes, then the median of ${SAMPLES} samples, each the mean of a batch of passes ≥ ${SAMPLE_MIN_MS} ms; ${ROUNDS} interleaved rounds, headline = median over rounds\n`);
for (const [s, l] of rounds) {
  for (const r of [s, l]) {
    console.log(`${String(r.binCount).padStart(4)} bins  ${String(r.draws).padStart(6)} draws  ${r.alerts} alerts  ${String(r.batch).padStart(4)} passes/sample  median ${r.medianMs.toFixed(3)} ms  (min ${r.minMs.toFixed(3)}, max ${r.maxMs.toFixed(3)})`);
  }
}
const met500 = large < GOAL_MS_500;
const metRatio = ratio < GOAL_RATIO;
console.log(`\n 500 bins: ${large.toFixed(2)} ms (goal < ${GOAL_MS_500} ms): ${met500 ? 'met' : 'NOT met'}`);
console.log(`  50 bins: ${small.toFixed(2)} ms`);
console.log(`500/50 time ratio for 10× the bins (median of the round ratios): ${ratio.toFixed(2)} (goal < ${GOAL_RATIO}): ${metRatio ? 'met' : 'NOT met'}`);
if (!met500 || !metRatio) process.exitCode = 1;
