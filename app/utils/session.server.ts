import { createCookieSessionStorage } from "react-router";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";
import { randomBytes } from "node:crypto";
import { env, isDemo } from "./env.server";

export type Toast = { kind: "success" | "error" | "info"; message: string };
type SessionData = { userId: number };
type FlashData = { toast: Toast };

const DEV_SECRET_FILE = "data/.session-secret";

/** SESSION_SECRET, or in development/demo a random secret kept in data/ so sessions survive restarts. */
function sessionSecret(): string {
  const configured = env().SESSION_SECRET;
  if (configured) return configured;
  if (env().NODE_ENV === "production" && !isDemo()) throw new Error("SESSION_SECRET must be set in production");
  if (!existsSync(DEV_SECRET_FILE)) {
    mkdirSync(dirname(DEV_SECRET_FILE), { recursive: true });
    writeFileSync(DEV_SECRET_FILE, randomBytes(32).toString("hex"), { mode: 0o600 });
  }
  return readFileSync(DEV_SECRET_FILE, "utf8").trim();
}

let storage: ReturnType<typeof createCookieSessionStorage<SessionData, FlashData>> | undefined;

export function sessionStorage() {
  storage ??= createCookieSessionStorage<SessionData, FlashData>({
    cookie: {
      name: "__takeline",
      httpOnly: true,
      sameSite: "lax",
      path: "/",
      // Secure in production; the demo is served over plain http on localhost.
      secure: env().NODE_ENV === "production" && !isDemo(),
      secrets: [sessionSecret()],
      maxAge: 60 * 60 * 12,
    },
  });
  return storage;
}

export function getSession(request: Request) {
  return sessionStorage().getSession(request.headers.get("Cookie"));
}

/** A Set-Cookie header that carries a one-time toast to the next page. */
export async function flashToast(request: Request, toast: Toast): Promise<string> {
  const session = await getSession(request);
  session.flash("toast", toast);
  return sessionStorage().commitSession(session);
}
