import type { StationEquation } from "./station-equations";
import type { LengthUnit } from "./units";
import type { Vec2 } from "./vec2";

/**
 * The alignment contract shared by the whole product (API payloads, storage, UI). Coordinates
 * are in the working projected CRS, in the alignment's units; angles are decimal degrees.
 */
export type AlignmentCurveInput =
  | { type: "simple"; radius: number }
  | { type: "compound"; radius1: number; radius2: number; delta1: number }
  | { type: "compound"; radius1: number; radius2: number; tangentPC: number };

/** A PI (or the first/last point, which carry no curve). A PI without a curve is an angle point. */
export interface AlignmentPointInput {
  x: number;
  y: number;
  curve?: AlignmentCurveInput;
}

/** An alignment by its PIs. `startStation` is the station of the first point, in `units`. */
export interface AlignmentInput {
  units: LengthUnit;
  startStation: number;
  points: AlignmentPointInput[];
  stationEquations?: StationEquation[];
}

/** A straight element. Stations are internal (start station + distance, no equations applied). */
export interface TangentElement {
  type: "tangent";
  start: Vec2;
  end: Vec2;
  startStation: number;
  endStation: number;
  length: number;
  /** Direction, degrees clockwise from grid north. */
  azimuthDeg: number;
}

/** A circular arc. `deltaDeg` is signed: left (counter-clockwise) turns positive. */
export interface ArcElement {
  type: "arc";
  start: Vec2;
  end: Vec2;
  center: Vec2;
  /** Intersection of this arc's own tangents (its sub-PI for a compound curve). */
  pi?: Vec2;
  radius: number;
  deltaDeg: number;
  direction: "left" | "right";
  length: number;
  startStation: number;
  endStation: number;
  startAzimuthDeg: number;
  endAzimuthDeg: number;
  chord: number;
  /** Index of the PI in `points` this arc belongs to. */
  piIndex: number;
}

export type AlignmentElement = TangentElement | ArcElement;

/** What a PI's curve came to: stations (internal), tangents, lengths, radii and Δ. */
export interface CurveSummary {
  piIndex: number;
  type: "simple" | "compound";
  direction: "left" | "right";
  /** Signed deflection at the PI, left positive. */
  deltaDeg: number;
  radius?: number;
  radius1?: number;
  radius2?: number;
  delta1Deg?: number;
  delta2Deg?: number;
  /** PI→PC (back) and PI→PT (ahead) tangent lengths. */
  tangentPC: number;
  tangentPT: number;
  length: number;
  pcStation: number;
  pccStation?: number;
  ptStation: number;
  piStation: number;
}

/** A labelled key point with its internal station and its displayed station text. */
export interface KeyStation {
  label: "POB" | "POE" | "PI" | "PC" | "PCC" | "PT" | "PRC";
  station: number;
  /** Station after station equations, and its region (0 before the first equation). */
  displayStation: number;
  region: number;
  stationText: string;
  x: number;
  y: number;
  piIndex?: number;
}
