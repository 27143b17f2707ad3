import type { CompoundState } from "./compound-state";

/**
 * The triangle PC–PI–PT: sides T_PC, T_PT and the long chord; angles φ_PC at the PC, φ_PT at the
 * PT and π − Δ at the PI. Any three parts including a side fix it by the sine and cosine laws;
 * two sides and a non-included angle can give two triangles (the ambiguous case), so this
 * returns every completion. Returns undefined when too little is known.
 */
export function completePiTriangle(s: CompoundState): CompoundState[] | undefined {
  // Side i is opposite angle i: T_PT opposite φ_PC, T_PC opposite φ_PT, chord opposite the PI.
  const sides = [s.T2, s.T1, s.lc];
  const angles = [s.p1, s.p2, s.d === undefined ? undefined : Math.PI - s.d];
  const sideCount = sides.filter((v) => v !== undefined).length;
  const angleCount = angles.filter((v) => v !== undefined).length;
  if (sideCount === 3 && angleCount === 3) return undefined;
  if (sideCount === 0 || sideCount + angleCount < 3) return undefined;
  const solved = solveTriangle(sides, angles);
  return solved.map(([a, b]) => ({ ...s, T2: a[0], T1: a[1], lc: a[2], p1: b[0], p2: b[1], d: Math.PI - b[2] }));
}

type Triple = [number, number, number];
type Maybe = (number | undefined)[];

function solveTriangle(sides: Maybe, angles: Maybe): [Triple, Triple][] {
  const known = (xs: Maybe) => xs.every((v) => v !== undefined);
  if (angles.filter((v) => v !== undefined).length >= 2) {
    const a = completeAngles(angles);
    if (!a) return [];
    const i = sides.findIndex((v) => v !== undefined);
    const k = sides[i]! / Math.sin(a[i]!);
    return [[a.map((x) => k * Math.sin(x)) as Triple, a]];
  }
  if (known(sides)) return fromSides(sides as Triple);
  const j = angles.findIndex((v) => v !== undefined);
  const missing = sides.findIndex((v) => v === undefined);
  if (missing === j) {
    // Two sides and the included angle: cosine law for the third side.
    const [p, q] = sides.filter((v): v is number => v !== undefined) as [number, number];
    const full = [...sides];
    full[missing] = Math.sqrt(Math.max(0, p * p + q * q - 2 * p * q * Math.cos(angles[j]!)));
    return fromSides(full as Triple);
  }
  return fromSideSideAngle(sides, angles, j, missing);
}

function completeAngles(angles: Maybe): Triple | undefined {
  const sum = angles.reduce<number>((acc, v) => acc + (v ?? 0), 0);
  const out = angles.map((v) => v ?? Math.PI - sum) as Triple;
  return out.every((v) => v > 0 && v < Math.PI) ? out : undefined;
}

function fromSides([a, b, c]: Triple): [Triple, Triple][] {
  if (!(a + b > c && b + c > a && a + c > b)) return [];
  const angle = (x: number, y: number, z: number) => Math.acos(Math.min(1, Math.max(-1, (y * y + z * z - x * x) / (2 * y * z))));
  return [[[a, b, c], [angle(a, b, c), angle(b, c, a), angle(c, a, b)]]];
}

function fromSideSideAngle(sides: Maybe, angles: Maybe, j: number, missing: number): [Triple, Triple][] {
  // Angle j faces known side j; the other known side is i.
  const i = [0, 1, 2].find((n) => n !== j && n !== missing)!;
  const sinI = (sides[i]! * Math.sin(angles[j]!)) / sides[j]!;
  if (!(sinI <= 1)) return [];
  const base = Math.asin(sinI);
  const out: [Triple, Triple][] = [];
  for (const ai of base === Math.PI / 2 ? [base] : [base, Math.PI - base]) {
    const ak = Math.PI - angles[j]! - ai;
    if (!(ak > 0) || !(ai > 0)) continue;
    const a = [0, 0, 0] as Triple;
    a[i] = ai;
    a[j] = angles[j]!;
    a[missing] = ak;
    const k = sides[j]! / Math.sin(angles[j]!);
    out.push([a.map((x) => k * Math.sin(x)) as Triple, a]);
  }
  return out;
}
