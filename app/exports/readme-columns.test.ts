import { readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { IMPACT_COLUMNS, unitSuffix } from "./impact-columns";

test("the README's field mapping lists exactly the columns the writers use, in order", () => {
  const readme = readFileSync(new URL("./README.md", import.meta.url), "utf8");
  const listed = [...readme.matchAll(/^\| `([^`]+)` \| `([A-Z_]+)` \|$/gm)].map((m) => [m[1], m[2]]);
  const expected = IMPACT_COLUMNS.map((c) => [c.key + unitSuffix(c.kind, "m").replace("_m", "_<u>"), c.dbf]);
  expect(listed).toEqual([...expected, ["(none)", "UNITS"]]);
  for (const c of IMPACT_COLUMNS) expect(c.dbf.length).toBeLessThanOrEqual(10);
});
