import type { AlignmentElement } from "./alignment-types";
import { buildArcPieces } from "./corridor-arcs";
import { computeJoints } from "./corridor-joints";
import { buildTangentPieces } from "./corridor-tangents";
import { MIN_PIECE_LENGTH, PIECE_LENGTH_IN_WIDTHS, SPIRAL_FIT_TOLERANCE } from "./corridor-tolerances";
import type { BuildCorridorOptions, Corridor, CorridorPiece } from "./corridor-types";
import { createWidthProfile, widenCorridorInput } from "./corridor-widths";
import { GeometryInputError } from "./errors";
import type { CorridorInput } from "./take-types";
import { requireFinite, requirePositive } from "./validate";

/**
 * The exact right-of-way of an alignment as convex-clippable pieces in station order: a
 * quadrilateral per tangent stretch (flat perpendicular ends, mitred on the bisector at angle
 * points) and annular slices of at most 90° per arc. Its area is exact: Σ quads (shoelace) plus
 * Σ ½Δ(Ro² − Ri²) over the slices, which for constant widths is
 * L·(wL + wR) + ½(wR² − wL²)·ΣΔ + (wR² − wL²)·Σ tan(θ/2) over angle points (closed form).
 * The easement, when given, is a second corridor at widths w + e (`easement`).
 * Throws `GeometryInputError` for bad widths, an inside width reaching a radius
 * (`offset_exceeds_radius`) or mitres that cross (`tangent_overrun`).
 */
export function buildCorridor(elements: AlignmentElement[], input: CorridorInput, options: BuildCorridorOptions = {}): Corridor {
  const opts = resolvePieceOptions(input, options);
  const row = buildPieces(elements, input, opts);
  const e = input.easement === undefined ? 0 : requireFinite(input.easement, "corridor.easement");
  if (e < 0) throw new GeometryInputError("out_of_range", `corridor.easement must be 0 or more, got ${e}`, { field: "corridor.easement" });
  const easement = e > 0 ? buildWidened(elements, input, e, opts, "corridor.easement") : null;
  return { ...row, easement, easementArea: easement ? Math.max(0, easement.area - row.area) : 0 };
}

/**
 * The corridor widened by `extra` on both sides (an easement, a proximity band), with the same
 * piece length. Errors name `field`, since the widening, not the right-of-way, caused them.
 */
export function buildWidened(elements: AlignmentElement[], input: CorridorInput, extra: number, options: Required<BuildCorridorOptions>, field: string): Corridor {
  try {
    return { ...buildPieces(elements, widenCorridorInput(input, extra), options), easement: null, easementArea: 0 };
  } catch (err) {
    if (!(err instanceof GeometryInputError)) throw err;
    throw new GeometryInputError(err.code, `widened by ${field} (${extra}): ${err.message}`, { ...err.details, field });
  }
}

/** The options `buildCorridor` uses for this input: defaults filled in and checked. */
export function resolvePieceOptions(input: CorridorInput, options: BuildCorridorOptions = {}): Required<BuildCorridorOptions> {
  const width = input.left + input.right;
  const fallback = Number.isFinite(width) && width > 0 ? Math.max(MIN_PIECE_LENGTH, PIECE_LENGTH_IN_WIDTHS * width) : 1; // bad widths are reported by the width check
  return {
    pieceLength: requirePositive(options.pieceLength ?? fallback, "pieceLength"),
    spiralTolerance: requirePositive(options.spiralTolerance ?? SPIRAL_FIT_TOLERANCE, "spiralTolerance"),
  };
}

function buildPieces(elements: AlignmentElement[], input: CorridorInput, options: Required<BuildCorridorOptions>): Pick<Corridor, "pieces" | "area" | "stationFrom" | "stationTo"> {
  if (elements.length === 0) throw new GeometryInputError("invalid_alignment", "the alignment has no elements", { field: "elements" });
  const profile = createWidthProfile(input);
  const joints = computeJoints(elements, profile);
  const pieces: CorridorPiece[] = [];
  elements.forEach((el, i) => {
    const made = el.type === "tangent" ? buildTangentPieces(el, i, joints[i]!, joints[i + 1]!, profile, options.pieceLength, lineAzimuth(elements, i)) : buildArcPieces(el, i, profile, options.pieceLength, options.spiralTolerance);
    for (const p of made) pieces.push({ ...p, index: pieces.length });
  });
  return { pieces, area: sumAreas(pieces), stationFrom: elements[0]!.startStation, stationTo: elements[elements.length - 1]!.endStation };
}

/** A tangent's direction from a neighbouring arc when there is one (its start azimuth is the leg's own heading). */
function lineAzimuth(elements: AlignmentElement[], i: number): number {
  const next = elements[i + 1];
  const prev = elements[i - 1];
  if (next?.type === "arc") return next.startAzimuthDeg;
  if (prev?.type === "arc") return prev.endAzimuthDeg;
  return (elements[i] as { azimuthDeg: number }).azimuthDeg;
}

/** Neumaier-compensated sum, so that a long corridor's area keeps its last digits. */
function sumAreas(pieces: CorridorPiece[]): number {
  let sum = 0;
  let comp = 0;
  for (const p of pieces) {
    const t = sum + p.area;
    comp += Math.abs(sum) >= Math.abs(p.area) ? sum - t + p.area : p.area - t + sum;
    sum = t;
  }
  return sum + comp;
}
