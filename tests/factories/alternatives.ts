import { createAlternative, type Alternative, type AlternativeInputs } from "~/models/alternatives.server";

/** Inputs of a plain alternative: one simple curve, 40 m of right-of-way, project in metres. */
export function alternativeInputs(overrides: Partial<AlternativeInputs> = {}): AlternativeInputs {
  return {
    name: "Test line",
    description: "",
    designSpeed: 80,
    speedUnit: "km/h",
    emaxPercent: 8,
    alignment: { units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 500, y: 0, curve: { type: "simple", radius: 300 } }, { x: 900, y: 400 }] },
    corridor: { left: 20, right: 20 },
    rules: {},
    acceptedChecks: [],
    ...overrides,
  };
}

/** A stored alternative in the test database. */
export function createTestAlternative(projectId: number, actorId: number, overrides: Partial<AlternativeInputs> = {}): Alternative {
  return createAlternative(projectId, alternativeInputs(overrides), actorId);
}
