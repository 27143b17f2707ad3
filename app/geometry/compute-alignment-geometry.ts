import type { AlignmentElement, AlignmentInput, CurveSummary, KeyStation } from "./alignment-types";
import { buildAlignment } from "./build-alignment";
import { densifyElements } from "./densify";
import type { DesignCheckInput, DesignCheckResult } from "./design-check-types";
import { runDesignChecks } from "./design-checks";
import { offsetElements } from "./offset-elements";
import { createStationing, stationAtDistance, type StationEquation, type Stationing } from "./station-equations";
import { formatStation, stationStyleForUnits } from "./stations";
import { DEFAULT_CHORD_TOLERANCE_M } from "./tolerances";
import { convertLengthFromMetres, type LengthUnit } from "./units";
import type { Vec2 } from "./vec2";

/** Options of {@link computeAlignmentGeometry}. */
export interface AlignmentGeometryOptions {
  /** Densifying sagitta in alignment units. Default 1 cm (DEFAULT_CHORD_TOLERANCE_M) converted. */
  chordTolerance?: number;
  /** Design-check inputs; omit the speed to skip the speed-based checks. */
  design?: DesignCheckInput;
  /** Signed offsets (right positive) to compute as exact elements. Default none. */
  offsets?: number[];
}

/** GeoJSON LineString (RFC 7946 shape) in the working projected CRS, not longitude/latitude. */
export interface CenterlineLineString {
  type: "LineString";
  coordinates: Vec2[];
}

/** Payload of the alignment geometry API: JSON-serializable throughout. */
export interface AlignmentGeometry {
  units: LengthUnit;
  startStation: number;
  stationEquations: StationEquation[];
  length: number;
  elements: AlignmentElement[];
  curves: CurveSummary[];
  stations: KeyStation[];
  checks: DesignCheckResult[];
  centerline: CenterlineLineString;
  offsets: { offset: number; elements: AlignmentElement[] }[];
}

/**
 * Everything the product needs about an alignment: elements with internal stations, curve
 * summaries, key stations (with station equations applied and formatted), design checks,
 * a densified centreline and exact offsets. Throws `GeometryInputError` for bad input.
 */
export function computeAlignmentGeometry(alignment: AlignmentInput, options: AlignmentGeometryOptions = {}): AlignmentGeometry {
  const built = buildAlignment(alignment);
  const units = alignment.units;
  const equations = alignment.stationEquations ?? [];
  const stationing = createStationing(alignment.startStation, built.length, equations);
  const chordTolerance = options.chordTolerance ?? convertLengthFromMetres(DEFAULT_CHORD_TOLERANCE_M, units);
  const style = stationStyleForUnits(units);
  const stations = built.keyPoints.map((k): KeyStation => {
    const shown = stationAtDistance(stationing, k.station - alignment.startStation);
    const out: KeyStation = {
      label: k.label,
      station: k.station,
      displayStation: shown.station,
      region: shown.region,
      stationText: formatStation(shown.station, style),
      x: k.point[0],
      y: k.point[1],
    };
    if (k.piIndex !== undefined) out.piIndex = k.piIndex;
    return out;
  });
  return {
    units,
    startStation: alignment.startStation,
    stationEquations: equations.map((e) => ({ back: e.back, ahead: e.ahead })),
    length: built.length,
    elements: built.elements,
    curves: built.curves,
    stations,
    checks: runDesignChecks(built.curves, units, options.design),
    centerline: { type: "LineString", coordinates: densifyElements(built.elements, { chordTolerance }) },
    offsets: (options.offsets ?? []).map((w) => ({ offset: w, elements: offsetElements(built.elements, w) })),
  };
}

/** Station regions of a computed alignment, for converting displayed stations. */
export function stationingOf(geometry: AlignmentGeometry): Stationing {
  return createStationing(geometry.startStation, geometry.length, geometry.stationEquations);
}
