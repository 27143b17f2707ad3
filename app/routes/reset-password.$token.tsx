import { Form, redirect, useActionData, useLoaderData } from "react-router";
import { z } from "zod";
import { readForm } from "~/utils/form.server";
import type { Route } from "./+types/reset-password.$token";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field } from "~/components/ui/field";
import { isResetTokenValid, resetPassword } from "~/models/accounts.server";
import { NewPasswordSchema } from "~/utils/password-rules";
import { flashToast } from "~/utils/session.server";

const ResetSchema = z
  .object({ password: NewPasswordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { message: "The two passwords differ.", path: ["confirm"] });

export function loader({ params }: Route.LoaderArgs) {
  return { valid: isResetTokenValid(params.token) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const parsed = ResetSchema.safeParse(await readForm(request));
  if (!parsed.success) return { error: parsed.error.issues[0]?.message };
  if (!(await resetPassword(params.token, parsed.data.password))) return { error: "This link has been used or has expired." };
  throw redirect("/sign-in", { headers: { "Set-Cookie": await flashToast(request, { kind: "success", message: "Password changed. Sign in with it now." }) } });
}

export default function ResetPassword() {
  const { valid } = useLoaderData<typeof loader>();
  const result = useActionData<typeof action>();
  return (
    <div className="mx-auto max-w-md">
      <Card title="Choose a new password">
        {valid ? (
          <Form method="post" className="space-y-4">
            <Field label="New password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." />
            <Field label="New password again" name="confirm" type="password" autoComplete="new-password" required />
            {result?.error && <p role="alert" className="text-sm font-semibold text-danger">{result.error}</p>}
            <Button type="submit">Save password</Button>
          </Form>
        ) : (
          <p role="alert">This reset link has been used or has expired. <a href="/forgot-password">Ask for a new one</a>.</p>
        )}
      </Card>
    </div>
  );
}
