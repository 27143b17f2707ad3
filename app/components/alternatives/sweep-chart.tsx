import { linearScale, niceStep, niceTicks, shortNumber, tickLabel, valueExtent } from "./chart-scale";

export interface SweepPoint {
  value: number;
  /** The metric at this value, or null when the alignment does not compute there. */
  y: number | null;
  /** Design checks warn at this value (not accepted). */
  failing: boolean;
  note: string;
}

const W = 340;
const H = 190;
const PAD = { left: 46, right: 12, top: 14, bottom: 36 };

/**
 * One metric of a curve sweep against the varied value, drawn as SVG: a line through the steps,
 * failing steps as hollow diamonds, steps that do not compute as crosses on the axis, and the
 * minimum radius for the design speed as a dashed vertical line. A step is a button: it applies
 * its value to the PI (`onPick` absent: read only).
 */
export function SweepChart({ title, xLabel, points, marker, onPick, integer = false }: { title: string; xLabel: string; points: SweepPoint[]; marker?: { x: number; label: string } | null; onPick?: (value: number) => void; integer?: boolean }) {
  const xs = points.map((p) => p.value);
  const domainX: [number, number] = [Math.min(...xs), Math.max(...xs)];
  const ys = points.flatMap((p) => (p.y === null ? [] : [p.y]));
  // Counts get whole-number ticks and at least one unit either side of their values.
  const domainY: [number, number] = integer && ys.length ? [Math.max(0, Math.min(...ys) - 1), Math.max(...ys) + 1] : valueExtent(ys, false);
  const stepY = Math.max(niceStep(domainY[0], domainY[1], 5), integer ? 1 : 0);
  const stepX = niceStep(domainX[0], domainX[1], 5);
  const sx = linearScale(domainX, [PAD.left, W - PAD.right]);
  const sy = linearScale(domainY, [H - PAD.bottom, PAD.top]);
  const drawn = points.filter((p) => p.y !== null);
  const path = drawn.map((p, i) => `${i === 0 ? "M" : "L"}${sx(p.value).toFixed(1)},${sy(p.y!).toFixed(1)}`).join(" ");
  const markerInside = marker && marker.x >= domainX[0] && marker.x <= domainX[1];
  return (
    <figure className="space-y-1" data-testid="sweep-chart">
      <figcaption className="text-sm font-semibold">{title}</figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="group" aria-label={`${title} against ${xLabel}`}>
        {niceTicks(domainY[0], domainY[1], 5, stepY).map((t) => (
          <g key={`y${t}`}>
            <line x1={PAD.left} x2={W - PAD.right} y1={sy(t)} y2={sy(t)} stroke="#d9d4c6" strokeWidth={0.6} />
            <text x={PAD.left - 4} y={sy(t) + 3} textAnchor="end" fontSize={9} fill="#4d5753">{tickLabel(t, stepY)}</text>
          </g>
        ))}
        {niceTicks(domainX[0], domainX[1], 5).map((t) => (
          <text key={`x${t}`} x={sx(t)} y={H - PAD.bottom + 12} textAnchor="middle" fontSize={9} fill="#4d5753">{tickLabel(t, stepX)}</text>
        ))}
        <line x1={PAD.left} x2={W - PAD.right} y1={H - PAD.bottom} y2={H - PAD.bottom} stroke="#b9b29f" />
        <text x={(PAD.left + W - PAD.right) / 2} y={H - 6} textAnchor="middle" fontSize={10} fill="#1e2422">{xLabel}</text>
        {markerInside && (
          <g data-testid="minimum-radius-line">
            <line x1={sx(marker.x)} x2={sx(marker.x)} y1={PAD.top} y2={H - PAD.bottom} stroke="#a12a2a" strokeWidth={1.4} strokeDasharray="4 3" />
            <text x={sx(marker.x) + 3} y={H - PAD.bottom - 4} fontSize={9} fill="#a12a2a">{marker.label}</text>
          </g>
        )}
        <path d={path} fill="none" stroke="#22594a" strokeWidth={1.6} />
        {points.map((p) => <StepMark key={p.value} p={p} x={sx(p.value)} y={p.y === null ? H - PAD.bottom : sy(p.y)} title={title} onPick={onPick} />)}
      </svg>
      {marker && !markerInside && <p className="text-xs text-ink-soft">{marker.label} is outside this range.</p>}
    </figure>
  );
}

function StepMark({ p, x, y, title, onPick }: { p: SweepPoint; x: number; y: number; title: string; onPick?: (value: number) => void }) {
  const pickable = onPick && p.y !== null;
  const label = `${p.note}; ${title}: ${p.y === null ? "does not compute" : shortNumber(p.y)}${p.failing ? "; design checks warn" : ""}${pickable ? ". Apply this value" : ""}`;
  const shape = p.y === null
    ? <path d={`M${x - 4},${y - 4} L${x + 4},${y + 4} M${x - 4},${y + 4} L${x + 4},${y - 4}`} stroke="#a12a2a" strokeWidth={1.8} />
    : p.failing
      ? <path d={`M${x},${y - 5} L${x + 5},${y} L${x},${y + 5} L${x - 5},${y} Z`} fill="#fff" stroke="#8a6200" strokeWidth={1.6} />
      : <circle cx={x} cy={y} r={3.6} fill="#22594a" />;
  if (!pickable) return <g aria-label={label} role="img" data-failing={p.failing || p.y === null}>{shape}</g>;
  return (
    <g role="button" tabIndex={0} aria-label={label} data-failing={p.failing} className="group cursor-pointer outline-none"
      onClick={() => onPick(p.value)} onKeyDown={(e) => { if (e.key === "Enter" || e.key === " ") { e.preventDefault(); onPick(p.value); } }}>
      <circle cx={x} cy={y} r={8} fill="transparent" className="stroke-transparent group-hover:stroke-rule-strong group-focus-visible:stroke-action" strokeWidth={2} />
      {shape}
    </g>
  );
}
