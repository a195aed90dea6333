/**
 * A small benchmark harness: each case runs until it has both a minimum count and a minimum
 * time, after a warm-up; we keep the median (robust against GC pauses and the other core's
 * work). Every figure is printed beside its ratio to a baseline case run in the same process,
 * so results compare across machines and loads.
 */
import { performance } from 'node:perf_hooks';

export interface BenchResult {
  name: string;
  runs: number;
  medianMs: number;
  p90Ms: number;
  opsPerSecond: number;
}

export interface BenchOptions {
  warmup?: number;
  minRuns?: number;
  minTimeMs?: number;
  maxRuns?: number;
}

export async function bench(name: string, fn: () => unknown, options: BenchOptions = {}): Promise<BenchResult> {
  const { warmup = 5, minRuns = 20, minTimeMs = 1000, maxRuns = 10_000 } = options;
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  const start = performance.now();
  while (times.length < maxRuns && (times.length < minRuns || performance.now() - start < minTimeMs)) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const medianMs = times[Math.floor(times.length / 2)]!;
  return {
    name,
    runs: times.length,
    medianMs,
    p90Ms: times[Math.floor(times.length * 0.9)]!,
    opsPerSecond: 1000 / medianMs,
  };
}

export interface BenchCase {
  name: string;
  fn: () => unknown;
}

/**
 * Several cases measured in turns: `rounds` rounds, each giving every case a slice of about
 * `sliceMs` (the order rotated from round to round), after a warm-up of each. On a shared
 * machine whose speed drifts over seconds, every case (the baseline too) then sees the same mix
 * of fast and slow spells, so the ratios to the baseline and the medians compare fairly; one
 * case after another, a case could fall wholly into a slow spell.
 */
export async function benchInterleaved(cases: readonly BenchCase[], options: { rounds?: number; sliceMs?: number; warmup?: number } = {}): Promise<BenchResult[]> {
  const { rounds = 8, sliceMs = 250, warmup = 5 } = options;
  for (const c of cases) for (let i = 0; i < warmup; i++) await c.fn();
  const times: number[][] = cases.map(() => []);
  for (let r = 0; r < rounds; r++)
    for (let k = 0; k < cases.length; k++) {
      const index = (k + r) % cases.length;
      const c = cases[index]!;
      const start = performance.now();
      do {
        const t0 = performance.now();
        await c.fn();
        times[index]!.push(performance.now() - t0);
      } while (performance.now() - start < sliceMs);
    }
  return cases.map((c, index) => {
    const sorted = [...times[index]!].sort((a, b) => a - b);
    const medianMs = sorted[Math.floor(sorted.length / 2)]!;
    return { name: c.name, runs: sorted.length, medianMs, p90Ms: sorted[Math.floor(sorted.length * 0.9)]!, opsPerSecond: 1000 / medianMs };
  });
}

const fmt = (n: number, digits = 3) => n.toPrecision(digits);

/** Print a table: median, p90, operations per second, ratio to the baseline, and the target if any. */
export function report(
  title: string,
  baseline: BenchResult,
  rows: Array<BenchResult & { targetMs?: number }>,
): void {
  console.log(`\n${title}`);
  console.log(`baseline "${baseline.name}": median ${fmt(baseline.medianMs)} ms (${baseline.runs} runs)`);
  const table = rows.map((r) => ({
    case: r.name,
    'median ms': fmt(r.medianMs),
    'p90 ms': fmt(r.p90Ms),
    'ops/s': fmt(r.opsPerSecond, 4),
    '× baseline': fmt(r.medianMs / baseline.medianMs),
    target: r.targetMs === undefined ? '' : `< ${r.targetMs} ms: ${r.medianMs < r.targetMs ? 'met' : 'MISSED'}`,
    runs: r.runs,
  }));
  console.table(table);
}
