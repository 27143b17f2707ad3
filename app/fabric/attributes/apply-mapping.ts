import { z } from "zod";
import type { AreaFeature, Properties, RejectedRow } from "../types";
import { FEATURE_ID_SOURCE, type FieldMapping } from "./field-mapping";
import { parseLandValue } from "./land-value";

/** Whether a land value is for the whole parcel or per unit of area (unit set by the project). */
export type LandValueBasis = "total" | "perArea";

/** A feature's attributes in Takeline's terms, plus every source attribute untouched. */
export interface MappedAttributes {
  parcelId: string | null;
  owner: string | null;
  address: string | null;
  landUse: string | null;
  /** Non-negative, in the file's currency; see landValueBasis. */
  landValue: number | null;
  landValueBasis: LandValueBasis;
  attributes: Properties;
}

export interface MappingOptions {
  /** Parcels need a unique parcel ID; building footprints may have none and share one. */
  kind: "parcels" | "buildings";
  landValueBasis: LandValueBasis;
}

const text = z.string().trim().min(1).nullable();
const buildSchema = (kind: MappingOptions["kind"]) =>
  z.object({
    parcelId: kind === "parcels" ? z.string({ error: "parcel ID is missing" }).trim().min(1, "parcel ID is missing") : text,
    owner: text,
    address: text,
    landUse: text,
    landValue: z.number().finite().nonnegative("land value is negative").nullable(),
  });
// Built once: zod compiles a schema on first use, which per row cost more than all the geometry work.
const SCHEMAS = { parcels: buildSchema("parcels"), buildings: buildSchema("buildings") };

function textOf(v: unknown): string | null {
  if (v === null || v === undefined) return null;
  const s = String(v).trim();
  return s === "" ? null : s;
}

function sourceValue(f: AreaFeature, field: string | null): unknown {
  if (field === null) return null;
  return field === FEATURE_ID_SOURCE ? f.id : f.properties[field];
}

/** Maps and validates one feature's attributes; a reason string when it cannot be used. */
export function mapFeatureAttributes(f: AreaFeature, mapping: FieldMapping, options: MappingOptions): MappedAttributes | string {
  const land = parseLandValue(sourceValue(f, mapping.landValue));
  if ("error" in land) return land.error;
  const candidate = {
    parcelId: textOf(sourceValue(f, mapping.parcelId)),
    owner: textOf(sourceValue(f, mapping.owner)),
    address: textOf(sourceValue(f, mapping.address)),
    landUse: textOf(sourceValue(f, mapping.landUse)),
    landValue: land.value,
  };
  const parsed = SCHEMAS[options.kind].safeParse(candidate);
  if (!parsed.success) return parsed.error.issues.map((i) => i.message).join("; ");
  return { ...parsed.data, parcelId: parsed.data.parcelId ?? null, landValueBasis: options.landValueBasis, attributes: f.properties };
}

/** Rejects every row of a parcel ID used more than once: which one is right cannot be known. */
function duplicateReasons(mapped: { f: AreaFeature; m: MappedAttributes }[]): Map<AreaFeature, string> {
  const rowsById = new Map<string, number[]>();
  for (const { f, m } of mapped) {
    if (!m.parcelId) continue;
    const rows = rowsById.get(m.parcelId);
    if (rows) rows.push(f.sourceRow);
    else rowsById.set(m.parcelId, [f.sourceRow]);
  }
  const reasons = new Map<AreaFeature, string>();
  for (const { f, m } of mapped) {
    const rows = m.parcelId ? rowsById.get(m.parcelId)! : [];
    if (rows.length > 1) reasons.set(f, `parcel ID "${m.parcelId}" is used by rows ${rows.join(", ")}; parcel IDs must be unique (merge parts into one multipolygon)`);
  }
  return reasons;
}

/**
 * Sorts features mapped one by one (`mapFeatureAttributes`, in the same order) into usable and
 * rejected rows; parcels that share a parcel ID are all rejected.
 */
export function settleFieldMapping<F extends AreaFeature>(features: F[], results: (MappedAttributes | string)[], options: MappingOptions): { mapped: { feature: F; attributes: MappedAttributes }[]; rejected: RejectedRow[] } {
  const rejected: RejectedRow[] = [];
  const ok: { f: F; m: MappedAttributes }[] = [];
  features.forEach((f, i) => {
    const m = results[i]!;
    if (typeof m === "string") rejected.push({ row: f.sourceRow, reason: m });
    else ok.push({ f, m });
  });
  const dupes = options.kind === "parcels" ? duplicateReasons(ok) : new Map<AreaFeature, string>();
  for (const [f, reason] of dupes) rejected.push({ row: f.sourceRow, reason });
  const mapped = ok.filter(({ f }) => !dupes.has(f)).map(({ f, m }) => ({ feature: f, attributes: m }));
  return { mapped, rejected: rejected.sort((a, b) => a.row - b.row) };
}

/**
 * Applies a field mapping to read features and validates the result with zod:
 * parcels need a parcel ID, unique in the layer; land values must be
 * non-negative numbers. Unusable rows come back in `rejected` with reasons.
 */
export function applyFieldMapping<F extends AreaFeature>(features: F[], mapping: FieldMapping, options: MappingOptions = { kind: "parcels", landValueBasis: "total" }) {
  return settleFieldMapping(features, features.map((f) => mapFeatureAttributes(f, mapping, options)), options);
}
