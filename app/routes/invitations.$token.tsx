import { Form, redirect, useActionData, useLoaderData } from "react-router";
import { z } from "zod";
import { readForm } from "~/utils/form.server";
import type { Route } from "./+types/invitations.$token";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field } from "~/components/ui/field";
import { acceptInvitation, findInvitation } from "~/models/accounts.server";
import { NewPasswordSchema } from "~/utils/password-rules";
import { ROLE_LABELS } from "~/utils/roles";
import { flashToast } from "~/utils/session.server";

const AcceptSchema = z
  .object({ name: z.string().trim().min(1, "Enter your name.").max(120), password: NewPasswordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { message: "The two passwords differ.", path: ["confirm"] });

export function loader({ params }: Route.LoaderArgs) {
  const found = findInvitation(params.token);
  return found ? { invitation: { email: found.user.email, role: ROLE_LABELS[found.user.role], name: found.user.name } } : { invitation: null };
}

export async function action({ request, params }: Route.ActionArgs) {
  const parsed = AcceptSchema.safeParse(await readForm(request));
  if (!parsed.success) return { error: parsed.error.issues[0]?.message };
  if (!(await acceptInvitation(params.token, parsed.data.name, parsed.data.password))) {
    return { error: "This invitation has been used or has expired." };
  }
  throw redirect("/sign-in", { headers: { "Set-Cookie": await flashToast(request, { kind: "success", message: "Welcome to Takeline. Sign in with your new password." }) } });
}

export default function AcceptInvitation() {
  const { invitation } = useLoaderData<typeof loader>();
  const result = useActionData<typeof action>();
  if (!invitation) {
    return (
      <div className="mx-auto max-w-md">
        <Card title="Invitation not valid">
          <p role="alert">This invitation has been used or has expired. Ask your administrator for a new one.</p>
        </Card>
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-md">
      <Card title="Join Takeline">
        <p className="mb-4 text-sm text-ink-soft">
          You are invited as <strong>{invitation.role}</strong> with the e-mail <strong>{invitation.email}</strong>.
        </p>
        <Form method="post" className="space-y-4">
          <Field label="Your name" name="name" required defaultValue={invitation.name} autoComplete="name" />
          <Field label="Password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." />
          <Field label="Password again" name="confirm" type="password" autoComplete="new-password" required />
          {result?.error && <p role="alert" className="text-sm font-semibold text-danger">{result.error}</p>}
          <Button type="submit">Create my account</Button>
        </Form>
      </Card>
    </div>
  );
}
