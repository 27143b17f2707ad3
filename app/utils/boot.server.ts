import { startFakeSmtp } from "./fake-smtp.server";
import { db } from "./db.server";
import { env, isDevOrDemo } from "./env.server";
import { startMailSender } from "./mail-sender.server";
import { warmLayerTilesInBackground } from "~/models/layer-tile-warmup.server";
import { createMailTransport } from "./mail-transport.server";

type Services = { fakeSmtpPort: number | null };

/**
 * The HTTP server only stops listening on SIGTERM/SIGINT; the mail loop and the local SMTP server
 * would keep the process alive, so they stop too, and a last timer ends whatever still lingers.
 */
function stopOnSignal(stop: () => Promise<void>): void {
  for (const signal of ["SIGTERM", "SIGINT"] as const) {
    process.once(signal, () => {
      setTimeout(() => process.exit(0), 3000).unref();
      void stop().catch(() => undefined);
    });
  }
}
const globalForBoot = globalThis as unknown as { takelineBoot?: Promise<Services> };

/**
 * Starts what the web app needs once per process: migrations, the fake SMTP server in
 * development and demo mode, the outbox sender loop, and the background warm-up of the tiles
 * project maps open on.
 */
export function bootServices(): Promise<Services> {
  globalForBoot.takelineBoot ??= (async () => {
    const e = env();
    db();
    let fakeSmtpPort: number | null = null;
    let transport;
    let fake: Awaited<ReturnType<typeof startFakeSmtp>> | undefined;
    if (e.SMTP_URL) {
      transport = createMailTransport({ url: e.SMTP_URL });
    } else if (isDevOrDemo()) {
      fake = await startFakeSmtp({ dir: e.MAIL_DIR, port: e.FAKE_SMTP_PORT });
      fakeSmtpPort = fake.port;
      transport = createMailTransport({ port: fake.port });
      console.log(`Takeline: local mail catcher on 127.0.0.1:${fake.port}, saving to ${e.MAIL_DIR}`);
    } else {
      throw new Error("SMTP_URL must be set in production (or run with TAKELINE_DEMO=1)");
    }
    const stopSender = startMailSender(transport, e.MAIL_POLL_MS);
    const stopWarmup = warmLayerTilesInBackground();
    stopOnSignal(async () => {
      stopSender();
      stopWarmup();
      transport.close();
      await fake?.close();
    });
    return { fakeSmtpPort };
  })();
  return globalForBoot.takelineBoot;
}
