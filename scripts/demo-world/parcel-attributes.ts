/**
 * Assessor-style attributes for each planned parcel: APN, an invented owner,
 * situs, land-use code and a land value that is plausible for the use, the
 * zone and the area (rates per square metre are invented, order of magnitude
 * of a small Appalachian county: common practice, not appraisal).
 */
import type { Rng } from "./prng";
import { ownerName } from "./names";
import type { PlanParcel } from "./plan-types";

export interface ParcelAttributes {
  APN: string;
  OWNER_NM: string;
  SITUS: string;
  LU_CODE: string;
  LAND_VAL: number;
}

const PUBLIC_OWNERS = { town: "Town of Quillmere", county: "Ostrand County", schools: "Ostrand County School District" } as const;

/** Land rate in dollars per square metre, and a fixed site value added on top. */
function rate(p: PlanParcel): [number, number] {
  const town = { core: 1, mid: 0.72, outer: 0.5, rural: 0.1 }[p.zone];
  switch (p.use) {
    case "RES": return p.zone === "rural" ? [0.9, 42000] : [175 * town, 9000];
    case "COM": return [310 * town, 15000];
    case "IND": return [52, 20000];
    case "PUB": return p.zone === "rural" ? [0.9, 0] : [58, 0];
    case "AGR": return p.zone === "rural" ? [1.25, 0] : [11, 4000];
    case "VAC": return p.zone === "rural" ? [0.85, 0] : [95 * town, 0];
  }
}

export const apnOf = (p: PlanParcel): string => `OC-${String(p.book).padStart(4, "0")}-${String(p.lot).padStart(3, "0")}`;

/** Attributes for parcels in order; some owners hold several parcels, as in any real roll. */
export function attributesFor(rng: Rng, parcels: PlanParcel[], areas: number[]): ParcelAttributes[] {
  const held: Record<string, string[]> = { person: [], business: [], farm: [] };
  return parcels.map((p, i) => {
    let owner: string;
    if (p.owner === "town" || p.owner === "county" || p.owner === "schools") owner = PUBLIC_OWNERS[p.owner];
    else {
      const pool = held[p.owner]!;
      owner = pool.length > 20 && rng.chance(0.07) ? rng.pick(pool) : ownerName(rng, p.owner);
      pool.push(owner);
    }
    const [perM2, base] = rate(p);
    const value = Math.round(((areas[i]! * perM2 + base) * rng.range(0.82, 1.18)) / 100) * 100;
    return { APN: apnOf(p), OWNER_NM: owner, SITUS: p.situs, LU_CODE: p.use, LAND_VAL: value };
  });
}
