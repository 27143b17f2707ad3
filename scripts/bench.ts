/**
 * Geometry benchmark: `npx tsx scripts/bench.ts` (npm run bench). Prints median and p95 per case.
 * A benchmark, not a test: nothing here fails a build. Cases live in bench-cases.ts.
 */
import { benchCases, type BenchCase } from "./bench-cases";

function quantile(sorted: number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
}

function format(ms: number): string {
  return ms < 1 ? `${(ms * 1000).toFixed(1)} µs` : `${ms.toFixed(2)} ms`;
}

function timeCase(c: BenchCase): { median: number; p95: number } {
  const warmup = Math.min(200, c.runs);
  for (let i = 0; i < warmup; i++) c.run(i);
  const times: number[] = [];
  for (let i = 0; i < c.runs; i++) {
    const t0 = performance.now();
    c.run(i);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { median: quantile(times, 0.5), p95: quantile(times, 0.95) };
}

const width = Math.max(...benchCases.map((c) => c.name.length));
console.log(`${"case".padEnd(width)}  ${"median".padStart(10)}  ${"p95".padStart(10)}  target`);
for (const c of benchCases) {
  const { median, p95 } = timeCase(c);
  const target = c.targetMs === undefined ? "" : `< ${c.targetMs} ms${p95 <= c.targetMs ? "" : "  (p95 over target)"}`;
  console.log(`${c.name.padEnd(width)}  ${format(median).padStart(10)}  ${format(p95).padStart(10)}  ${target}`);
}
