import { data, Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/projects.$projectId.decision";
import { AlternativesSummaryTable } from "~/components/decisions/alternatives-summary-table";
import { DecisionForm } from "~/components/decisions/decision-form";
import { ProgressPanel } from "~/components/decisions/progress-panel";
import { SubmissionForm } from "~/components/decisions/submission-form";
import { TransitionHistory } from "~/components/decisions/transition-history";
import { buttonClass } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Notice } from "~/components/ui/notice";
import { formatDay } from "~/components/parcel-work/figures";
import { readAcquisitionProgress } from "~/models/acquisition-progress.server";
import { listProjectTransitions } from "~/models/alternative-transitions.server";
import { findAlternativeForUser } from "~/models/alternatives.server";
import { readComparison } from "~/models/comparison.server";
import { decideAlternative, submitAlternative, withdrawSubmission } from "~/models/decisions.server";
import { listProjectAgents } from "~/models/parcel-assignments.server";
import { findPreferred, listApprovals } from "~/models/preferred-alternatives.server";
import { findProjectForUser } from "~/models/projects.server";
import { ACCESS, mayOpen } from "~/utils/access";
import { refusalAsFormData } from "~/utils/api-refusal.server";
import { publicBaseUrl } from "~/utils/env.server";
import { readForm } from "~/utils/form.server";
import { requireUser } from "~/utils/permissions.server";
import type { Role } from "~/utils/roles";

const ParamsSchema = z.object({ projectId: z.coerce.number().int().positive() });
const Comment = z.string().trim().max(4000).default("");
const IntentSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.enum(["submit", "withdraw"]), alternativeId: z.coerce.number().int().positive(), comment: Comment }),
  z.object({ intent: z.enum(["approve", "return"]), alternativeId: z.coerce.number().int().positive(), version: z.coerce.number().int().positive(), comment: Comment, split: z.literal("even").optional() }),
]);

async function loadProject(request: Request, params: unknown, roles: readonly Role[]) {
  const user = await requireUser(request, { roles });
  const parsed = ParamsSchema.safeParse(params);
  const project = parsed.success ? findProjectForUser(parsed.data.projectId, user) : undefined;
  if (!project) throw data(null, { status: 404 });
  return { user, project };
}

export function meta({ data: d }: Route.MetaArgs) {
  return [{ title: `Decision · ${d?.project.name ?? "Project"} · Takeline` }];
}

/** The decision page of a project: the comparison summary, what awaits a decision, the preferred alternative and its progress, the history. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { user, project } = await loadProject(request, params, ACCESS.decisions);
  const comparison = readComparison(project);
  const preferred = findPreferred(project.id);
  return {
    project: { id: project.id, name: project.name, units: project.units },
    rows: comparison.alternatives.map((a) => ({ ...a, preferredVersion: preferred?.alternativeId === a.id ? preferred.version : null })),
    preferred: preferred ? { alternativeId: preferred.alternativeId, name: preferred.alternativeName, version: preferred.version, approvedBy: preferred.approvedByName, approvedAt: preferred.approvedAt.toISOString(), comment: preferred.comment } : null,
    approvals: listApprovals(project.id).map((p) => ({ id: p.id, name: p.alternativeName, version: p.version, status: p.status, approvedAt: p.approvedAt.toISOString(), approvedBy: p.approvedByName })),
    progress: preferred ? readAcquisitionProgress(project.id) : null,
    history: listProjectTransitions(project.id).map((t) => ({ ...t, at: t.at.toISOString() })),
    agents: listProjectAgents(project.id).length,
    maySubmit: mayOpen(user.role, "submitAlternatives"),
    mayDecide: mayOpen(user.role, "decideAlternatives"),
    mayAssign: mayOpen(user.role, "assignParcels"),
  };
}

/** Submit, withdraw, approve or return, through the same models and rules as the API. */
export async function action({ request, params }: Route.ActionArgs) {
  const { user, project } = await loadProject(request, params, [...ACCESS.submitAlternatives, ...ACCESS.decideAlternatives]);
  const parsed = IntentSchema.safeParse(await readForm(request));
  if (!parsed.success) return data({ ok: false as const, error: parsed.error.issues[0]?.message ?? "Check the form.", details: null }, { status: 422 });
  const form = parsed.data;
  const alternative = findAlternativeForUser(form.alternativeId, user);
  if (!alternative || alternative.projectId !== project.id) throw data(null, { status: 404 });
  try {
    const base = publicBaseUrl(request);
    if (!("version" in form)) {
      if (form.intent === "submit") submitAlternative(alternative, project, user, form.comment, base);
      else withdrawSubmission(alternative, user, form.comment);
    } else {
      if (form.intent === "return" && !form.comment) return data({ ok: false as const, error: "Say what should change: a returned alternative needs comments.", details: null }, { status: 422 });
      decideAlternative(alternative, project, user, { decision: form.intent, comment: form.comment, version: form.version, assign: form.split ? { split: "even" } : undefined }, base);
    }
    const done = { submit: "submitted for decision", withdraw: "withdrawn", approve: "approved as the preferred alternative", return: "returned with comments" }[form.intent];
    return { ok: true as const, error: null, details: null, message: `${alternative.name} was ${done}.` };
  } catch (error) {
    return refusalAsFormData(error);
  }
}

export default function DecisionPage({ loaderData, actionData }: Route.ComponentProps) {
  const { project, rows, preferred, approvals, progress, history, agents, maySubmit, mayDecide, mayAssign } = loaderData;
  const awaiting = rows.filter((r) => r.status === "submitted");
  const submittable = rows.filter((r) => r.status === "draft" || r.status === "returned");
  return (
    <div className="space-y-6">
      <p className="text-sm"><Link to="/decisions">← Decisions</Link> · <Link to={`/projects/${project.id}`}>{project.name}</Link> · <Link to={`/projects/${project.id}/comparison`}>Full comparison</Link></p>
      <h1>Decision: {project.name}</h1>
      <Notice>Takes and costs are order-of-magnitude estimates for comparing alternatives — not surveys or appraisals. Design checks support preliminary design only.</Notice>
      {actionData && (
        <p role={actionData.ok ? "status" : "alert"} className={`rounded-md px-4 py-3 text-sm font-semibold ${actionData.ok ? "bg-action-tint text-action-strong" : "bg-danger-tint text-danger"}`} data-testid="decision-outcome">
          {actionData.ok ? actionData.message : actionData.error}
        </p>
      )}
      <Card title="Alternatives">
        <AlternativesSummaryTable rows={rows} units={project.units} projectId={project.id} />
      </Card>
      {awaiting.map((a) => (
        <Card key={a.id} title={`Awaiting decision: ${a.name}, version ${a.version}`}>
          {mayDecide ? <DecisionForm alternative={a} agents={agents} hasPreferred={preferred !== null} /> : <p className="text-sm text-ink-soft">A manager decides on it.</p>}
          {maySubmit && <div className="mt-4 border-t border-rule pt-4"><SubmissionForm alternative={a} intent="withdraw" /></div>}
        </Card>
      ))}
      {maySubmit && submittable.length > 0 && (
        <Card title="Submit for decision">
          <div className="space-y-4">{submittable.map((a) => <SubmissionForm key={a.id} alternative={a} intent="submit" />)}</div>
        </Card>
      )}
      <Card
        title="Preferred alternative"
        actions={preferred ? <Link to={`/projects/${project.id}/assignments`} className={buttonClass("secondary")}>{mayAssign ? "Assign parcels" : "Parcel assignments"}</Link> : undefined}
      >
        {preferred && progress ? (
          <div className="space-y-4">
            <p data-testid="preferred-alternative">
              <strong>{preferred.name}</strong>, version {preferred.version} — approved {formatDay(preferred.approvedAt)}{preferred.approvedBy ? ` by ${preferred.approvedBy}` : ""}.
              {preferred.comment && <span className="block text-sm text-ink-soft">“{preferred.comment}”</span>}
            </p>
            <ProgressPanel progress={progress} />
            {approvals.length > 1 && (
              <p className="text-xs text-ink-soft">Earlier approvals: {approvals.filter((p) => p.status === "superseded").map((p) => `${p.name} version ${p.version} (${formatDay(p.approvedAt)})`).join("; ")}</p>
            )}
          </div>
        ) : (
          <p className="text-sm text-ink-soft">No alternative has been approved yet.</p>
        )}
      </Card>
      <Card title="History">
        <TransitionHistory items={history} />
      </Card>
    </div>
  );
}
