import type { Properties } from "../types";

/** Takeline's parcel attribute names (a contract with the database and UI). */
export const TARGET_ATTRIBUTES = ["parcelId", "owner", "address", "landUse", "landValue"] as const;
export type TargetAttribute = (typeof TARGET_ATTRIBUTES)[number];

/** Source field for each target attribute, or null when the layer has none. */
export type FieldMapping = Record<TargetAttribute, string | null>;

/** Mapping source meaning "the GeoJSON feature.id", not a property. */
export const FEATURE_ID_SOURCE = "@id";

/** Field names (upper case, letters and digits only) that name a target outright. */
const EXACT: Record<TargetAttribute, string[]> = {
  parcelId: ["APN", "PIN", "PARCELID", "PARCELNO", "PARCELNUM", "PARCELNUMBER", "PARCELNBR", "PARCEL", "PID", "PARID", "AIN", "TAXID", "TAXPIN", "PRCLID", "PARCELPIN"],
  owner: ["OWNER", "OWNERNM", "OWNERNAME", "OWNERNME", "OWNNAME", "OWNNM", "OWNER1", "OWNERNAME1", "TAXPAYER", "OWNERS"],
  address: ["SITUS", "ADDRESS", "SITEADDR", "SITEADDRESS", "SITUSADDR", "SITUSADDRESS", "PROPADDR", "FULLADDR", "ADDR", "LOCADDR", "SITUSADD"],
  landUse: ["LU", "LANDUSE", "LUCODE", "LANDUSECD", "LANDUSECODE", "USECODE", "USECD", "PROPCLASS", "LUC"],
  landValue: ["LANDVAL", "LANDVALUE", "LNDVAL", "LANDVALU", "LANDAV", "ASSDLAND", "VALLAND", "LANDASMT"],
};

/** Looser patterns, tried when no field names a target outright. */
const PARTIAL: Record<TargetAttribute, RegExp> = {
  parcelId: /PARCEL|APN|^PIN|PIN$/,
  owner: /OWN/,
  address: /ADDR|SITUS/,
  landUse: /LANDUSE|^LU|USE(CODE|CD)?$/,
  landValue: /LAND.*VAL|VAL.*LAND/,
};

const squash = (name: string) => name.toUpperCase().replace(/[^A-Z0-9]/g, "");

/** How well sample values fit a target, 0..1: IDs should be unique, values numeric. */
function sampleFit(target: TargetAttribute, values: unknown[]): number {
  const present = values.filter((v) => v !== null && v !== undefined && String(v).trim() !== "");
  if (values.length === 0) return 0.5;
  if (target === "parcelId") return new Set(present.map(String)).size / values.length;
  if (target === "landValue") return present.filter((v) => /^[\s$€£]*[\d,]+(\.\d+)?\s*$/.test(String(v))).length / values.length;
  return present.length / values.length;
}

function score(target: TargetAttribute, field: string, rows: Properties[]): number {
  const name = squash(field);
  const base = EXACT[target].includes(name) ? 100 : PARTIAL[target].test(name) ? 50 : 0;
  return base === 0 ? 0 : base + 20 * sampleFit(target, rows.map((r) => r[field]));
}

/**
 * Pre-fills the attribute mapping from field names (APN/PIN/PARCEL_ID →
 * parcelId, OWNER_NM → owner, SITUS → address, LU_CODE → landUse,
 * LAND_VAL → landValue) with sample rows breaking ties. Each field is used
 * once. When no field looks like a parcel ID but features carry ids, the
 * GeoJSON feature.id (FEATURE_ID_SOURCE) is proposed.
 */
export function guessFieldMapping(fieldNames: string[], sampleRows: Properties[], sampleIds: unknown[] = []): FieldMapping {
  const used = new Set<string>();
  const mapping = Object.fromEntries(TARGET_ATTRIBUTES.map((t) => [t, null])) as FieldMapping;
  for (const target of TARGET_ATTRIBUTES) {
    const ranked = fieldNames
      .filter((f) => !used.has(f))
      .map((f) => ({ f, s: score(target, f, sampleRows) }))
      .filter((x) => x.s > 0)
      .sort((a, b) => b.s - a.s);
    const best = ranked[0];
    if (best) {
      mapping[target] = best.f;
      used.add(best.f);
    }
  }
  const ids = sampleIds.filter((v) => v !== undefined && v !== null && String(v) !== "");
  if (!mapping.parcelId && ids.length > 0 && ids.length === sampleIds.length) mapping.parcelId = FEATURE_ID_SOURCE;
  return mapping;
}
