import { redirect } from "react-router";
import type { Route } from "./+types/sign-out";
import { getSession, sessionStorage } from "~/utils/session.server";

export async function action({ request }: Route.ActionArgs) {
  const session = await getSession(request);
  return redirect("/sign-in", { headers: { "Set-Cookie": await sessionStorage().destroySession(session) } });
}

export function loader() {
  throw redirect("/");
}
