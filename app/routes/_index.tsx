import { redirect } from "react-router";
import type { Route } from "./+types/_index";
import { HOME_BY_ROLE } from "~/utils/access";
import { getOptionalUser } from "~/utils/permissions.server";

/** `/` sends each role to its own home, and everyone else to sign in. */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await getOptionalUser(request);
  throw redirect(user ? HOME_BY_ROLE[user.role] : "/sign-in");
}
