import type { Vec2 } from "./vec2";

/** Axis-aligned bounds `[minX, minY, maxX, maxY]` in working units. */
export type Bounds = [number, number, number, number];

/** The circle that carries one side of an annular slice between its two rays. */
export interface SliceSide {
  center: Vec2;
  radius: number;
}

interface PieceBase {
  /** Position in `Corridor.pieces` (station order). */
  index: number;
  /** Index of the alignment element the piece lies along. */
  elementIndex: number;
  /** Internal stations of the centreline the piece spans. */
  stationFrom: number;
  stationTo: number;
  /** Centreline length of the piece from its own geometry (not a difference of stations, so it does not change when stations shift). */
  length: number;
  /** Corners counter-clockwise: start right, end right, end left, start left (looking ahead). */
  corners: [Vec2, Vec2, Vec2, Vec2];
  bounds: Bounds;
  /** Exact area, square units. */
  area: number;
  /** True when a width changes along the piece. */
  tapered: boolean;
  /** Exact text of the geometry (every number round-trips), for caches keyed on geometry. */
  key: string;
}

/** A convex quadrilateral along a tangent (a trapezoid where a width tapers). */
export interface QuadPiece extends PieceBase {
  kind: "quad";
  /**
   * Distance along the piece of a point v: (v − corners[0])·[ux, uy] + offset, with the direction
   * rounded to 1e-12 and the offset to 1e-9 units — plenty for a station span, and it keeps a
   * cached span valid when round-off alone changes the tangent's direction.
   */
  along: [number, number, number];
  /** Corners relative to `corners[0]`, flat `[x0, y0, x1, y1, …]`, counter-clockwise. */
  local: number[];
}

/**
 * An annular slice along an arc: the region between two rays from `center` (at most 90° apart),
 * outside the `inner` circle and inside the `outer` one. Untapered slices have both circles
 * centred on `center` (radii R − w_inside and R + w_outside); a tapered side is the circle through
 * the spiral edge at both rays and the middle ray (see README, "Tapers on curves").
 */
export interface AnnularPiece extends PieceBase {
  kind: "annular";
  center: Vec2;
  /** Centreline radius R and turn (+1 left/counter-clockwise, −1 right). */
  centerlineRadius: number;
  turn: 1 | -1;
  /** Unit rays at `stationFrom` and `stationTo`, and the angle between them (radians, > 0). */
  rayFrom: Vec2;
  rayTo: Vec2;
  sweepRad: number;
  inner: SliceSide;
  outer: SliceSide;
  /** Triangle from the centre containing the slice, relative to `center`, flat, counter-clockwise. */
  wedge: number[];
}

export type CorridorPiece = QuadPiece | AnnularPiece;

/** An exact right-of-way, as pieces in station order. */
export interface Corridor {
  pieces: CorridorPiece[];
  /** Exact area, square units: quads plus annular sectors ½Δ(Ro² − Ri²). */
  area: number;
  stationFrom: number;
  stationTo: number;
  /** The right-of-way widened by the easement width on each side, or null when there is none. */
  easement: Corridor | null;
  /** Area of the easement strips alone (widened corridor minus the right-of-way). */
  easementArea: number;
}

/** Options of `buildCorridor`. */
export interface BuildCorridorOptions {
  /** Longest piece along the centreline, working units. Default max(50, `PIECE_LENGTH_IN_WIDTHS` × (wL + wR)). */
  pieceLength?: number;
  /** Largest distance from a tapered curve's spiral edge to its slices, working units. Default 0.5 mm. */
  spiralTolerance?: number;
}
