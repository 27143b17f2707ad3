import { degToRad, radToDeg } from "./angles";
import { GeometryInputError } from "./errors";
import { requireCurveAngleRad, requireFinite, requirePositive } from "./validate";

/** Input of {@link computeStakingTable}. */
export interface StakingInput {
  radius: number;
  deltaDeg: number;
  /** Station of the PC, working length units. */
  pcStation: number;
}

/** Options of {@link computeStakingTable}. */
export interface StakingOptions {
  /** Stake at every multiple of this station interval (e.g. 100 ft, 20 m, 25 ft). Required. */
  interval: number;
}

/** One line of the deflection-angle staking table. */
export interface StakingRow {
  label: "PC" | "station" | "PT";
  station: number;
  /** Arc length from the PC. */
  arcFromPc: number;
  /** Total deflection from the back tangent at the PC, decimal degrees. */
  deflectionDeg: number;
  /** Chord from the PC to this point (for staking from the PC). */
  chordFromPc: number;
  /** Chord from the previous row (for chaining along the curve); 0 on the PC row. */
  subChord: number;
}

/**
 * Deflection-angle staking table from the PC: rows at the PC, every full `interval` station and
 * the PT. Deflection δ = s/(2R) (half the central angle), chord = 2R sin δ; the PT row carries
 * Δ/2 as the built-in check (NAVEDTRA 14070 Engineering Aid, "Solving a Simple Curve"; worked
 * table in Mahun OASL Horizontal Curves Set 2).
 */
export function computeStakingTable(curve: StakingInput, options: StakingOptions): StakingRow[] {
  const r = requirePositive(curve.radius, "radius");
  const deltaRad = requireCurveAngleRad(degToRad(requireFinite(curve.deltaDeg, "deltaDeg")), "deltaDeg");
  const pc = requireFinite(curve.pcStation, "pcStation");
  const interval = requirePositive(options.interval, "interval", "a positive station interval");
  const length = r * deltaRad;
  const pt = pc + length;
  if (length / interval > 100_000) {
    throw new GeometryInputError("out_of_range", `interval ${interval} would give more than 100000 stakes`, { field: "interval" });
  }
  const stations = [pc];
  for (let k = Math.floor(pc / interval) + 1; k * interval < pt; k++) {
    if (k * interval > pc) stations.push(k * interval);
  }
  stations.push(pt);
  return stations.map((station, i) => {
    const s = i === stations.length - 1 ? length : station - pc;
    const prev = i === 0 ? 0 : stations[i - 1]! - pc;
    return {
      label: i === 0 ? "PC" : i === stations.length - 1 ? "PT" : "station",
      station,
      arcFromPc: s,
      deflectionDeg: radToDeg(s / (2 * r)),
      chordFromPc: 2 * r * Math.sin(s / (2 * r)),
      subChord: 2 * r * Math.sin((s - prev) / (2 * r)),
    };
  });
}
