import { linearScale, niceTicks, shortNumber } from "~/components/alternatives/chart-scale";

export interface Bar {
  id: number;
  name: string;
  colour: string;
  value: number;
}

const W = 320;
const ROW = 26;
const PAD = { left: 118, right: 56, top: 8, bottom: 22 };

/** One metric across the alternatives as horizontal SVG bars in each alternative's colour, value at the bar's end. */
export function MetricBarChart({ title, bars, format }: { title: string; bars: Bar[]; format: (v: number) => string }) {
  const h = PAD.top + PAD.bottom + bars.length * ROW;
  const max = Math.max(0, ...bars.map((b) => b.value));
  const ticks = niceTicks(0, max || 1, 4);
  const top = Math.max(max, ticks[ticks.length - 1] ?? 1) || 1;
  const sx = linearScale([0, top], [PAD.left, W - PAD.right]);
  return (
    <figure className="space-y-1" data-testid="metric-chart">
      <figcaption className="text-sm font-semibold">{title}</figcaption>
      <svg viewBox={`0 0 ${W} ${h}`} className="w-full" role="img" aria-label={`${title}: ${bars.map((b) => `${b.name} ${format(b.value)}`).join("; ")}`}>
        {ticks.map((t) => (
          <g key={t}>
            <line x1={sx(t)} x2={sx(t)} y1={PAD.top} y2={h - PAD.bottom} stroke="#d9d4c6" strokeWidth={0.6} />
            <text x={sx(t)} y={h - PAD.bottom + 12} textAnchor="middle" fontSize={9} fill="#4d5753">{shortNumber(t)}</text>
          </g>
        ))}
        {bars.map((b, i) => {
          const y = PAD.top + i * ROW;
          return (
            <g key={b.id}>
              <text x={PAD.left - 6} y={y + ROW / 2 + 3} textAnchor="end" fontSize={10} fill="#1e2422">{truncate(b.name, 20)}</text>
              <rect x={PAD.left} y={y + 4} width={Math.max(0, sx(b.value) - PAD.left)} height={ROW - 8} fill={b.colour} rx={2} />
              <text x={sx(b.value) + 4} y={y + ROW / 2 + 3} fontSize={10} fill="#1e2422">{format(b.value)}</text>
            </g>
          );
        })}
      </svg>
    </figure>
  );
}

function truncate(s: string, n: number): string {
  return s.length > n ? `${s.slice(0, n - 1)}…` : s;
}
