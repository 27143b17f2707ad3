import { data, Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/projects.$projectId.assignments";
import { AssignmentBoard } from "~/components/decisions/assignment-board";
import { Card } from "~/components/ui/card";
import { Notice } from "~/components/ui/notice";
import { findAlternativeForUser } from "~/models/alternatives.server";
import { readAlternativeDrawing } from "~/models/case-drawing.server";
import { listProjectLayers } from "~/models/layers.server";
import { assignParcels, listProjectAgents, type AssignmentRequest } from "~/models/parcel-assignments.server";
import { listProjectCases, toCaseJson } from "~/models/parcel-cases.server";
import { findPreferred } from "~/models/preferred-alternatives.server";
import { findProjectForUser } from "~/models/projects.server";
import { ACCESS, mayOpen } from "~/utils/access";
import { refusalAsFormData } from "~/utils/api-refusal.server";
import { env, publicBaseUrl } from "~/utils/env.server";
import { readForm } from "~/utils/form.server";
import { requireUser } from "~/utils/permissions.server";
import type { Role } from "~/utils/roles";

const ParamsSchema = z.object({ projectId: z.coerce.number().int().positive() });
const Ids = z.string().max(60_000).default("").transform((s) => s.split("\n").map((x) => x.trim()).filter(Boolean));
const FormSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("assign"), parcelIds: Ids, agentEmail: z.string().trim().max(254).default("") }),
  z.object({ intent: z.literal("split"), parcelIds: Ids }),
]);

async function loadProject(request: Request, params: unknown, roles: readonly Role[]) {
  const user = await requireUser(request, { roles });
  const parsed = ParamsSchema.safeParse(params);
  const project = parsed.success ? findProjectForUser(parsed.data.projectId, user) : undefined;
  if (!project) throw data(null, { status: 404 });
  return { user, project, preferred: findPreferred(project.id) };
}

export function meta({ data: d }: Route.MetaArgs) {
  return [{ title: `Parcel assignments · ${d?.project.name ?? "Project"} · Takeline` }];
}

/** The preferred alternative's parcels, who works each, and (for managers) the tools to assign them. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { user, project, preferred } = await loadProject(request, params, ACCESS.decisions);
  const layers = listProjectLayers(project.id).filter((l) => l.status === "active").map((l) => ({ id: l.id, kind: l.kind, name: l.name, bbox: l.bbox }));
  const drawing = preferred ? readAlternativeDrawing(project, preferred.alternativeId, preferred.version) : undefined;
  return {
    project: { id: project.id, name: project.name, units: project.units },
    preferred: preferred ? { alternativeId: preferred.alternativeId, name: preferred.alternativeName, version: preferred.version } : null,
    cases: preferred ? listProjectCases(project.id).map(toCaseJson) : [],
    agents: listProjectAgents(project.id).map((a) => ({ email: a.email, name: a.name })),
    editable: mayOpen(user.role, "assignParcels"),
    map: drawing ? { drawing, layers, basemapStyleUrl: env().BASEMAP_STYLE_URL } : null,
  };
}

/** Assign the selected parcels to an agent (or nobody), or split them evenly: the API's model, with its mail. */
export async function action({ request, params }: Route.ActionArgs) {
  const { user, project, preferred } = await loadProject(request, params, ACCESS.assignParcels);
  const parsed = FormSchema.safeParse(await readForm(request));
  if (!parsed.success) return data({ ok: false as const, error: parsed.error.issues[0]?.message ?? "Check the form.", details: null }, { status: 422 });
  const alternative = preferred ? findAlternativeForUser(preferred.alternativeId, user) : undefined;
  if (!alternative) return data({ ok: false as const, error: "No alternative has been approved yet.", details: null }, { status: 409 });
  const form = parsed.data;
  if (form.intent === "assign" && form.parcelIds.length === 0) return data({ ok: false as const, error: "Select parcels first.", details: null }, { status: 422 });
  const request_: AssignmentRequest =
    form.intent === "assign" ? { assignments: form.parcelIds.map((parcelId) => ({ parcelId, agentEmail: form.agentEmail || null })) } : { split: "even", ...(form.parcelIds.length ? { parcelIds: form.parcelIds } : {}) };
  try {
    const outcome = assignParcels(alternative, project, request_, user, publicBaseUrl(request));
    return { ok: true as const, error: null, details: null, message: `${outcome.changed} ${outcome.changed === 1 ? "parcel" : "parcels"} changed hands; ${outcome.mailed.length} ${outcome.mailed.length === 1 ? "agent was" : "agents were"} e-mailed.` };
  } catch (error) {
    return refusalAsFormData(error);
  }
}

export default function AssignmentsPage({ loaderData, actionData }: Route.ComponentProps) {
  const { project, preferred, cases, agents, editable, map } = loaderData;
  return (
    <div className="space-y-6">
      <p className="text-sm"><Link to={`/projects/${project.id}/decision`}>← Decision: {project.name}</Link></p>
      <h1>Parcel assignments</h1>
      {actionData && (
        <p role={actionData.ok ? "status" : "alert"} className={`rounded-md px-4 py-3 text-sm font-semibold ${actionData.ok ? "bg-action-tint text-action-strong" : "bg-danger-tint text-danger"}`} data-testid="assignment-outcome">
          {actionData.ok ? actionData.message : actionData.error}
        </p>
      )}
      {preferred ? (
        <Card title={`${preferred.name}, version ${preferred.version}: ${cases.length} parcels`}>
          <AssignmentBoard key={cases.map((c) => `${c.caseId}:${c.agentEmail}`).join()} cases={cases} agents={agents} units={project.units} editable={editable} map={map} />
        </Card>
      ) : (
        <Card><p className="text-sm">No alternative has been approved yet; parcels are assigned once one is.</p></Card>
      )}
      <Notice>Take areas and costs are planning estimates, not surveys or appraisals. Every agent whose list changes gets an e-mail with their parcels.</Notice>
    </div>
  );
}
