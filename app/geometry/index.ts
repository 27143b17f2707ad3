/** Public API of the survey geometry engine. Plain data in and out; see README.md. */
export { GeometryInputError, type GeometryErrorCode, type GeometryErrorDetails } from "./errors";
export * from "./tolerances";
export {
  METRES_PER_UNIT,
  SQUARE_METRES_PER_AREA_UNIT,
  convertArea,
  convertLength,
  convertLengthFromMetres,
  convertLengthToMetres,
  parseLengthUnit,
  squareUnitOf,
  type AreaUnit,
  type LengthUnit,
} from "./units";
export { degToRad, formatDms, normalizeRadPositive, normalizeRadSigned, parseAngleDeg, radToDeg, type FormatDmsOptions } from "./angles";
export {
  azimuthDegFromMathRad,
  azimuthDegOfVector,
  formatAzimuthAsBearing,
  mathRadFromAzimuthDeg,
  parseBearingToAzimuthDeg,
  unitVectorFromAzimuthDeg,
  type FormatBearingOptions,
} from "./bearings";
export { formatStation, parseStation, stationStyleForUnits, type FormatStationOptions, type StationStyle } from "./stations";
export {
  createStationing,
  distanceAtStation,
  stationAtDistance,
  type StationEquation,
  type StationRegion,
  type Stationing,
} from "./station-equations";
export { computeChordDefinitionLength, computeDegreeFromRadius, computeRadiusFromDegree, type DegreeDefinition } from "./degree-of-curve";
export { computeSimpleCurve, type SimpleCurve, type SimpleCurveInput } from "./simple-curve";
export { computeStakingTable, type StakingInput, type StakingOptions, type StakingRow } from "./staking-table";
export { computeCompoundTangentsClosedForm } from "./compound-core";
export { computeCompoundCurve, type CompoundCurve, type CompoundCurveInput, type CompoundStationInput } from "./compound-curve";
export { COMPOUND_ANGLE_KEYS, COMPOUND_LENGTH_KEYS, type CompoundGiven, type CompoundKnownKey } from "./compound-knowns";
export { solveCompoundCurve } from "./compound-solver";
export { computeReverseCurve, type ReverseCurve, type ReverseCurveInput } from "./reverse-curve";
export type {
  AlignmentCurveInput,
  AlignmentElement,
  AlignmentInput,
  AlignmentPointInput,
  ArcElement,
  CurveSummary,
  KeyStation,
  TangentElement,
} from "./alignment-types";
export {
  computeAlignmentGeometry,
  stationingOf,
  type AlignmentGeometry,
  type AlignmentGeometryOptions,
  type CenterlineLineString,
} from "./compute-alignment-geometry";
export { findPointStation, locateStation } from "./alignment-stations";
export { findStationOffset, locateAtInternalStation, type LocatedPoint, type StationOffset } from "./alignment-locate";
export { countChords, densifyElements, type DensifyOptions } from "./densify";
export { offsetElements } from "./offset-elements";
export { computeMinimumRadius, type MinimumRadius, type MinimumRadiusInput, type SpeedUnit } from "./min-radius";
export { EMAX_OPTIONS_PERCENT, SIDE_FRICTION_METRIC, SIDE_FRICTION_US } from "./side-friction";
export { runDesignChecks } from "./design-checks";
export { checkCurvePair } from "./curve-pair-checks";
export { checkRadiusRatio } from "./radius-ratio-check";
export type { DesignCheckInput, DesignCheckResult } from "./design-check-types";
export type { Vec2 } from "./vec2";
export { buildCorridor } from "./corridor-build";
export { corridorOutline, easementOutline } from "./corridor-outline";
export type { AnnularPiece, BuildCorridorOptions, Bounds, Corridor, CorridorPiece, QuadPiece, SliceSide } from "./corridor-types";
export * from "./corridor-tolerances";
export { computeTakes, type ComputeTakesInput } from "./take-compute";
export { createTakeSession, type TakeSession, type TakeSessionStats } from "./take-session";
export { computeTakePolygons, type TakePolygon } from "./take-polygons";
export type * from "./take-types";
