import { Form, useActionData } from "react-router";
import { z } from "zod";
import { readForm } from "~/utils/form.server";
import type { Route } from "./+types/forgot-password";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field } from "~/components/ui/field";
import { requestPasswordReset } from "~/models/accounts.server";
import { publicBaseUrl } from "~/utils/env.server";

const ForgotSchema = z.object({ email: z.string().trim().email("Enter an e-mail address.").max(254) });

export function meta() {
  return [{ title: "Reset password · Takeline" }];
}

export async function action({ request }: Route.ActionArgs) {
  const parsed = ForgotSchema.safeParse(await readForm(request));
  if (!parsed.success) return { sent: false, error: parsed.error.issues[0]?.message };
  requestPasswordReset(parsed.data.email, publicBaseUrl(request));
  return { sent: true, error: undefined };
}

export default function ForgotPassword() {
  const result = useActionData<typeof action>();
  return (
    <div className="mx-auto max-w-md">
      <Card title="Reset your password">
        {result?.sent ? (
          <p role="status">If that address has an account, a reset link is on its way. The link works once, for one hour.</p>
        ) : (
          <Form method="post" className="space-y-4">
            <Field label="E-mail" name="email" type="email" required error={result?.error} />
            <Button type="submit">Send reset link</Button>
          </Form>
        )}
      </Card>
    </div>
  );
}
