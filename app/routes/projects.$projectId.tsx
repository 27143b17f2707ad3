import { data, Form, Link, useActionData, useLoaderData } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/projects.$projectId";
import { Button, buttonClass } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field, SelectField } from "~/components/ui/field";
import { Table } from "~/components/ui/table";
import { LayerList } from "~/components/projects/layer-list";
import { TakeRulesForm } from "~/components/projects/take-rules-form";
import { recordAuditEvent } from "~/models/audit.server";
import { findProjectForUser, listProjectMembers, removeProjectMember, upsertProjectMember } from "~/models/projects.server";
import { describeProjectRules, readTakeRulesForm, saveProjectTakeRules } from "~/models/project-rules.server";
import { findUserByEmail } from "~/models/users.server";
import { EmailSchema } from "~/schemas/account-schemas";
import { ACCESS } from "~/utils/access";
import { readForm } from "~/utils/form.server";
import { requireUser } from "~/utils/permissions.server";
import { ROLE_LABELS, ROLES, type Role } from "~/utils/roles";
import { UNIT_LABELS } from "~/utils/unit-labels";
import { ProjectMap } from "~/components/map/project-map";
import { LayerUpload } from "~/components/upload/layer-upload";
import { listProjectLayers } from "~/models/layers.server";
import { env } from "~/utils/env.server";
import { AlternativeList } from "~/components/alternatives/alternative-list";
import { NewAlternativeButton } from "~/components/alternatives/new-alternative-dialog";
import { findCrsByCode, parseEpsgCode } from "~/fabric/index.server";
import { readLatestSummary } from "~/models/alternative-impacts.server";
import { listAlternatives } from "~/models/alternatives.server";
import { mayOpen } from "~/utils/access";

const MemberChangeSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("add-member"), email: EmailSchema, role: z.enum(ROLES) }),
  z.object({ intent: z.literal("remove-member"), userId: z.coerce.number().int() }),
]);

const ParamsSchema = z.object({ projectId: z.coerce.number().int().positive() });
/** The page lists at most this many warnings per layer; the CSV download has them all. */
const WARNINGS_SHOWN = 200;

async function loadProject(request: Request, params: unknown, roles: readonly Role[]) {
  const user = await requireUser(request, { roles });
  const parsed = ParamsSchema.safeParse(params);
  const project = parsed.success ? findProjectForUser(parsed.data.projectId, user) : undefined;
  if (!project) throw data(null, { status: 404 });
  return { user, project };
}

export function meta({ data: d }: Route.MetaArgs) {
  return [{ title: `${d?.project.name ?? "Project"} · Takeline` }];
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { user, project } = await loadProject(request, params, ACCESS.projects);
  return {
    project,
    layers: activeLayersOf(project.id),
    rules: describeProjectRules(project),
    mayEditRules: mayOpen(user.role, "editProjectRules"),
    members: listProjectMembers(project.id),
    mayManage: user.role === "planner" || user.role === "admin",
    mayUpload: user.role === "planner",
    basemapStyleUrl: env().BASEMAP_STYLE_URL,
    ...alternativesOf(project, mayOpen(user.role, "editAlternatives")),
  };
}

/** The project's active layers for the map and the layer list, with the first of their upload warnings. */
function activeLayersOf(projectId: number) {
  return listProjectLayers(projectId)
    .filter((l) => l.status === "active")
    .map((l) => ({
      id: l.id, kind: l.kind, name: l.name, bbox: l.bbox, featureCount: l.featureCount, sourceCrs: l.sourceCrs,
      warningCount: l.warnings?.length ?? null,
      warnings: (l.warnings ?? []).slice(0, WARNINGS_SHOWN),
    }));
}

/** The project's alternatives for the list, and what "New alternative" needs to start one. */
function alternativesOf(project: { id: number; crs: string | null }, mayEditAlternatives: boolean) {
  const all = listAlternatives(project.id);
  const code = project.crs ? parseEpsgCode(project.crs) : null;
  return {
    alternatives: all.map((a) => ({ id: a.id, name: a.name, colour: a.colour, status: a.status, version: a.version, summary: readLatestSummary(a.id) ?? null })),
    mayEditAlternatives,
    startingPoints: mayEditAlternatives ? all.map((a) => ({ id: a.id, name: a.name, alignment: a.alignment, corridor: a.corridor })) : [],
    crsDefinition: code === null ? null : (findCrsByCode(code)?.proj4 ?? null),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { user, project } = await loadProject(request, params, ACCESS.editProjectRules);
  const form = await readForm(request);
  if (form.intent === "save-rules") {
    const read = readTakeRulesForm(form);
    if (!read.ok) return data({ ok: false, fieldErrors: read.fieldErrors, error: null }, { status: 400 });
    saveProjectTakeRules(project, read.patch, user);
    return data({ ok: true, fieldErrors: {}, error: null });
  }
  const parsed = MemberChangeSchema.safeParse(form);
  if (!parsed.success) return data({ error: parsed.error.issues[0]?.message ?? "Check the form." }, { status: 400 });
  const change = parsed.data;
  if (change.intent === "add-member") {
    const member = findUserByEmail(change.email);
    if (!member) return data({ error: "No account has that e-mail. An administrator can invite them first." }, { status: 404 });
    upsertProjectMember(project.id, member.id, change.role);
    recordAuditEvent({ actorId: user.id, projectId: project.id, action: "project.member-set", subject: member.email, details: { role: change.role } });
  } else {
    removeProjectMember(project.id, change.userId);
    recordAuditEvent({ actorId: user.id, projectId: project.id, action: "project.member-removed", subject: String(change.userId) });
  }
  return data({ error: null });
}

export default function ProjectPage() {
  const { project, layers, rules, mayEditRules, members, mayManage, mayUpload, basemapStyleUrl, alternatives, mayEditAlternatives, startingPoints, crsDefinition } = useLoaderData<typeof loader>();
  const fabricBbox = layers.find((l) => l.kind === "parcels")?.bbox ?? null;
  const areaUnit = project.units === "m" ? "m²" : project.units === "ft" ? "ft²" : "US ft²";
  const result = useActionData<typeof action>();
  return (
    <div className="space-y-6">
      <div>
        <h1>{project.name}</h1>
        <p className="text-ink-soft">{project.description}</p>
      </div>
      <Card title="Set-up">
        <dl className="grid grid-cols-3 gap-4 text-sm">
          <div><dt className="text-label text-ink-soft">Length unit</dt><dd>{UNIT_LABELS[project.units]}</dd></div>
          <div><dt className="text-label text-ink-soft">Working CRS</dt><dd>{project.crs ?? "from first layer"}</dd></div>
          <div><dt className="text-label text-ink-soft">Combined scale factor</dt><dd>{project.scaleFactor ?? "none (grid values only)"}</dd></div>
        </dl>
      </Card>
      <Card title="Map">
        {layers.length === 0 ? (
          <p className="text-sm text-ink-soft">No parcel fabric yet. {mayUpload ? "Upload one below." : "A planner uploads it."}</p>
        ) : (
          <ProjectMap layers={layers} basemapStyleUrl={basemapStyleUrl} areaUnit={areaUnit} />
        )}
        <p className="mt-3 text-xs text-ink-soft">Areas are computed in the working CRS{project.crs ? ` (${project.crs})` : ""} from the uploaded fabric; they are not surveyed areas.</p>
      </Card>
      <Card
        title="Alternatives"
        actions={
          <>
            {alternatives.length > 0 && <Link to={`/projects/${project.id}/comparison`} className={buttonClass("secondary")}>Compare alternatives</Link>}
            {mayEditAlternatives && <NewAlternativeButton projectId={project.id} units={project.units} existing={startingPoints} fabricBbox={fabricBbox} crsDefinition={crsDefinition} />}
          </>
        }
      >
        <AlternativeList projectId={project.id} units={project.units} alternatives={alternatives} />
      </Card>
      <Card title="Take and cost rules">
        <TakeRulesForm rows={rules} units={project.units} mayEdit={mayEditRules} />
      </Card>
      <Card title="Layers">
        <LayerList projectId={project.id} layers={layers} />
        {mayUpload && (
          <div className="mt-6 border-t border-rule pt-4">
            <h3 className="mb-3 font-semibold">Upload a layer</h3>
            <LayerUpload projectId={project.id} />
          </div>
        )}
      </Card>
      <Card title="Members">
        <Table
          rows={members}
          rowKey={(m) => m.userId}
          columns={[
            { header: "Name", cell: (m) => m.name || "—" },
            { header: "E-mail", cell: (m) => m.email },
            { header: "Project role", cell: (m) => ROLE_LABELS[m.role] },
            ...(mayManage
              ? [{ header: "", cell: (m: (typeof members)[number]) => (
                    <Form method="post">
                      <input type="hidden" name="intent" value="remove-member" />
                      <input type="hidden" name="userId" value={m.userId} />
                      <Button type="submit" variant="quiet">Remove</Button>
                    </Form>
                  ) }]
              : []),
          ]}
        />
        {mayManage && (
          <Form method="post" className="mt-4 grid grid-cols-[1fr_12rem_auto] items-end gap-3">
            <input type="hidden" name="intent" value="add-member" />
            <Field label="Add a member by e-mail" name="email" type="email" required />
            <SelectField label="Project role" name="role" defaultValue="agent" options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))} />
            <Button type="submit">Add</Button>
          </Form>
        )}
        {result?.error && <p role="alert" className="mt-3 text-sm font-semibold text-danger">{result.error}</p>}
      </Card>
    </div>
  );
}
