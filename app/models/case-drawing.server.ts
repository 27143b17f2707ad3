import { and, eq } from "drizzle-orm";
import type { FeatureCollection, LineString, MultiPolygon, Polygon, Position } from "geojson";
import { layers, parcels } from "~/db/schema";
import { findCrsByCode, parseEpsgCode, resolveCrs } from "~/fabric/index.server";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { buildCorridor } from "~/geometry/corridor-build";
import { corridorOutline, easementOutline } from "~/geometry/corridor-outline";
import { computeTakePolygons } from "~/geometry/take-polygons";
import type { PolygonCoords } from "~/geometry/take-types";
import { METRES_PER_UNIT, type LengthUnit } from "~/geometry/units";
import { db, type Db } from "~/utils/db.server";
import { findAlternativeVersion } from "./alternatives.server";
import { layerRowsInBox } from "./layer-envelope.server";
import type { Project } from "./projects.server";

/** What the parcel page draws, in the working CRS's own coordinates (the browser reprojects them). */
export interface CaseDrawing {
  crsDefinition: string;
  corridor: Polygon;
  easement: MultiPolygon | null;
  takes: { parcelId: string; classification: "partial" | "full"; geometry: MultiPolygon }[];
  centerline: LineString;
  parcelLayerId: number | null;
  /** [west, south, east, north] of the parcel in WGS84, to frame the map. */
  parcelBounds: [number, number, number, number] | null;
  /**
   * The parcel and its neighbours within {@link NEIGHBOURHOOD} (WGS84, parcel IDs only): a land agent
   * sees the land around their parcel without being given the project's whole fabric and its owners.
   */
  fabric: FeatureCollection;
}

/** How far around the agent's parcel the map shows other parcels, in working-CRS units. */
const NEIGHBOURHOOD = 150;
const NEIGHBOURS_SHOWN = 400;

const EMPTY: FeatureCollection = { type: "FeatureCollection", features: [] };

function neighbourhoodOf(row: typeof parcels.$inferSelect, tx: Db): FeatureCollection {
  const box: [number, number, number, number] = [row.minX - NEIGHBOURHOOD, row.minY - NEIGHBOURHOOD, row.maxX + NEIGHBOURHOOD, row.maxY + NEIGHBOURHOOD];
  const near = tx.select({ parcelId: parcels.parcelId, geometry: parcels.geometryWgs84 }).from(parcels).where(layerRowsInBox(parcels, row.layerId, box)).limit(NEIGHBOURS_SHOWN).all();
  return { type: "FeatureCollection", features: near.map((n) => ({ type: "Feature", geometry: JSON.parse(n.geometry), properties: { parcelId: n.parcelId } })) };
}

/** Project units per working-CRS unit (a US-feet project on a metre grid), as the land reader scales. */
function unitScale(project: Project): number {
  const epsg = project.crs ? parseEpsgCode(project.crs) : null;
  const unit = epsg === null ? null : resolveCrs({ epsg }).unit;
  return unit ? METRES_PER_UNIT[unit] / METRES_PER_UNIT[project.units as LengthUnit] : 1;
}

const scaled = (p: Position[], k: number) => (k === 1 ? p : p.map(([x, y]) => [x! * k, y! * k]));

function boundsOfWgs84(text: string): [number, number, number, number] | null {
  const g = JSON.parse(text) as Polygon | MultiPolygon;
  const points = (g.type === "Polygon" ? g.coordinates.flat() : g.coordinates.flat(2)) as Position[];
  if (points.length === 0) return null;
  const xs = points.map((p) => p[0]!);
  const ys = points.map((p) => p[1]!);
  return [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
}

interface Context {
  crsDefinition: string;
  k: number;
  parcelLayerId: number | null;
  geometry: ReturnType<typeof computeAlignmentGeometry>;
  corridorInput: NonNullable<ReturnType<typeof findAlternativeVersion>>["corridor"];
}

/** What both drawings need: the working CRS, the unit scale, the active parcel layer and the approved version's alignment. */
function readContext(project: Project, alternativeId: number, version: number, tx: Db): Context | undefined {
  const code = project.crs ? parseEpsgCode(project.crs) : null;
  const crsDefinition = code === null ? undefined : findCrsByCode(code)?.proj4;
  const inputs = findAlternativeVersion(alternativeId, version, tx);
  if (!crsDefinition || !inputs) return undefined;
  const layer = tx.select({ id: layers.id }).from(layers).where(and(eq(layers.projectId, project.id), eq(layers.kind, "parcels"), eq(layers.status, "active"))).get();
  return { crsDefinition, k: unitScale(project), parcelLayerId: layer?.id ?? null, geometry: computeAlignmentGeometry(inputs.alignment), corridorInput: inputs.corridor };
}

const toCrs = (rings: PolygonCoords, k: number) => rings.map((r) => scaled(r, 1 / k));

/**
 * The approved version's right-of-way, easement and centreline for display (arcs chorded at the
 * engine's display tolerance), with no takes. Undefined when the project has no known working CRS.
 */
export function readAlternativeDrawing(project: Project, alternativeId: number, version: number, tx: Db = db()): CaseDrawing | undefined {
  const c = readContext(project, alternativeId, version, tx);
  return c ? drawingOf(c, []) : undefined;
}

function drawingOf(c: Context, takes: CaseDrawing["takes"], parcelBounds: CaseDrawing["parcelBounds"] = null, fabric = EMPTY): CaseDrawing {
  const built = buildCorridor(c.geometry.elements, c.corridorInput);
  const easement = built.easement ? easementOutline(built) : [];
  return {
    crsDefinition: c.crsDefinition,
    corridor: { type: "Polygon", coordinates: toCrs(corridorOutline(built), c.k) },
    easement: easement.length ? { type: "MultiPolygon", coordinates: easement.map((p) => toCrs(p, c.k)) } : null,
    takes,
    centerline: { type: "LineString", coordinates: scaled(c.geometry.centerline.coordinates as Position[], 1 / c.k) },
    parcelLayerId: c.parcelLayerId,
    parcelBounds,
    fabric,
  };
}

/**
 * The same with this parcel's take (right-of-way ∩ parcel, polyclip-ts through the engine) and
 * the parcel's WGS84 bounds to frame the map. Every area shown comes from the stored figures, never
 * from these outlines.
 */
export function readCaseDrawing(project: Project, alternativeId: number, version: number, parcelId: string, classification: "partial" | "full", tx: Db = db()): CaseDrawing | undefined {
  const c = readContext(project, alternativeId, version, tx);
  if (!c) return undefined;
  const row = c.parcelLayerId === null ? undefined : tx.select().from(parcels).where(and(eq(parcels.layerId, c.parcelLayerId), eq(parcels.parcelId, parcelId))).get();
  if (!row) return drawingOf(c, []);
  const g = JSON.parse(row.geometry) as Polygon | MultiPolygon;
  const polygons = (g.type === "Polygon" ? [g.coordinates] : g.coordinates).map((rings) => rings.map((r) => scaled(r, c.k))) as PolygonCoords[];
  const takes = computeTakePolygons({ elements: c.geometry.elements, corridor: c.corridorInput, parcels: [{ parcelId, polygons }] }).map((t) => ({
    parcelId,
    classification,
    geometry: { type: "MultiPolygon" as const, coordinates: t.coordinates.map((p) => toCrs(p, c.k)) },
  }));
  return drawingOf(c, takes, boundsOfWgs84(row.geometryWgs84), neighbourhoodOf(row, tx));
}
