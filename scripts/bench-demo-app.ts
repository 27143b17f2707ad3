/**
 * The built app (`npm run build` first) started for a benchmark in demo mode, with its own
 * database and mail folder, and Debian's Chromium to drive it. Shared by the benchmarks that
 * time what a user waits for in the browser.
 */
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Browser, Page } from "playwright-core";

export const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const DEMO_PASSWORD = "takeline-demo";
/** The production build; its server serves the client files from `build/client` under the working directory, so it must be this one. */
const BUILD_DIR = "build";

export interface DemoApp {
  base: string;
  browser: Browser;
  stop(): Promise<void>;
}

/** Why the demo app cannot run here (no build, no Chromium), or null when it can. */
export function demoAppUnavailable(): string | null {
  if (!existsSync(join(BUILD_DIR, "server", "index.js"))) return "needs `npm run build`";
  if (!existsSync(CHROMIUM)) return "needs Debian's chromium";
  return null;
}

/** Seeds a fresh demo database, starts the server and a headless browser, and waits for sign-in to answer. */
export async function startDemoApp(): Promise<DemoApp> {
  const dir = mkdtempSync(join(tmpdir(), "bench-demo-"));
  const port = 20_000 + Math.floor(Math.random() * 20_000);
  const env = { ...process.env, NODE_ENV: "production", TAKELINE_DEMO: "1", PORT: String(port), DATABASE_URL: join(dir, "demo.sqlite"), MAIL_DIR: join(dir, "mail"), SESSION_SECRET: "bench-session-secret-0123456789abcdef" };
  const seeded = spawnSync("npx", ["tsx", "scripts/seed-demo.ts"], { env, encoding: "utf8" });
  if (seeded.status !== 0) throw new Error(`demo seed failed: ${seeded.stderr}`);
  const server = spawn(join("node_modules", ".bin", "react-router-serve"), [join(BUILD_DIR, "server", "index.js")], { env, stdio: "ignore" });
  const { chromium } = await import("playwright-core");
  const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking"] });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 240 && !(await fetch(`${base}/sign-in`).then((r) => r.ok, () => false)); i++) await new Promise((r) => setTimeout(r, 250));
  return {
    base,
    browser,
    async stop() {
      await browser.close();
      server.kill("SIGTERM");
    },
  };
}

/** A page signed in as one of the demo accounts. */
export async function signedInPage(app: DemoApp, email: string): Promise<Page> {
  const page = await app.browser.newPage({ baseURL: app.base, viewport: { width: 1280, height: 1000 } });
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await Promise.all([page.waitForURL((u) => !u.pathname.startsWith("/sign-in")), page.getByRole("button", { name: "Sign in" }).click()]);
  return page;
}

/** A session cookie for plain HTTP requests. */
export async function sessionCookie(app: DemoApp, email: string): Promise<string> {
  const res = await fetch(`${app.base}/sign-in`, { method: "POST", body: new URLSearchParams({ email, password: DEMO_PASSWORD }), redirect: "manual" });
  const cookie = res.headers.get("set-cookie");
  if (res.status !== 302 || !cookie) throw new Error(`sign-in as ${email} failed: ${res.status}`);
  return cookie.split(";")[0]!;
}

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Waits until the page's map has fired its load event (the flag the map components set). */
export async function waitForMapReady(page: Page): Promise<void> {
  await page.waitForFunction(() => (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady === true, null, { timeout: 60_000, polling: "raf" });
}

/** CPU milliseconds per browser thread (main, worker, GPU…) while `run` ran: on a shared machine wall time waits for a core, CPU time does not. */
export async function browserCpuDuring(app: DemoApp, page: Page, run: () => Promise<void>): Promise<Record<string, number>> {
  const { mkdtempSync: tempDir, readFileSync } = await import("node:fs");
  const path = join(tempDir(join(tmpdir(), "bench-trace-")), "trace.json");
  await app.browser.startTracing(page, { path, categories: ["devtools.timeline", "disabled-by-default-devtools.timeline"] });
  await run();
  await app.browser.stopTracing();
  const trace = JSON.parse(readFileSync(path, "utf8")) as { traceEvents: { ph: string; name: string; pid: number; tid: number; tdur?: number; args?: { name?: string } }[] };
  const names = new Map<string, string>();
  for (const e of trace.traceEvents) if (e.ph === "M" && e.name === "thread_name") names.set(`${e.pid}/${e.tid}`, e.args?.name ?? "?");
  const cpu: Record<string, number> = {};
  for (const e of trace.traceEvents) {
    if (e.ph !== "X" || e.name !== "RunTask") continue;
    const thread = THREAD_LABELS[names.get(`${e.pid}/${e.tid}`) ?? ""];
    if (thread) cpu[thread] = (cpu[thread] ?? 0) + (e.tdur ?? 0) / 1000;
  }
  return cpu;
}

const THREAD_LABELS: Record<string, string> = { CrRendererMain: "page", "DedicatedWorker thread": "map worker", CrGpuMain: "GPU (software)", VizCompositorThread: "compositor" };

export function formatCpu(cpu: Record<string, number>): string {
  return Object.entries(cpu).map(([k, v]) => `${k} ${v.toFixed(0)} ms`).join(", ");
}
