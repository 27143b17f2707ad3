import { data, Form, useActionData, useLoaderData } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/account";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field } from "~/components/ui/field";
import { Table } from "~/components/ui/table";
import { issueApiToken, listApiTokens, revokeApiToken } from "~/models/api-tokens.server";
import { recordAuditEvent } from "~/models/audit.server";
import { ACCESS } from "~/utils/access";
import { readForm } from "~/utils/form.server";
import { requireUser } from "~/utils/permissions.server";
import { ROLE_LABELS } from "~/utils/roles";

const TokenChangeSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("create-token"), label: z.string().trim().min(1, "Give the token a label.").max(80) }),
  z.object({ intent: z.literal("revoke-token"), tokenId: z.coerce.number().int() }),
]);

export function meta() {
  return [{ title: "Account · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.account });
  return { user, tokens: listApiTokens(user.id) };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireUser(request, { roles: ACCESS.account });
  const parsed = TokenChangeSchema.safeParse(await readForm(request));
  if (!parsed.success) return data({ error: parsed.error.issues[0]?.message, token: null }, { status: 400 });
  if (parsed.data.intent === "create-token") {
    const { id, token } = issueApiToken(user.id, parsed.data.label);
    recordAuditEvent({ actorId: user.id, action: "api-token.created", subject: parsed.data.label, details: { tokenId: id } });
    return data({ error: null, token });
  }
  revokeApiToken(user.id, parsed.data.tokenId);
  recordAuditEvent({ actorId: user.id, action: "api-token.revoked", details: { tokenId: parsed.data.tokenId } });
  return data({ error: null, token: null });
}

export default function Account() {
  const { user, tokens } = useLoaderData<typeof loader>();
  const result = useActionData<typeof action>();
  return (
    <div className="space-y-6">
      <h1>Account</h1>
      <Card title="You">
        <p>{user.name} · {user.email} · {ROLE_LABELS[user.role]}</p>
      </Card>
      <Card title="API tokens">
        <p className="mb-4 text-sm text-ink-soft">Send a token as <code className="font-mono">Authorization: Bearer …</code> to use the API from your own tools. It acts with your role.</p>
        {result?.token && (
          <div role="status" className="mb-4 rounded-md bg-action-tint p-3 text-sm">
            Copy this token now; it is not shown again: <code className="font-mono break-all" data-testid="new-token">{result.token}</code>
          </div>
        )}
        <Table
          rows={tokens}
          rowKey={(t) => t.id}
          empty="No tokens yet."
          columns={[
            { header: "Label", cell: (t) => t.label },
            { header: "Created", cell: (t) => new Date(t.createdAt).toLocaleDateString() },
            { header: "Last used", cell: (t) => (t.lastUsedAt ? new Date(t.lastUsedAt).toLocaleString() : "never") },
            {
              header: "",
              cell: (t) =>
                t.revokedAt ? <span className="text-ink-soft">revoked</span> : (
                  <Form method="post">
                    <input type="hidden" name="intent" value="revoke-token" />
                    <input type="hidden" name="tokenId" value={t.id} />
                    <Button type="submit" variant="quiet">Revoke</Button>
                  </Form>
                ),
            },
          ]}
        />
        <Form method="post" className="mt-4 flex items-end gap-3">
          <input type="hidden" name="intent" value="create-token" />
          <Field label="New token label" name="label" required error={result?.error ?? undefined} />
          <Button type="submit">Create token</Button>
        </Form>
      </Card>
    </div>
  );
}
