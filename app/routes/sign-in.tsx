import { data, Form, Link, redirect, useActionData, useLoaderData, useNavigation, useSearchParams } from "react-router";
import type { Route } from "./+types/sign-in";
import { readForm } from "~/utils/form.server";
import { Button } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Field } from "~/components/ui/field";
import { DemoAccounts } from "~/components/demo-accounts";
import { HOME_BY_ROLE } from "~/utils/access";
import { authenticator, SignInError } from "~/utils/auth.server";
import { isDemo } from "~/utils/env.server";
import { getOptionalUser } from "~/utils/permissions.server";
import { safeRedirect } from "~/utils/safe-redirect";
import { getSession, sessionStorage } from "~/utils/session.server";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "~/models/demo-accounts";

export function meta() {
  return [{ title: "Sign in · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await getOptionalUser(request);
  if (user) throw redirect(HOME_BY_ROLE[user.role]);
  return { demo: isDemo() ? { accounts: DEMO_ACCOUNTS, password: DEMO_PASSWORD } : null };
}

export async function action({ request }: Route.ActionArgs) {
  // Read a copy: the form strategy reads the original body itself.
  const form = new Map(Object.entries(await readForm(request.clone())));
  try {
    const user = await authenticator.authenticate("form", request);
    const session = await getSession(request);
    session.set("userId", user.id);
    const to = safeRedirect(form.get("redirectTo"), HOME_BY_ROLE[user.role]);
    return redirect(to, { headers: { "Set-Cookie": await sessionStorage().commitSession(session) } });
  } catch (error) {
    if (error instanceof SignInError) {
      const headers = error.retryAfterSeconds ? { "Retry-After": String(error.retryAfterSeconds) } : undefined;
      return data({ error: error.message, email: String(form.get("email") ?? "") }, { status: error.retryAfterSeconds ? 429 : 400, headers });
    }
    throw error;
  }
}

export default function SignIn() {
  const { demo } = useLoaderData<typeof loader>();
  const result = useActionData<typeof action>();
  const [params] = useSearchParams();
  const busy = useNavigation().state !== "idle";
  return (
    <div className="mx-auto max-w-md space-y-6">
      <Card title="Sign in to Takeline">
        <Form method="post" className="space-y-4">
          <input type="hidden" name="redirectTo" value={params.get("redirectTo") ?? ""} />
          <Field label="E-mail" name="email" type="email" autoComplete="username" required defaultValue={result?.email} />
          <Field label="Password" name="password" type="password" autoComplete="current-password" required />
          {result?.error && (
            <p role="alert" className="text-sm font-semibold text-danger">
              {result.error}
            </p>
          )}
          <div className="flex items-center justify-between">
            <Button type="submit" disabled={busy}>
              Sign in
            </Button>
            <Link to="/forgot-password" className="text-sm">
              Forgot your password?
            </Link>
          </div>
        </Form>
      </Card>
      {demo && <DemoAccounts accounts={demo.accounts} password={demo.password} />}
    </div>
  );
}
