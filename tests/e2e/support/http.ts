import { baseUrl } from "./browser";

/** Signs in over plain HTTP and returns the session cookie, for checks that need no browser. */
export async function sessionCookie(email: string, password = "takeline-demo"): Promise<string> {
  const res = await fetch(`${baseUrl()}/sign-in`, {
    method: "POST",
    body: new URLSearchParams({ email, password }),
    redirect: "manual",
  });
  const cookie = res.headers.get("set-cookie");
  if (res.status !== 302 || !cookie) throw new Error(`sign-in as ${email} failed: ${res.status}`);
  return cookie.split(";")[0]!;
}

export function get(path: string, headers: Record<string, string> = {}): Promise<Response> {
  return fetch(`${baseUrl()}${path}`, { headers, redirect: "manual" });
}

export function postJson(path: string, body: unknown, headers: Record<string, string> = {}): Promise<Response> {
  return fetch(`${baseUrl()}${path}`, {
    method: "POST",
    headers: { "content-type": "application/json", ...headers },
    body: typeof body === "string" ? body : JSON.stringify(body),
    redirect: "manual",
  });
}
