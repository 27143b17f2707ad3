import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { StyleSpecification } from "maplibre-gl";
import { validateStyleMin } from "@maplibre/maplibre-gl-style-spec";
import { expect, test } from "vitest";
import { fabricSources, styleWithFabric } from "./fabric-style";
import type { MapLayerInfo } from "./project-map";

const base = JSON.parse(readFileSync(join(process.cwd(), "public", "tiles", "basemap-style.json"), "utf8")) as StyleSpecification;
const layers: MapLayerInfo[] = [
  { id: 7, kind: "buildings", name: "Footprints", bbox: null },
  { id: 3, kind: "parcels", name: "Parcels", bbox: null },
];

test("the basemap style with the fabric in it is a valid MapLibre style (the style specification's own validator)", () => {
  const style = styleWithFabric(base, fabricSources(layers, { hidden: new Set([7]), colouring: "landValue" }));
  expect(validateStyleMin(style)).toEqual([]);
  // Basemap first, then parcels, then footprints on top.
  const ids = style.layers.map((l) => l.id);
  expect(ids.slice(0, base.layers.length)).toEqual(base.layers.map((l) => l.id));
  expect(ids.slice(base.layers.length)).toEqual(["parcels-fill-3", "parcels-line-3", "buildings-7"]);
  expect(style.layers.find((l) => l.id === "buildings-7")?.layout).toEqual({ visibility: "none" });
});

test("footprint tiles are asked for from zoom 14, parcel tiles from zoom 0, both from the app's own tile route", () => {
  const [parcels, buildings] = fabricSources(layers);
  expect(parcels!.source.minzoom).toBe(0);
  expect(buildings!.source.minzoom).toBe(14);
  expect(parcels!.source.tiles![0]).toMatch(/\/tiles\/layers\/3\/\{z\}\/\{x\}\/\{y\}\.pbf$/);
});
