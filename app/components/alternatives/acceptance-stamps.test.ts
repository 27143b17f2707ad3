import { expect, test } from "vitest";
import { withSavedStamps } from "./acceptance-stamps";

const saved = [{ id: "min-radius:pi-1", reason: "Terrain", acceptedBy: "Tamsin Quorral", acceptedAt: "2026-12-02T03:00:00.000Z" }];

test("a saved stamp is shown for the same check with the same reason, and only then", () => {
  expect(withSavedStamps([{ id: "min-radius:pi-1", reason: "Terrain" }], saved)).toEqual(saved);
  // A reason edited since the save is not the acceptance the server stamped.
  expect(withSavedStamps([{ id: "min-radius:pi-1", reason: "Terrain and cost" }], saved)).toEqual([{ id: "min-radius:pi-1", reason: "Terrain and cost" }]);
  expect(withSavedStamps([{ id: "min-radius:pi-2", reason: "Terrain" }], saved)).toEqual([{ id: "min-radius:pi-2", reason: "Terrain" }]);
});

test("nothing to fill in returns the draft's own list (no needless re-render)", () => {
  const draft = [{ id: "a", reason: "r" }];
  expect(withSavedStamps(draft, null)).toBe(draft);
  expect(withSavedStamps(draft, [])).toBe(draft);
});
