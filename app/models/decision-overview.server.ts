import { db, type Db } from "~/utils/db.server";
import type { Role } from "~/utils/roles";
import { readAcquisitionProgress, type AcquisitionProgress } from "./acquisition-progress.server";
import { findLastSubmission } from "./alternative-transitions.server";
import { listAlternatives } from "./alternatives.server";
import { findPreferred, type Preferred } from "./preferred-alternatives.server";
import { listProjectsForUser, type Project } from "./projects.server";

export interface AwaitingDecision {
  alternativeId: number;
  name: string;
  version: number;
  submittedBy: string | null;
  submittedAt: string | null;
}

export interface ProjectDecisionState {
  project: Pick<Project, "id" | "name" | "units">;
  awaiting: AwaitingDecision[];
  preferred: Pick<Preferred, "alternativeId" | "alternativeName" | "version" | "approvedByName"> & { approvedAt: string } | null;
  progress: AcquisitionProgress | null;
}

/** For each project the user is in: what awaits a decision, the preferred alternative and its progress. */
export function listDecisionOverview(user: { id: number; role: Role }, tx: Db = db()): ProjectDecisionState[] {
  return listProjectsForUser(user, tx).map((project) => readProjectDecisionState(project, tx));
}

export function readProjectDecisionState(project: Project, tx: Db = db()): ProjectDecisionState {
  const awaiting = listAlternatives(project.id, tx)
    .filter((a) => a.status === "submitted")
    .map((a) => {
      const s = findLastSubmission(a.id, tx);
      return { alternativeId: a.id, name: a.name, version: a.version, submittedBy: s?.name ?? null, submittedAt: s?.at.toISOString() ?? null };
    });
  const p = findPreferred(project.id, tx);
  return {
    project: { id: project.id, name: project.name, units: project.units },
    awaiting,
    preferred: p ? { alternativeId: p.alternativeId, alternativeName: p.alternativeName, version: p.version, approvedByName: p.approvedByName, approvedAt: p.approvedAt.toISOString() } : null,
    progress: p ? readAcquisitionProgress(project.id, tx) : null,
  };
}
