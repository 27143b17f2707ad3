import type { ExpressionSpecification } from "maplibre-gl";

/** Land-use classes the demo and the usual county codes map to, with our colours. */
export const LAND_USE_COLOURS: Record<string, string> = {
  residential: "#e8c9a0",
  commercial: "#d9a3a0",
  industrial: "#b9aed6",
  agricultural: "#cbdca4",
  public: "#a9cfd8",
  vacant: "#e6e2d6",
};
const OTHER = "#d8d3c4";

export type ParcelColouring = "landUse" | "landValue";

export function parcelFillColour(by: ParcelColouring): ExpressionSpecification {
  if (by === "landUse") {
    return ["match", ["downcase", ["to-string", ["get", "landUse"]]], ...Object.entries(LAND_USE_COLOURS).flat(), OTHER] as unknown as ExpressionSpecification;
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
