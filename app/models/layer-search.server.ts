import { and, asc, eq, or, sql, type SQL, type SQLWrapper } from "drizzle-orm";
import { buildings, parcels } from "~/db/schema";
import type { Layer } from "./layers.server";

/** The most matches a search returns. */
export const MAX_SEARCH_HITS = 50;

/** `text` as a LIKE pattern matching it anywhere, with LIKE's own wildcards taken literally. */
function containing(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

const like = (column: SQLWrapper, pattern: string) => sql`${column} LIKE ${pattern} ESCAPE '\\'`;

/**
 * The condition for a layer's rows whose parcel ID, owner or situs address (buildings: the
 * parcel ID they name) contains `q`, ignoring ASCII case as SQLite's LIKE does.
 */
export function searchCondition(layer: Layer, q: string): SQL {
  const pattern = containing(q.trim());
  if (layer.kind === "buildings") return and(eq(buildings.layerId, layer.id), like(buildings.parcelId, pattern))!;
  return and(eq(parcels.layerId, layer.id), or(like(parcels.parcelId, pattern), like(parcels.owner, pattern), like(parcels.address, pattern)))!;
}

/** Best matches first: the exact parcel ID, then IDs that start with the text, then by ID. */
export function searchOrder(layer: Layer, q: string): SQL[] {
  const id = layer.kind === "parcels" ? parcels.parcelId : buildings.parcelId;
  const text = q.trim();
  return [sql`CASE WHEN lower(${id}) = lower(${text}) THEN 0 WHEN ${id} LIKE ${containing(text).slice(1)} ESCAPE '\\' THEN 1 ELSE 2 END`, asc(id)];
}
