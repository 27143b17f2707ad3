/**
 * Blocks of Quillmere cut into lots: narrow lots with shops along the main
 * streets in the core, larger suburban lots further out, an industrial
 * corner, a park across the creek, a school site, a few whole-block estates,
 * and lots along Marrow Brook that run to its bank (a few span it: MultiPolygons).
 */
import { createRng, type Rng } from "./prng";
import type { GridLine, TownGrid } from "./town-grid";
import type { LandUse, OwnerKind, PlanParcel, Zone } from "./plan-types";
import { CREEK_HALF_WIDTH, creekV } from "./creek";
import { cutRow, lotPlot, lotRing, mergeSome, type Back, type Cut } from "./town-lots";

const FRONTAGE: Record<Exclude<Zone, "rural">, [number, number]> = { core: [10, 16], mid: [14, 24], outer: [22, 40] };

interface Block {
  book: number;
  ua: number; ub: number; va: number; vb: number;
  south: GridLine; north: GridLine;
  zone: Exclude<Zone, "rural">;
}

/** Whole-block public sites and the industrial corner, by block centre. */
type Kind = "lots" | "park" | "school" | "industrial" | "estate";

function situs(street: GridLine, uMid: number, northOfStreet: boolean, u0: number): string {
  return `${100 + 2 * Math.round((uMid - u0) / 8) + (northOfStreet ? 0 : 1)} ${street.name}`;
}

function rowUse(rng: Rng, b: Block, front: GridLine): { use: LandUse; owner: OwnerKind } {
  if (front.cls === "main" && b.zone !== "outer" && rng.chance(b.zone === "core" ? 0.75 : 0.4)) return { use: "COM", owner: "business" };
  if (b.zone === "core" && rng.chance(0.12)) return { use: "COM", owner: "business" };
  if (rng.chance(b.zone === "outer" ? 0.1 : 0.045)) return { use: "VAC", owner: rng.chance(0.3) ? "business" : "person" };
  return { use: "RES", owner: "person" };
}

export function planTown(grid: TownGrid): PlanParcel[] {
  const rng = createRng(7311);
  const out: PlanParcel[] = [];
  const u0 = grid.rect[0];
  const { columns: cols, rows } = grid;
  const centreOf = (i: number, j: number) => [(cols[i]!.at + cols[i + 1]!.at) / 2, (rows[j]!.at + rows[j + 1]!.at) / 2] as const;
  const nearest = (u: number, v: number, inCreekRow: boolean) => {
    let best = [0, 0];
    let bestD = Infinity;
    for (let j = 0; j + 1 < rows.length; j++) for (let i = 0; i + 1 < cols.length; i++) {
      const [cu, cv] = centreOf(i, j);
      const d = Math.hypot(cu - u, cv - v);
      if ((j === grid.creekRow) === inCreekRow && d < bestD) [best, bestD] = [[i, j], d];
    }
    return `${best[0]},${best[1]}`;
  };
  const park = nearest(350, 0, true);
  const school = nearest(-650, 330, false);
  let book = 100;
  for (let j = 0; j + 1 < rows.length; j++) for (let i = 0; i + 1 < cols.length; i++) {
    const [uc, vc] = centreOf(i, j);
    const d = Math.max(Math.abs(uc) / 1550, Math.abs(vc) / 720);
    const b: Block = {
      book: ++book, south: rows[j]!, north: rows[j + 1]!, zone: d < 0.32 ? "core" : d < 0.68 ? "mid" : "outer",
      ua: cols[i]!.at + cols[i]!.row / 2, ub: cols[i + 1]!.at - cols[i + 1]!.row / 2,
      va: rows[j]!.at + rows[j]!.row / 2, vb: rows[j + 1]!.at - rows[j + 1]!.row / 2,
    };
    const key = `${i},${j}`;
    const kind: Kind = key === park ? "park" : key === school ? "school" : uc > 1050 && j < 2 ? "industrial" : b.zone === "outer" && j !== grid.creekRow && rng.chance(0.09) ? "estate" : "lots";
    const add = (p: Omit<PlanParcel, "book" | "lot" | "zone">) => out.push({ ...p, book: b.book, lot: out.filter((x) => x.book === b.book).length + 1, zone: b.zone });
    const put = (left: Cut, right: Cut, front: GridLine, vFront: number, back: Back, use: LandUse, owner: OwnerKind) =>
      add({ polygons: [[lotRing(left, right, vFront, back)]], use, owner, situs: situs(front, (left.f + right.f) / 2, front === b.south, u0), plot: lotPlot(left, right, vFront, back) });
    const whole: Cut[] = [{ f: b.ua, b: b.ua }, { f: b.ub, b: b.ub }];
    if (j === grid.creekRow) {
      const vMid = (b.south.at + b.north.at) / 2;
      const sBank: Back = { kind: "bank", bank: (u) => creekV(u, vMid) - CREEK_HALF_WIDTH };
      const nBank: Back = { kind: "bank", bank: (u) => creekV(u, vMid) + CREEK_HALF_WIDTH };
      const cuts = kind === "park" ? whole : mergeSome(rng, cutRow(rng, b.ua, b.ub, ...FRONTAGE[b.zone === "core" ? "mid" : b.zone]), 0.05);
      for (let k = 0; k + 1 < cuts.length; k++) {
        const [l, r] = [cuts[k]!, cuts[k + 1]!];
        if (kind === "park" || rng.chance(0.07)) {
          const [use, owner]: [LandUse, OwnerKind] = kind === "park" ? ["PUB", "town"] : [rng.chance(0.5) ? "VAC" : "RES", "person"];
          add({ polygons: [[lotRing(l, r, b.va, sBank)], [lotRing(l, r, b.vb, nBank)]], use, owner, situs: situs(b.south, (l.f + r.f) / 2, true, u0), plot: lotPlot(l, r, b.va, sBank) });
          continue;
        }
        const s = rowUse(rng, b, b.south);
        put(l, r, b.south, b.va, sBank, s.use, s.owner);
        const n = rowUse(rng, b, b.north);
        put(l, r, b.north, b.vb, nBank, n.use, n.owner);
      }
      continue;
    }
    if (kind === "school" || kind === "estate") {
      const [use, owner]: [LandUse, OwnerKind] = kind === "school" ? ["PUB", "schools"] : rng.chance(0.5) ? ["AGR", "farm"] : ["VAC", "person"];
      put(whole[0]!, whole[1]!, b.south, b.va, { kind: "line", v: b.vb }, use, owner);
      continue;
    }
    const [lo, hi] = kind === "industrial" ? [50, 90] : FRONTAGE[b.zone];
    const depth = b.vb - b.va;
    const vm = depth >= 64 ? b.va + depth * rng.range(0.45, 0.55) : b.vb;
    const sides: [GridLine, number, number][] = depth >= 64 ? [[b.south, b.va, vm], [b.north, b.vb, vm]] : [[b.south, b.va, b.vb]];
    for (const [front, vFront, vBack] of sides) {
      const cuts = mergeSome(rng, cutRow(rng, b.ua, b.ub, lo, hi), b.zone === "outer" ? 0.1 : 0.06);
      for (let k = 0; k + 1 < cuts.length; k++) {
        const u = kind === "industrial" ? { use: "IND" as const, owner: "business" as const } : rowUse(rng, b, front);
        put(cuts[k]!, cuts[k + 1]!, front, vFront, { kind: "line", v: vBack }, u.use, u.owner);
      }
    }
  }
  return out;
}
