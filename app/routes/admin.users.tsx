import { useEffect, useState } from "react";
import { data, Form, useActionData, useLoaderData, useNavigation } from "react-router";
import { z } from "zod";
import { readForm } from "~/utils/form.server";
import type { Route } from "./+types/admin.users";
import { Badge } from "~/components/ui/badge";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Dialog } from "~/components/ui/dialog";
import { Field, SelectField } from "~/components/ui/field";
import { Table } from "~/components/ui/table";
import { AccountConflictError, inviteUser } from "~/models/accounts.server";
import { listUsers, setUserStatus, updateUserProfile, type PublicUser } from "~/models/users.server";
import { recordAuditEvent } from "~/models/audit.server";
import { ACCESS } from "~/utils/access";
import { publicBaseUrl } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";
import { ROLE_LABELS, ROLES } from "~/utils/roles";
import { flashToast } from "~/utils/session.server";
import { InviteSchema } from "~/schemas/account-schemas";

const UserChangeSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("invite"), email: InviteSchema.shape.email, role: InviteSchema.shape.role }),
  z.object({ intent: z.literal("set-role"), userId: z.coerce.number().int(), role: z.enum(ROLES) }),
  z.object({ intent: z.literal("set-status"), userId: z.coerce.number().int(), status: z.enum(["active", "disabled"]) }),
]);

export function meta() {
  return [{ title: "People · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  const admin = await requireUser(request, { roles: ACCESS.manageUsers });
  return { users: listUsers(), selfId: admin.id };
}

export async function action({ request }: Route.ActionArgs) {
  const admin = await requireUser(request, { roles: ACCESS.manageUsers });
  const parsed = UserChangeSchema.safeParse(await readForm(request));
  if (!parsed.success) return data({ error: parsed.error.issues[0]?.message ?? "Check the form." }, { status: 400 });
  const change = parsed.data;
  if (change.intent === "invite") {
    try {
      inviteUser({ email: change.email, role: change.role }, admin, publicBaseUrl(request));
    } catch (error) {
      if (error instanceof AccountConflictError) return data({ error: error.message }, { status: 409 });
      throw error;
    }
    return data({ error: null }, { headers: { "Set-Cookie": await flashToast(request, { kind: "success", message: `Invitation sent to ${change.email}.` }) } });
  }
  if (change.userId === admin.id) return data({ error: "You cannot change your own role or status." }, { status: 400 });
  if (change.intent === "set-role") updateUserProfile(change.userId, { role: change.role });
  else setUserStatus(change.userId, change.status);
  recordAuditEvent({ actorId: admin.id, action: `user.${change.intent}`, subject: String(change.userId), details: change });
  return data({ error: null });
}

const STATUS_TONE = { active: "action", invited: "info", disabled: "neutral" } as const;

function UserRowActions({ user, isSelf }: { user: PublicUser; isSelf: boolean }) {
  if (isSelf) return <span className="text-xs text-ink-soft">you</span>;
  return (
    <div className="flex gap-2">
      {user.status === "invited" && (
        <Form method="post">
          <input type="hidden" name="intent" value="invite" />
          <input type="hidden" name="email" value={user.email} />
          <input type="hidden" name="role" value={user.role} />
          <Button type="submit" variant="quiet">Resend invitation</Button>
        </Form>
      )}
      <Form method="post" className="flex gap-2">
        <input type="hidden" name="intent" value="set-role" />
        <input type="hidden" name="userId" value={user.id} />
        <select name="role" defaultValue={user.role} aria-label={`Role of ${user.email}`} className="rounded-control border border-rule-strong px-2 py-1 text-sm">
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
        </select>
        <Button type="submit" variant="secondary">Set role</Button>
      </Form>
      <Form method="post">
        <input type="hidden" name="intent" value="set-status" />
        <input type="hidden" name="userId" value={user.id} />
        <input type="hidden" name="status" value={user.status === "disabled" ? "active" : "disabled"} />
        <Button type="submit" variant="quiet">{user.status === "disabled" ? "Enable" : "Disable"}</Button>
      </Form>
    </div>
  );
}

export default function AdminUsers() {
  const { users, selfId } = useLoaderData<typeof loader>();
  const result = useActionData<typeof action>();
  const navigation = useNavigation();
  const [inviting, setInviting] = useState(false);
  useEffect(() => {
    if (navigation.state === "idle" && result && !result.error) setInviting(false);
  }, [navigation.state, result]);
  return (
    <div className="space-y-6">
      <h1>People</h1>
      <Card title="Accounts" actions={<Button onClick={() => setInviting(true)}>Invite someone</Button>}>
        {result?.error && !inviting && <p role="alert" className="mb-3 text-sm font-semibold text-danger">{result.error}</p>}
        <Table
          rows={users}
          rowKey={(u) => u.id}
          columns={[
            { header: "Name", cell: (u) => u.name || "—" },
            { header: "E-mail", cell: (u) => u.email },
            { header: "Role", cell: (u) => ROLE_LABELS[u.role] },
            { header: "Status", cell: (u) => <Badge tone={STATUS_TONE[u.status]}>{u.status}</Badge> },
            { header: "Change", cell: (u) => <UserRowActions user={u} isSelf={u.id === selfId} /> },
          ]}
        />
      </Card>
      <Dialog open={inviting} onClose={() => setInviting(false)} title="Invite someone">
        <Form method="post" className="space-y-4">
          <input type="hidden" name="intent" value="invite" />
          <Field label="E-mail" name="email" type="email" required />
          <SelectField label="Role" name="role" defaultValue="planner" options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))} />
          {result?.error && <p role="alert" className="text-sm font-semibold text-danger">{result.error}</p>}
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setInviting(false)}>Cancel</Button>
            <Button type="submit">Send invitation</Button>
          </div>
        </Form>
      </Dialog>
    </div>
  );
}
