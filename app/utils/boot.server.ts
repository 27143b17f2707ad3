import { startFakeSmtp } from "./fake-smtp.server";
import { db } from "./db.server";
import { env, isDevOrDemo } from "./env.server";
import { startMailSender } from "./mail-sender.server";
import { createMailTransport } from "./mail-transport.server";

type Services = { fakeSmtpPort: number | null };
const globalForBoot = globalThis as unknown as { takelineBoot?: Promise<Services> };

/**
 * Starts what the web app needs once per process: migrations, the fake SMTP server in
 * development and demo mode, and the outbox sender loop.
 */
export function bootServices(): Promise<Services> {
  globalForBoot.takelineBoot ??= (async () => {
    const e = env();
    db();
    let fakeSmtpPort: number | null = null;
    let transport;
    if (e.SMTP_URL) {
      transport = createMailTransport({ url: e.SMTP_URL });
    } else if (isDevOrDemo()) {
      const fake = await startFakeSmtp({ dir: e.MAIL_DIR, port: e.FAKE_SMTP_PORT });
      fakeSmtpPort = fake.port;
      transport = createMailTransport({ port: fake.port });
      console.log(`Takeline: local mail catcher on 127.0.0.1:${fake.port}, saving to ${e.MAIL_DIR}`);
    } else {
      throw new Error("SMTP_URL must be set in production (or run with TAKELINE_DEMO=1)");
    }
    startMailSender(transport, e.MAIL_POLL_MS);
    return { fakeSmtpPort };
  })();
  return globalForBoot.takelineBoot;
}
