/**
 * Test factory for the impact-table exports: invented parcels of the invented town of Quillmere
 * (Ostrand County) with take polygons whose areas are known in closed form. No real people or
 * places. Coordinates are offsets from an origin in the working CRS.
 */
import type { LengthUnit } from "~/geometry";
import type { PolygonCoords } from "~/geometry/take-types";
import type { ImpactExportRow, ImpactExportSheet } from "~/exports/impact-types";

type Ring = number[][];

/** Counter-clockwise rectangle ring (RFC 7946 exterior orientation). */
function rectangle(x: number, y: number, w: number, h: number): Ring {
  return [[x, y], [x + w, y], [x + w, y + h], [x, y + h], [x, y]];
}

/** Regular n-gon of circumradius r about (cx, cy): area (n/2)·r²·sin(2π/n) (closed form). */
function regularPolygon(cx: number, cy: number, r: number, n: number): Ring {
  const ring = Array.from({ length: n }, (_, i) => [cx + r * Math.cos((2 * Math.PI * i) / n), cy + r * Math.sin((2 * Math.PI * i) / n)]);
  return [...ring, ring[0]!];
}

export const regularPolygonArea = (r: number, n: number) => (n / 2) * r * r * Math.sin((2 * Math.PI) / n);

interface Shape {
  polygons: PolygonCoords[];
  area: number;
}

/** Take shapes around an origin: a rectangle, a rectangle with a hole, two parts, a 64-gon, and none. */
function shapes(x0: number, y0: number): (Shape | null)[] {
  return [
    { polygons: [[rectangle(x0, y0, 40.5, 12.25)]], area: 40.5 * 12.25 },
    { polygons: [[rectangle(x0 + 100, y0, 60, 30), rectangle(x0 + 110, y0 + 10, 5, 4).reverse()]], area: 60 * 30 - 5 * 4 },
    { polygons: [[rectangle(x0 + 200, y0, 10, 10)], [rectangle(x0 + 220, y0, 7.5, 2)]], area: 100 + 15 },
    { polygons: [[regularPolygon(x0 + 400, y0 + 50, 25, 64)]], area: regularPolygonArea(25, 64) },
    null,
  ];
}

const OWNERS = ["Maradel Quonsey", 'Corvell "Wren" Hatheway, trustee', "Åsa Ørnvik-Dalby", null, "Pell Harrowgate"];
const ADDRESSES = ["12 Fennick Row, Quillmere", "40 Ostrand Pike", "3 Wexlow Court, Quillmere", null, "Lot 9, Quillmere"];

/** Cost lines that add up: land = area × rate, severance 25 % of land on partial takes, 10 % contingency. */
function costOf(area: number, partial: boolean, displaced: number) {
  const land = area * 14.5;
  const buildings = displaced * 185_000;
  const severance = partial ? land * 0.25 : 0;
  const easement = area * 0.8;
  const administrative = 6_500;
  const contingency = 0.1 * (land + buildings + severance + easement + administrative);
  return { land, buildings, severance, easement, administrative, contingency, total: land + buildings + severance + easement + administrative + contingency };
}

/** Five invented rows whose `takeArea` equals their polygon's closed-form area (0 for the row without geometry). */
export function createImpactRows(x0: number, y0: number, prefix = "QM"): ImpactExportRow[] {
  return shapes(x0, y0).map((shape, i) => {
    const takeArea = shape?.area ?? 0;
    const parcelArea = i === 2 ? takeArea : 5_000 + 250 * i;
    const full = parcelArea === takeArea;
    const hit = i === 1 ? ["B-101", "B-102"] : [];
    return {
      parcelId: `${prefix}-${String(i + 1).padStart(3, "0")}`,
      owner: OWNERS[i]!,
      address: ADDRESSES[i]!,
      parcelArea,
      takeArea,
      easementArea: i === 4 ? 85.25 : 10 * i,
      remainderArea: parcelArea - takeArea,
      takeFraction: takeArea / parcelArea,
      remainderPieces: full ? 0 : i === 3 ? 2 : 1,
      remainderPieceAreas: full ? [] : i === 3 ? [parcelArea - takeArea - 120.5, 120.5] : [parcelArea - takeArea],
      classification: full ? "full" : "partial",
      buildingsHit: hit,
      buildingsNear: i === 3 ? ["B-140"] : [],
      cost: costOf(takeArea, !full, hit.length),
      stationFrom: 1000 + 120.125 * i,
      stationTo: 1000 + 120.125 * i + 64.5,
      geometry: shape?.polygons ?? null,
    };
  });
}

/** One alternative's sheet of invented rows. */
export function createImpactSheet(name: string, units: LengthUnit, x0: number, y0: number, prefix?: string): ImpactExportSheet {
  return { alternativeName: name, units, rows: createImpactRows(x0, y0, prefix), corridorArea: 9_876.5, unparcelledArea: 321.25 };
}

/** Quillmere's working CRS in the fabric tests: NAD83 / California zone 5 (ftUS), and an origin inside it. */
export const QUILLMERE_EPSG = 2229;
export const QUILLMERE_ORIGIN: [number, number] = [6_487_000, 1_840_000];
