import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { expect, test } from "vitest";
import { enqueueMail, listOutbox } from "~/models/mail-outbox.server";
import { startFakeSmtp } from "./fake-smtp.server";
import { readCaughtMail } from "./mail-inbox.server";
import { deliverDueMail } from "./mail-sender.server";
import { createMailTransport } from "./mail-transport.server";

async function freePort(): Promise<number> {
  const probe = await startFakeSmtp({ dir: mkdtempSync(join(tmpdir(), "probe-")) });
  await probe.close();
  return probe.port;
}

test("a mail queued while the SMTP server is down arrives exactly once after it comes back", async () => {
  const dir = mkdtempSync(join(tmpdir(), "caught-"));
  const port = await freePort();
  const transport = createMailTransport({ port });
  let clock = Date.now();
  const now = () => clock;

  enqueueMail({ to: "agent@example.test", subject: "Your parcels", text: "Three parcels." }, undefined, clock);
  expect(await deliverDueMail(transport, { now })).toBe(0);
  const afterFailure = listOutbox()[0]!;
  expect(afterFailure).toMatchObject({ status: "pending", attempts: 1 });
  expect(afterFailure.lastError).toBeTruthy();

  // Not due yet: back-off holds the retry.
  expect(await deliverDueMail(transport, { now })).toBe(0);
  expect(listOutbox()[0]!.attempts).toBe(1);

  const server = await startFakeSmtp({ dir, port });
  try {
    clock += 60_000;
    expect(await deliverDueMail(transport, { now })).toBe(1);
    clock += 60_000;
    expect(await deliverDueMail(transport, { now })).toBe(0);
    const caught = await readCaughtMail(dir);
    expect(caught).toHaveLength(1);
    expect(caught[0]).toMatchObject({ to: "agent@example.test", subject: "Your parcels" });
    expect(caught[0]!.messageId).toMatch(/^<outbox-\d+-\d+@takeline\.invalid>$/);
    expect(listOutbox()[0]).toMatchObject({ status: "sent", attempts: 1 });
  } finally {
    await server.close();
    transport.close();
  }
});

test("attachments survive the trip through the outbox", async () => {
  const dir = mkdtempSync(join(tmpdir(), "caught-"));
  const server = await startFakeSmtp({ dir });
  const transport = createMailTransport({ port: server.port });
  try {
    enqueueMail({ to: "a@example.test", subject: "List", text: "See attached.", attachments: [{ filename: "parcels.csv", contentType: "text/csv", content: "id\nP-1\n" }] });
    expect(await deliverDueMail(transport)).toBe(1);
    const [mail] = await readCaughtMail(dir);
    expect(mail?.attachments).toEqual([{ filename: "parcels.csv", contentType: "text/csv", size: 7 }]);
  } finally {
    await server.close();
    transport.close();
  }
});
