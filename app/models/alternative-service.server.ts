import type { z } from "zod";
import { evaluateAlternative } from "~/calculations/evaluate-alternative";
import type { AlternativeSummary } from "~/calculations/alternative-summary";
import { planTransition } from "~/calculations/alternative-lifecycle";
import type { CheckAcceptance } from "~/calculations/check-acceptances";
import { nameAcceptor, stampAcceptances } from "~/calculations/stamp-acceptances";
import type { AlternativeCreateSchema, AlternativeUpdateSchema } from "~/schemas/alternative-schemas";
import { apiError } from "~/utils/api-error.server";
import { db, type Db } from "~/utils/db.server";
import { createAlternative, findAlternativeVersion, inputsOf, updateAlternative, type Alternative, type AlternativeInputs, type UpdateOutcome } from "./alternatives.server";
import { evaluationInputsOf, readImpacts, takeSessionFor } from "./alternative-impacts.server";
import { reopenForEdit } from "./alternative-drafts.server";
import type { Project } from "./projects.server";
import { findUserById } from "./users.server";

type CreateBody = z.infer<typeof AlternativeCreateSchema>;
type UpdateBody = z.infer<typeof AlternativeUpdateSchema>;

/** Design speed a new alternative gets when none is given (common practice for a rural two-lane road). */
const DEFAULT_SPEED = { m: { designSpeed: 80, speedUnit: "km/h" }, ft: { designSpeed: 50, speedUnit: "mph" }, usft: { designSpeed: 50, speedUnit: "mph" } } as const;

/**
 * Creates an alternative after checking that its alignment computes (bad geometry is a 422 with the
 * engine's message, never a stored alternative that cannot be drawn), then computes its impacts.
 */
export function createAlternativeChecked(project: Project, body: CreateBody, actorId: number): { alternative: Alternative; summary: AlternativeSummary } {
  const speed = DEFAULT_SPEED[project.units];
  const inputs: AlternativeInputs = {
    ...body,
    designSpeed: body.designSpeed ?? speed.designSpeed,
    speedUnit: body.speedUnit ?? speed.speedUnit,
  };
  requireProjectUnits(project, inputs);
  evaluateAlternative(evaluationInputsOf(inputs, project), takeSessionFor(project));
  return db().transaction((tx) => {
    const stamped = { ...inputs, acceptedChecks: stampSaved(inputs.acceptedChecks, [], actorId, tx) };
    const alternative = createAlternative(project.id, stamped, actorId, tx);
    return { alternative, summary: readImpacts(alternative, project, tx).summary };
  });
}

/** Saves an edit made from `body.version`; 409 when someone saved since, 422 when the result does not compute. */
export function saveAlternativeChecked(current: Alternative, project: Project, body: UpdateBody, actorId: number): UpdateOutcome & { summary?: AlternativeSummary } {
  const { version, ...changes } = body;
  // An approved version stays frozen: the save below starts the next version as a draft (issue 6).
  const edit = planTransition(current.status, "edit", "planner");
  if (!edit.ok) throw apiError("conflict", edit.message, { status: current.status });
  const next = { ...inputsOf(current), ...changes } as AlternativeInputs;
  requireProjectUnits(project, next);
  if (version === current.version) evaluateAlternative(evaluationInputsOf(next, project), takeSessionFor(project));
  return db().transaction((tx) => {
    reopenForEdit(current.id, version, actorId, tx);
    const stamped = changes.acceptedChecks ? { acceptedChecks: stampSaved(changes.acceptedChecks, acceptancesAt(current, version, tx), actorId, tx) } : {};
    const outcome = updateAlternative(current.id, version, { ...changes, ...stamped } as Partial<AlternativeInputs>, actorId, tx);
    if (outcome.kind === "conflict") return outcome;
    return { ...outcome, summary: readImpacts(outcome.alternative, project, tx).summary };
  });
}

/** Stamps the acceptances being saved by `actorId` now; only the server's stamps are stored. */
function stampSaved(incoming: CheckAcceptance[], previous: CheckAcceptance[], actorId: number, tx: Db): CheckAcceptance[] {
  if (incoming.length === 0) return [];
  const actor = findUserById(actorId, tx);
  if (!actor) throw new Error(`No user ${actorId} to record as accepting the design checks.`);
  return stampAcceptances(incoming, previous, { by: nameAcceptor(actor), at: new Date() });
}

/**
 * The acceptances stored at the version the edit started from. A saved version never changes, and
 * the save only wins its version test if that version is the current one, so these are exactly the
 * acceptances it replaces (`current` may have been read before another save landed).
 */
function acceptancesAt(current: Alternative, version: number, tx: Db): CheckAcceptance[] {
  if (current.version === version) return current.acceptedChecks;
  return findAlternativeVersion(current.id, version, tx)?.acceptedChecks ?? [];
}

function requireProjectUnits(project: Project, inputs: Pick<AlternativeInputs, "alignment">): void {
  if (inputs.alignment.units !== project.units) {
    throw apiError("unprocessable", `The alignment is in ${inputs.alignment.units} but the project works in ${project.units}; give coordinates and lengths in ${project.units}.`, [
      { path: "alignment.units", message: `Use "${project.units}".` },
    ]);
  }
}
