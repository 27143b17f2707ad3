/**
 * Invented test parcels in the invented town of Quillmere, Ostrand County,
 * placed in NAD83 / California zone 5 (ftUS), EPSG:2229. No real people or
 * parcels. Row 3 is a self-intersecting "bow tie"; row 5 has no geometry.
 */
import type { WktRow } from "./reference-tools.server";

const X = 6487000;
const Y = 1840000;
const sq = (x: number, y: number, w: number, h: number) =>
  `(${x} ${y}, ${x + w} ${y}, ${x + w} ${y + h}, ${x} ${y + h}, ${x} ${y})`;

export const QUILLMERE_ROWS: WktRow[] = [
  {
    wkt: `POLYGON (${sq(X, Y, 120.5, 250.25)}, ${sq(X + 20, Y + 30, 15.5, 22)})`,
    APN: "QM-001", OWNER_NM: "Maradel Quonsey", SITUS: "12 Fennick Row, Quillmere", LU: "RES", LAND_VAL: "$125,000",
  },
  {
    wkt: `MULTIPOLYGON ((${sq(X + 200, Y, 80, 90)}), ((${X + 300} ${Y}, ${X + 390.75} ${Y + 10}, ${X + 350} ${Y + 95.5}, ${X + 300} ${Y})))`,
    APN: "QM-002", OWNER_NM: "Tobiah Vennerick", SITUS: "40 Ostrand Pike, Quillmere", LU: "COM", LAND_VAL: "88000.50",
  },
  {
    wkt: `POLYGON ((${X + 500} ${Y}, ${X + 600} ${Y + 100}, ${X + 600} ${Y}, ${X + 500} ${Y + 100}, ${X + 500} ${Y}))`,
    APN: "QM-003", OWNER_NM: "Cressida Loamwright", SITUS: "7 Brindle Lane, Quillmere", LU: "RES", LAND_VAL: "51000",
  },
  {
    wkt: `POLYGON (${sq(X + 700, Y + 0.125, 64.375, 101.5)})`,
    APN: "QM-004", OWNER_NM: "Åsa Ørnvik-Dalby", SITUS: "3 Wexlow Court, Quillmere", LU: "AGR", LAND_VAL: "1,250",
  },
  { wkt: "", APN: "QM-005", OWNER_NM: "Pell Harrowgate", SITUS: "Lot 9, Quillmere", LU: "VAC", LAND_VAL: "" },
];
