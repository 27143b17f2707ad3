import { data, redirect } from "react-router";
import { findUserByApiToken } from "~/models/api-tokens.server";
import { findUserById, toPublicUser, type PublicUser } from "~/models/users.server";
import { apiError, isApiRequest } from "./api-error.server";
import { ROLE_LABELS, type Role } from "./roles";
import { getSession } from "./session.server";

/** What the 403 page receives: which roles the page needs and which the user has. */
export type ForbiddenData = { kind: "forbidden"; neededRoles: Role[]; yourRole: Role };

function bearerToken(request: Request): string | undefined {
  const header = request.headers.get("Authorization");
  const match = header?.match(/^Bearer\s+(\S+)$/i);
  return match?.[1];
}

/** The signed-in user from the session cookie or, for the API, an `Authorization: Bearer` token. */
export async function getOptionalUser(request: Request): Promise<PublicUser | undefined> {
  const token = bearerToken(request);
  if (token && isApiRequest(request)) {
    const user = findUserByApiToken(token);
    return user ? toPublicUser(user) : undefined;
  }
  const session = await getSession(request);
  const userId = session.get("userId");
  if (typeof userId !== "number") return undefined;
  const user = findUserById(userId);
  return user && user.status === "active" ? toPublicUser(user) : undefined;
}

function unauthenticated(request: Request): Response {
  if (isApiRequest(request)) {
    const hasToken = Boolean(bearerToken(request));
    return apiError("unauthorized", hasToken ? "The API token is unknown or revoked." : "Sign in or send an API token.");
  }
  const url = new URL(request.url);
  return redirect(`/sign-in?redirectTo=${encodeURIComponent(url.pathname + url.search)}`);
}

function forbidden(request: Request, neededRoles: Role[], user: PublicUser): Response | ReturnType<typeof data> {
  const names = neededRoles.map((r) => ROLE_LABELS[r]).join(" or ");
  if (isApiRequest(request)) {
    return apiError("forbidden", `This needs the ${names} role.`, { neededRoles, yourRole: user.role });
  }
  return data<ForbiddenData>({ kind: "forbidden", neededRoles, yourRole: user.role }, { status: 403 });
}

/**
 * The one gate for every loader, action and API route: returns the user, or throws a redirect
 * to sign-in (pages), a 401 (API), or a 403 that names the roles needed.
 */
export async function requireUser(request: Request, options: { roles?: readonly Role[] } = {}): Promise<PublicUser> {
  const user = await getOptionalUser(request);
  if (!user) throw unauthenticated(request);
  if (options.roles && !options.roles.includes(user.role)) throw forbidden(request, [...options.roles], user);
  return user;
}
