import { z } from "zod";

const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  // Set by `npm run demo`: seeds demo users and shows their sign-in on the sign-in page.
  TAKELINE_DEMO: z.enum(["0", "1"]).default("0"),
  DATABASE_URL: z.string().min(1).default("data/takeline.sqlite"),
  MAIL_DIR: z.string().min(1).default("data/mail"),
  SESSION_SECRET: z.string().min(16).optional(),
  SMTP_URL: z.string().url().optional(),
  // Port of the local fake SMTP server; 0 lets the OS pick a free loopback port.
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  MAIL_FROM: z.string().default("Takeline <no-reply@takeline.invalid>"),
  // Base URL used in e-mailed links; defaults to the URL of the request that caused the mail.
  PUBLIC_URL: z.string().url().optional(),
  MAIL_POLL_MS: z.coerce.number().int().min(50).default(1000),
  // The map's basemap style; the default is the invented demo basemap that ships with the app.
  BASEMAP_STYLE_URL: z.string().min(1).default("/tiles/basemap-style.json"),
});

export type Env = z.infer<typeof EnvSchema>;

let cached: Env | undefined;

/** The validated process environment; read once. */
export function env(): Env {
  cached ??= EnvSchema.parse(process.env);
  return cached;
}

/** Development and demo mode run the fake SMTP server and the /dev/mail viewer. */
export function isDevOrDemo(): boolean {
  const e = env();
  return e.NODE_ENV !== "production" || e.TAKELINE_DEMO === "1";
}

export function isDemo(): boolean {
  return env().TAKELINE_DEMO === "1";
}

/** Origin for links in e-mails: PUBLIC_URL when set, else the origin the request came in on. */
export function publicBaseUrl(request: Request): string {
  return (env().PUBLIC_URL ?? new URL(request.url).origin).replace(/\/$/, "");
}
