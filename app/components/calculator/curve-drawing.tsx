type Pt = readonly [number, number];
export type DrawnArc = { center: Pt; radius: number; from: Pt; to: Pt };
export type CurveFigure = {
  pc: Pt;
  pt: Pt;
  pi: Pt;
  pcc?: Pt;
  arcs: DrawnArc[];
  /** Labels placed at points, e.g. R beside the radius line. */
  notes: { at: Pt; text: string }[];
};

/** Points along an arc turning left (counter-clockwise) from `from` to `to`, for display only. */
function arcPoints(arc: DrawnArc, steps = 64): Pt[] {
  const a0 = Math.atan2(arc.from[1] - arc.center[1], arc.from[0] - arc.center[0]);
  let a1 = Math.atan2(arc.to[1] - arc.center[1], arc.to[0] - arc.center[0]);
  while (a1 < a0) a1 += 2 * Math.PI;
  return Array.from({ length: steps + 1 }, (_, i) => {
    const a = a0 + ((a1 - a0) * i) / steps;
    return [arc.center[0] + arc.radius * Math.cos(a), arc.center[1] + arc.radius * Math.sin(a)] as const;
  });
}

/**
 * A to-scale sketch of a curve in its local frame (PC at the origin, back tangent along +x,
 * turning left), labelled with the trade's terms. For reading the geometry, not for plotting.
 */
export function CurveDrawing({ figure, title }: { figure: CurveFigure; title: string }) {
  const pts: Pt[] = [figure.pc, figure.pt, figure.pi, ...figure.arcs.flatMap((a) => [a.center, ...arcPoints(a, 16)])];
  const xs = pts.map((p) => p[0]);
  const ys = pts.map((p) => p[1]);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) || 1;
  const pad = span * 0.12;
  const minX = Math.min(...xs) - pad;
  const maxY = Math.max(...ys) + pad;
  const w = Math.max(...xs) - Math.min(...xs) + 2 * pad;
  const h = Math.max(...ys) - Math.min(...ys) + 2 * pad;
  const sx = (p: Pt) => p[0] - minX;
  const sy = (p: Pt) => maxY - p[1];
  const line = (a: Pt, b: Pt) => ({ x1: sx(a), y1: sy(a), x2: sx(b), y2: sy(b) });
  const stroke = span / 220;
  const font = span / 28;
  const label = (p: Pt, text: string, dy = -font * 0.6) => (
    <text key={`${text}-${p[0]}`} x={sx(p)} y={sy(p) + dy} fontSize={font} textAnchor="middle" fill="var(--color-ink)" fontWeight={600}>
      {text}
    </text>
  );
  return (
    <svg viewBox={`0 0 ${w} ${h}`} role="img" aria-label={title} className="h-96 w-full rounded-md border border-rule bg-sheet" data-testid="curve-drawing">
      <title>{title}</title>
      <line {...line([figure.pc[0] - span * 0.1, figure.pc[1]], figure.pi)} stroke="var(--color-ink-soft)" strokeWidth={stroke} strokeDasharray={`${stroke * 6} ${stroke * 4}`} />
      <line {...line(figure.pi, [figure.pt[0] + (figure.pt[0] - figure.pi[0]) * 0.25, figure.pt[1] + (figure.pt[1] - figure.pi[1]) * 0.25])} stroke="var(--color-ink-soft)" strokeWidth={stroke} strokeDasharray={`${stroke * 6} ${stroke * 4}`} />
      <line {...line(figure.pc, figure.pt)} stroke="var(--color-info)" strokeWidth={stroke} strokeDasharray={`${stroke * 2} ${stroke * 3}`} />
      {figure.arcs.map((arc, i) => (
        <g key={i}>
          <line {...line(arc.center, arc.from)} stroke="var(--color-rule-strong)" strokeWidth={stroke * 0.8} />
          <line {...line(arc.center, arc.to)} stroke="var(--color-rule-strong)" strokeWidth={stroke * 0.8} />
          <polyline points={arcPoints(arc).map((p) => `${sx(p)},${sy(p)}`).join(" ")} fill="none" stroke="var(--color-action)" strokeWidth={stroke * 2.5} />
          <circle cx={sx(arc.center)} cy={sy(arc.center)} r={stroke * 2} fill="var(--color-ink-soft)" />
        </g>
      ))}
      {[figure.pc, figure.pt, figure.pi, ...(figure.pcc ? [figure.pcc] : [])].map((p, i) => (
        <circle key={i} cx={sx(p)} cy={sy(p)} r={stroke * 3} fill="var(--color-take)" />
      ))}
      {label(figure.pc, "PC", font * 1.4)}
      {label(figure.pt, "PT", font * 1.4)}
      {label(figure.pi, "PI")}
      {figure.pcc && label(figure.pcc, "PCC", font * 1.4)}
      {figure.notes.map((n) => label(n.at, n.text, 0))}
    </svg>
  );
}
