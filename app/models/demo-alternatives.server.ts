import type { AlignmentInput } from "~/geometry/alignment-types";
import type { CorridorInput } from "~/geometry/take-types";
import { db } from "~/utils/db.server";
import { readImpacts } from "./alternative-impacts.server";
import { createAlternative, findAlternativeByName, type AlternativeInputs } from "./alternatives.server";
import { findProjectByName } from "./projects.server";

/** A two-lane rural bypass: 40 m of right-of-way and 5 m of working space beyond it (invented scenario). */
const CORRIDOR: CorridorInput = { left: 20, right: 20, easement: 5 };

const line = (points: AlignmentInput["points"]): AlignmentInput => ({ units: "m", startStation: 0, points });

/**
 * Three invented alternatives for the Quillmere Eastern Bypass, drawn so their trade-offs differ:
 * the shortest runs up the town's east edge and displaces dozens of buildings; one swings east on
 * a compound curve through farmland (longer, far cheaper); one keeps to Marrow Brook's open ground
 * and is longest, with the most land and a design-check warning.
 */
export const DEMO_ALTERNATIVES: Pick<AlternativeInputs, "name" | "description" | "alignment" | "corridor">[] = [
  {
    name: "Town-edge line",
    description: "Shortest: runs up the east edge of Quillmere's blocks and crosses Ostrand Pike close to town.",
    corridor: CORRIDOR,
    alignment: line([
      { x: 561900, y: 4418480 },
      { x: 561650, y: 4419500, curve: { type: "simple", radius: 500 } },
      { x: 561700, y: 4420900, curve: { type: "simple", radius: 450 } },
      { x: 562000, y: 4421980 },
    ]),
  },
  {
    name: "Eastern swing",
    description: "Swings east of the last blocks on a compound curve through open farmland, then returns to the north tie-in.",
    corridor: CORRIDOR,
    alignment: line([
      { x: 561900, y: 4418480 },
      { x: 562450, y: 4419300, curve: { type: "compound", radius1: 650, radius2: 450, delta1: 20 } },
      { x: 562500, y: 4421000, curve: { type: "simple", radius: 700 } },
      { x: 562000, y: 4421980 },
    ]),
  },
  {
    name: "Brookside line",
    description: "Keeps to the open ground north of Marrow Brook before turning north: longest and most land, with a short tangent between reversing curves.",
    corridor: CORRIDOR,
    alignment: line([
      { x: 561900, y: 4418480 },
      { x: 561950, y: 4419720, curve: { type: "simple", radius: 500 } },
      { x: 563200, y: 4419520, curve: { type: "simple", radius: 600 } },
      { x: 563250, y: 4421300, curve: { type: "simple", radius: 600 } },
      { x: 562000, y: 4421980 },
    ]),
  },
];

/** Creates the demo alternatives that are missing and computes their impacts. Safe to run again. */
export function seedDemoAlternatives(projectName: string, plannerId: number): number {
  const project = findProjectByName(projectName);
  if (!project) throw new Error(`demo project ${projectName} is missing`);
  let created = 0;
  for (const alt of DEMO_ALTERNATIVES) {
    const existing = findAlternativeByName(project.id, alt.name);
    const alternative =
      existing ??
      createAlternative(project.id, { ...alt, designSpeed: 80, speedUnit: "km/h", emaxPercent: 8, rules: {}, acceptedChecks: [] }, plannerId, db());
    if (!existing) created++;
    readImpacts(alternative, project);
  }
  return created;
}
