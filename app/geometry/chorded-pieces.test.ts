import * as polyclip from "polyclip-ts";
import { expect, test } from "vitest";
import { arcAreas, chordPieces } from "./chorded-pieces";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { buildCorridor } from "./corridor-build";

// A 90° left curve of R = 300 m with 20 + 20 m of right-of-way: every slice is an annular sector
// of area ½ Δ (320² − 280²) (closed form).
const { elements } = computeAlignmentGeometry({ units: "m", startStation: 0, points: [{ x: 500_000, y: 4_000_000 }, { x: 501_000, y: 4_000_000, curve: { type: "simple", radius: 300 } }, { x: 501_000, y: 4_001_000 }] });
const slices = buildCorridor(elements, { left: 20, right: 20 }).pieces.filter((p) => p.kind === "annular");

test("chorded slices measure their exact sector areas once each chord's segment is put back, even at 5 cm of sagitta", () => {
  const [ox, oy] = slices[0]!.corners[0];
  const { geoms, chords } = chordPieces(slices, ox, oy, 0.05);
  const exact = (Math.PI / 2 / 2) * (320 ** 2 - 280 ** 2);
  const restored = geoms.reduce((s, g) => s + arcAreas(g, chords)[0]!, 0);
  expect(restored).toBeCloseTo(exact, 6);
  // Without the segments the chords lose ⅔ · sagitta per metre of arc on the outside and gain it inside: not exact.
  const bare = geoms.reduce((s, g) => s + arcAreas(g, new Map())[0]!, 0);
  expect(Math.abs(bare - exact)).toBeGreaterThan(1);
});

test("segments are put back on polyclip-ts output too: the union of the slices is the whole annular quarter", () => {
  const [ox, oy] = slices[0]!.corners[0];
  const { geoms, chords } = chordPieces(slices, ox, oy, 0.001);
  const union = polyclip.union(geoms[0]!, ...geoms.slice(1));
  expect(arcAreas(union, chords).reduce((s, a) => s + a, 0)).toBeCloseTo((Math.PI / 4) * (320 ** 2 - 280 ** 2), 6);
});
