import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { randomBytes } from "node:crypto";
import { SMTPServer } from "smtp-server";

export type FakeSmtp = { port: number; close: () => Promise<void> };

/**
 * A local SMTP server for development, demo and tests: it accepts every message on loopback
 * and saves it as an .eml file in `dir`, so nothing ever leaves the machine.
 */
export function startFakeSmtp(options: { dir: string; port?: number }): Promise<FakeSmtp> {
  mkdirSync(options.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    banner: "Takeline local mail catcher",
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const name = `${Date.now()}-${randomBytes(4).toString("hex")}.eml`;
        writeFileSync(join(options.dir, name), Buffer.concat(chunks));
        callback();
      });
    },
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port ?? 0, "127.0.0.1", () => {
      const address = server.server.address();
      const port = typeof address === "object" && address ? address.port : (options.port ?? 0);
      resolve({ port, close: () => new Promise<void>((done) => server.close(() => done())) });
    });
  });
}
