import { and, eq } from "drizzle-orm";
import type { MultiPolygon, Polygon } from "geojson";
import { buildings, fabricChanges, layers, parcels } from "~/db/schema";
import { resolveCrs, parseEpsgCode } from "~/fabric/index.server";
import type { PolygonCoords, TakeBuildingInput, TakeParcelInput } from "~/geometry/take-types";
import { METRES_PER_UNIT, type LengthUnit } from "~/geometry/units";
import { db, type Db } from "~/utils/db.server";
import type { Project } from "./projects.server";

/** A project's land data in the project's length unit, ready for the take engine. */
export interface ProjectLand {
  /** Identifies the land data: changes whenever a parcel or building layer is replaced. */
  key: string;
  parcels: TakeParcelInput[];
  buildings: TakeBuildingInput[];
}

/** Reads the project's active parcel and building layers (every row; the engine indexes them). */
export function readProjectLand(project: Project, tx: Db = db()): ProjectLand {
  const active = tx.select().from(layers).where(and(eq(layers.projectId, project.id), eq(layers.status, "active"))).all();
  const parcelLayer = active.find((l) => l.kind === "parcels");
  const buildingLayer = active.find((l) => l.kind === "buildings");
  const scale = coordinateScale(project);
  const parcelRows = parcelLayer ? tx.select().from(parcels).where(eq(parcels.layerId, parcelLayer.id)).all() : [];
  const buildingRows = buildingLayer ? tx.select().from(buildings).where(eq(buildings.layerId, buildingLayer.id)).all() : [];
  return {
    key: landKey(project, parcelLayer?.id, buildingLayer?.id, tx),
    parcels: parcelRows.map((r) => ({
      parcelId: r.parcelId,
      owner: r.owner,
      address: r.address,
      polygons: polygonsOf(r.geometry, scale),
      landValuePerArea: r.landValue === null ? null : r.landValueBasis === "perArea" ? r.landValue : r.area > 0 ? r.landValue / r.area : null,
    })),
    buildings: buildingRows.map((r) => ({ buildingId: String(r.id), parcelId: r.parcelId, polygons: polygonsOf(r.geometry, scale), value: r.value })),
  };
}

/** The land key without reading any rows: cheap enough to call on every request. */
export function readProjectLandKey(project: Project, tx: Db = db()): string {
  const active = tx.select({ id: layers.id, kind: layers.kind }).from(layers).where(and(eq(layers.projectId, project.id), eq(layers.status, "active"))).all();
  return landKey(project, active.find((l) => l.kind === "parcels")?.id, active.find((l) => l.kind === "buildings")?.id, tx);
}

/** Layer ids and the project's last fabric change: take results computed under another key are stale. */
function landKey(project: Project, parcelLayerId: number | undefined, buildingLayerId: number | undefined, tx: Db): string {
  const changed = tx.select({ at: fabricChanges.changedAt }).from(fabricChanges).where(eq(fabricChanges.projectId, project.id)).get()?.at.getTime() ?? 0;
  return `p${project.id}:parcels${parcelLayerId ?? "-"}:buildings${buildingLayerId ?? "-"}:${project.units}:${project.crs ?? "-"}:${changed}`;
}

/**
 * Stored coordinates are in the working CRS's own unit; alignments are in the project's unit.
 * When the two differ (a US-feet project on a metre grid) coordinates are scaled here, once.
 */
function coordinateScale(project: Project): number {
  const epsg = project.crs ? parseEpsgCode(project.crs) : null;
  const crsUnit = epsg === null ? null : resolveCrs({ epsg }).unit;
  if (!crsUnit) return 1;
  return METRES_PER_UNIT[crsUnit] / METRES_PER_UNIT[project.units as LengthUnit];
}

function polygonsOf(text: string, scale: number): PolygonCoords[] {
  const g = JSON.parse(text) as Polygon | MultiPolygon;
  const polys = g.type === "Polygon" ? [g.coordinates] : g.coordinates;
  if (scale === 1) return polys as PolygonCoords[];
  return polys.map((rings) => rings.map((ring) => ring.map(([x, y]) => [x! * scale, y! * scale])));
}
