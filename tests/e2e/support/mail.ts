import { inject } from "vitest";
import { readCaughtMail, type CaughtMail } from "~/utils/mail-inbox.server";

/** Waits until the fake SMTP server has saved a message to `to` matching `subject`. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 15_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await readCaughtMail(inject("mailDir"))).find((m) => m.to.includes(to) && subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

export function firstLink(text: string): string {
  const match = text.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`no link in mail:\n${text}`);
  return match[0];
}
