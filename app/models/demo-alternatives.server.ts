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
 * the shortest skirts the town's east edge and takes houses; one swings around the eastern blocks
 * on a compound curve; one keeps to Marrow Brook's open ground and is longest.
 */
export const DEMO_ALTERNATIVES: Pick<AlternativeInputs, "name" | "description" | "alignment" | "corridor">[] = [
  {
    name: "Town-edge line",
    description: "Shortest: hugs the east edge of Quillmere and crosses Ostrand Pike close to town.",
    corridor: CORRIDOR,
    alignment: line([
      { x: 561150, y: 4417300 },
      { x: 561750, y: 4419600, curve: { type: "simple", radius: 600 } },
      { x: 561650, y: 4421000, curve: { type: "simple", radius: 450 } },
      { x: 562100, y: 4422050 },
    ]),
  },
  {
    name: "Eastern swing",
    description: "Swings east of the last blocks on a compound curve, then returns to the north tie-in.",
    corridor: CORRIDOR,
    alignment: line([
      { x: 561150, y: 4417300 },
      { x: 562350, y: 4418900, curve: { type: "compound", radius1: 650, radius2: 450, delta1: 14 } },
      { x: 562550, y: 4420800, curve: { type: "simple", radius: 700 } },
      { x: 562100, y: 4422050 },
    ]),
  },
  {
    name: "Brookside line",
    description: "Follows the open ground along Marrow Brook before turning north past Quill Mere: longest, fewest houses.",
    corridor: CORRIDOR,
    alignment: line([
      { x: 561150, y: 4417300 },
      { x: 562950, y: 4419250, curve: { type: "simple", radius: 800 } },
      { x: 563250, y: 4421250, curve: { type: "simple", radius: 600 } },
      { x: 562100, y: 4422050 },
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
