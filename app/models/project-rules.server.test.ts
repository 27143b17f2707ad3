import { expect, test } from "vitest";
import { defaultTakeRules } from "~/calculations/take-rules";
import { createDecisionProject } from "../../tests/factories/decision-project";
import { createUser } from "../../tests/factories/users";
import { readLatestSummary } from "./alternative-impacts.server";
import { listProjectAuditEvents } from "./audit.server";
import { describeProjectRules, mergeTakeRules, ProjectPatchSchema, readTakeRulesForm, saveProjectTakeRules, updateProjectTakeRules } from "./project-rules.server";
import { createProject, findProjectForUser, toProjectJson } from "./projects.server";

test("a patch may set a rule or clear it with null; unknown keys, negative values and fractions over 1 are refused", () => {
  expect(ProjectPatchSchema.safeParse({ takeRules: { adminCostPerParcel: 9000, severancePercent: null } }).success).toBe(true);
  const refused = (takeRules: unknown) => ProjectPatchSchema.safeParse({ takeRules }).error?.issues.map((i) => [i.code, i.path.join(".")]);
  expect(refused({ adminCost: 1 })).toEqual([["unrecognized_keys", "takeRules"]]);
  expect(refused({ landValuePerArea: -1 })).toEqual([["too_small", "takeRules.landValuePerArea"]]);
  expect(refused({ remnantMinFraction: 1.01 })).toEqual([["too_big", "takeRules.remnantMinFraction"]]);
  expect(refused({ proximityDistance: "3" })).toEqual([["invalid_type", "takeRules.proximityDistance"]]);
  expect(ProjectPatchSchema.safeParse({ takeRules: {}, name: "x" }).success).toBe(false);
});

test("merging is key by key: numbers replace, null removes, missing keys stay", () => {
  const merged = mergeTakeRules({ remnantMinArea: 400, severancePercent: 5 }, { severancePercent: null, contingencyPercent: 30 });
  expect(merged).toEqual({ remnantMinArea: 400, contingencyPercent: 30 });
  expect(mergeTakeRules(null, { buildingValue: 0 })).toEqual({ buildingValue: 0 });
});

test("the form: a blank field means the default, a number sets the rule, anything else is named by field", () => {
  expect(readTakeRulesForm({ intent: "save-rules", adminCostPerParcel: " 15000 ", severancePercent: "", remnantMinFraction: "0.25", buildingValue: "2.5e5" })).toEqual({
    ok: true,
    patch: { adminCostPerParcel: 15000, severancePercent: null, remnantMinFraction: 0.25, buildingValue: 250000 },
  });
  const bad = readTakeRulesForm({ adminCostPerParcel: "12,000", landValuePerArea: "-4", remnantMinFraction: "1.5", contingencyPercent: "lots" });
  expect(bad).toEqual({
    ok: false,
    fieldErrors: {
      adminCostPerParcel: "Enter a number, or leave it blank for the default.",
      landValuePerArea: "Enter 0 or more.",
      remnantMinFraction: "Enter at most 1.",
      contingencyPercent: "Enter a number, or leave it blank for the default.",
    },
  });
});

test("two saves merge in the database; clearing every rule stores none; each save is audited", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Wrenfold Spur", description: "", units: "m" }, planner);
  updateProjectTakeRules(project.id, { remnantMinArea: 400 }, planner);
  const second = updateProjectTakeRules(project.id, { contingencyPercent: 35 }, planner);
  expect(second.takeRules).toEqual({ remnantMinArea: 400, contingencyPercent: 35 });
  const json = toProjectJson(second);
  expect(json.takeRules).toEqual({ remnantMinArea: 400, contingencyPercent: 35 });
  expect(json.resolvedTakeRules).toEqual({ ...defaultTakeRules("m"), remnantMinArea: 400, contingencyPercent: 35 });
  const cleared = updateProjectTakeRules(project.id, { remnantMinArea: null, contingencyPercent: null }, planner);
  expect(cleared.takeRules).toBeNull();
  expect(toProjectJson(cleared).resolvedTakeRules).toEqual(defaultTakeRules("m"));
  expect(listProjectAuditEvents(project.id).filter((e) => e.action === "project.take-rules-changed")).toHaveLength(3);
});

test("the page rows say which value is in effect and whose it is, in the project's units", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Hollin Cut", description: "", units: "ft" }, planner);
  const rows = describeProjectRules(updateProjectTakeRules(project.id, { adminCostPerParcel: 9000 }, planner));
  const byKey = Object.fromEntries(rows.map((r) => [r.key, r]));
  expect(byKey.adminCostPerParcel).toEqual({ key: "adminCostPerParcel", value: 9000, source: "project", defaultValue: 12000 });
  // 250 m² in square international feet: 1 ft = 0.3048 m exactly (NIST SP 811, B.8), rounded to whole ft².
  expect(byKey.remnantMinArea).toEqual({ key: "remnantMinArea", value: Math.round(250 / 0.3048 ** 2), source: "default", defaultValue: Math.round(250 / 0.3048 ** 2) });
  expect(rows).toHaveLength(9);
});

test("saving recomputes the stored impacts: each parcel with a take costs Δ × (1 + contingency %) more", async () => {
  const { project, alternative, planner } = await createDecisionProject(4);
  const before = saveProjectTakeRules(project, {}, planner);
  const summaryBefore = readLatestSummary(alternative.id)!;
  const updated = saveProjectTakeRules(before, { adminCostPerParcel: 15_000 }, planner);
  const summaryAfter = readLatestSummary(alternative.id)!;
  // take-costs.ts: administrative is charged once per parcel with a take, and the contingency is
  // a percentage of the sum of the lines, so the total rises by Δ·(1 + c/100) per parcel.
  const contingency = toProjectJson(updated).resolvedTakeRules.contingencyPercent;
  const delta = 15_000 - defaultTakeRules("m").adminCostPerParcel;
  expect(summaryAfter.parcelsAffected).toBe(4);
  expect(summaryAfter.estimatedCost - summaryBefore.estimatedCost).toBeCloseTo(4 * delta * (1 + contingency / 100), 6);
  expect(findProjectForUser(project.id, planner)?.takeRules).toEqual({ adminCostPerParcel: 15_000 });
});
