import { expect, test } from "vitest";
import type { MultiPolygon, Polygon } from "geojson";
import { geosAreas } from "~/fabric/test-support/reference-tools.server";
import { createDecisionProject } from "../../tests/factories/decision-project";
import { readAlternativeDrawing, readCaseDrawing } from "./case-drawing.server";

test("the parcel page's drawing: GEOS measures the drawn take and corridor at their closed-form areas", async () => {
  const f = await createDecisionProject();
  const drawing = readCaseDrawing(f.project, f.alternative.id, 1, "FL-005", "partial")!;
  expect(drawing.crsDefinition).toMatch(/\+proj=utm \+zone=17/);
  expect(drawing.takes).toHaveLength(1);
  // GEOS (Debian python3-shapely) on the outlines: take 100 m × 40 m; corridor 1 000 m × 40 m (closed form).
  const [take, corridor] = geosAreas([drawing.takes[0]!.geometry as MultiPolygon, drawing.corridor as Polygon]);
  expect(Math.abs(take! - 4000)).toBeLessThan(0.01);
  expect(Math.abs(corridor! - 40_000)).toBeLessThan(0.01);
  // The neighbourhood: parcels within 150 m of FL-005 (x 561 400–561 500), no more.
  expect(drawing.fabric.features.map((f) => f.properties?.parcelId).sort()).toEqual(["FL-003", "FL-004", "FL-005", "FL-006", "FL-007"]);
  const [w, s, e, n] = drawing.parcelBounds!;
  expect(w < e && s < n && w > -81 && e < -79).toBe(true);
});

test("the assignment page's drawing has the corridor and no takes or fabric of its own", async () => {
  const f = await createDecisionProject();
  const drawing = readAlternativeDrawing(f.project, f.alternative.id, 1)!;
  expect([drawing.takes.length, drawing.fabric.features.length, drawing.parcelLayerId !== null]).toEqual([0, 0, true]);
  expect(readAlternativeDrawing(f.project, f.alternative.id, 9)).toBeUndefined();
});
