/** A linear map from a data interval to a pixel interval (a zero-width domain maps to the middle). */
export function linearScale(domain: [number, number], range: [number, number]): (v: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  if (d1 === d0) return () => (r0 + r1) / 2;
  return (v) => r0 + ((v - d0) / (d1 - d0)) * (r1 - r0);
}

/**
 * Round tick values covering [min, max]: the step is 1, 2 or 5 × 10ⁿ, chosen so about `count`
 * ticks fall in the range (P. Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990).
 */
export function niceTicks(min: number, max: number, count = 5, minStep = 0): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (max < min) [min, max] = [max, min];
  if (max === min) return [min];
  const step = Math.max(niceStep(min, max, count), minStep);
  const first = Math.ceil(min / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let v = first; v <= max + step * 1e-9; v += step) ticks.push(Number(v.toPrecision(12)));
  return ticks;
}

/**
 * The range a value axis spans, padded by 5 %: from zero for bar lengths; around the data for a
 * sweep, so that small differences between steps show (the tick labels give the true values).
 */
export function valueExtent(values: number[], fromZero = true): [number, number] {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return [0, 1];
  const lo = Math.min(...finite, ...(fromZero ? [0] : []));
  const hi = Math.max(...finite);
  if (hi === lo) return fromZero || lo === 0 ? [Math.min(0, lo), lo === 0 ? 1 : Math.abs(lo) * 1.1] : [lo - Math.abs(lo) * 0.05, hi + Math.abs(hi) * 0.05];
  const pad = (hi - lo) * 0.05;
  return [fromZero ? lo : lo - pad, hi + pad];
}

/** Short tick labels: 12 500 → "12.5k", 3 400 000 → "3.4M". */
export function shortNumber(v: number): string {
  const a = Math.abs(v);
  if (a >= 1e6) return `${Number((v / 1e6).toPrecision(3))}M`;
  if (a >= 1e4) return `${Number((v / 1e3).toPrecision(3))}k`;
  return String(Number(v.toPrecision(4)));
}

/** The 1-2-5 step of {@link niceTicks}. */
export function niceStep(min: number, max: number, count = 5): number {
  const rough = Math.abs(max - min) / Math.max(1, count - 1);
  if (rough === 0) return 1;
  const power = 10 ** Math.floor(Math.log10(rough));
  const fraction = rough / power;
  return (fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10) * power;
}

/**
 * A tick label with as many decimals as the step needs, so neighbouring ticks never read the
 * same: 150 800 and 151 000 at a 200 step → "150.8k", "151k"; 0.25 steps → "0.25".
 */
export function tickLabel(v: number, step: number): string {
  const big = Math.abs(v) >= 1e6 ? 1e6 : Math.abs(v) >= 1e4 ? 1e3 : 1;
  const suffix = big === 1e6 ? "M" : big === 1e3 ? "k" : "";
  const scaledStep = String(Number((step / big).toPrecision(6)));
  const decimals = scaledStep.includes("e-") ? 6 : (scaledStep.split(".")[1] ?? "").length;
  return `${Number((v / big).toFixed(decimals))}${suffix}`;
}
