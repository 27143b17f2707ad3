import { data, Form, redirect, useActionData } from "react-router";
import type { Route } from "./+types/projects.new";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field, SelectField } from "~/components/ui/field";
import { recordAuditEvent } from "~/models/audit.server";
import { createProject } from "~/models/projects.server";
import { ProjectFormSchema } from "~/schemas/project-schemas";
import { ACCESS } from "~/utils/access";
import { readForm } from "~/utils/form.server";
import { requireUser } from "~/utils/permissions.server";
import { UNIT_LABELS } from "~/utils/unit-labels";

export function meta() {
  return [{ title: "New project · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request, { roles: ACCESS.createProject });
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireUser(request, { roles: ACCESS.createProject });
  const parsed = ProjectFormSchema.safeParse(await readForm(request));
  if (!parsed.success) {
    const errors = Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message]));
    return data({ errors }, { status: 400 });
  }
  const project = createProject(parsed.data, user);
  recordAuditEvent({ actorId: user.id, projectId: project.id, action: "project.created", subject: project.name });
  throw redirect(`/projects/${project.id}`);
}

export default function NewProject() {
  const result = useActionData<typeof action>();
  const errors: Record<string, string | undefined> = result?.errors ?? {};
  return (
    <div className="mx-auto max-w-xl">
      <Card title="New project">
        <Form method="post" className="space-y-4">
          <Field label="Name" name="name" required error={errors.name} />
          <Field label="Description" name="description" error={errors.description} />
          <SelectField label="Length unit" name="units" defaultValue="m" options={Object.entries(UNIT_LABELS).map(([value, label]) => ({ value, label }))} />
          <Field label="Working CRS (optional)" name="crs" placeholder="EPSG:32617" error={errors.crs} hint="A projected CRS. Left empty, the UTM zone of the first uploaded layer is used." />
          <Field label="Combined scale factor (optional)" name="scaleFactor" inputMode="decimal" placeholder="0.999943" error={errors.scaleFactor} hint="Grid distance = ground distance × factor. Used to report ground values beside grid values." />
          <Button type="submit">Create project</Button>
        </Form>
      </Card>
    </div>
  );
}
