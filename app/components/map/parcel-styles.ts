import type { ExpressionSpecification } from "maplibre-gl";

/** Land-use classes with our colours, and the codes county files commonly use for each (common practice). */
export const LAND_USE_CLASSES = [
  { label: "residential", colour: "#e8c9a0", codes: ["residential", "res", "r"] },
  { label: "commercial", colour: "#d9a3a0", codes: ["commercial", "com", "c"] },
  { label: "industrial", colour: "#b9aed6", codes: ["industrial", "ind", "i"] },
  { label: "agricultural", colour: "#cbdca4", codes: ["agricultural", "agr", "ag", "a"] },
  { label: "public", colour: "#a9cfd8", codes: ["public", "pub", "p", "exempt"] },
  { label: "vacant", colour: "#ebe7dc", codes: ["vacant", "vac", "v"] },
];
const OTHER = "#d8d3c4";

export type ParcelColouring = "landUse" | "landValue";

export function parcelFillColour(by: ParcelColouring): ExpressionSpecification {
  if (by === "landUse") {
    const arms = LAND_USE_CLASSES.flatMap((c) => [c.codes, c.colour]);
    return ["match", ["downcase", ["to-string", ["get", "landUse"]]], ...arms, OTHER] as unknown as ExpressionSpecification;
  }
  // Value per square unit, so a big cheap field and a small dear lot compare fairly.
  return [
    "interpolate",
    ["linear"],
    ["/", ["to-number", ["get", "landValue"], 0], ["max", ["to-number", ["get", "area"], 1], 1]],
    0, "#f3efe3",
    20, "#e9c98f",
    80, "#d98a4e",
    250, "#a44a25",
  ];
}

export const VALUE_LEGEND = [
  { colour: "#f3efe3", label: "0" },
  { colour: "#e9c98f", label: "20" },
  { colour: "#d98a4e", label: "80" },
  { colour: "#a44a25", label: "250+" },
];
