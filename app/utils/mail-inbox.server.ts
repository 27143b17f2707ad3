import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { simpleParser } from "mailparser";

export type CaughtMail = {
  file: string;
  to: string;
  subject: string;
  text: string;
  date: string;
  messageId: string;
  attachments: { filename: string; contentType: string; size: number }[];
};

/** Reads every .eml the fake SMTP server saved, newest first. */
export async function readCaughtMail(dir: string): Promise<CaughtMail[]> {
  let files: string[];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith(".eml"));
  } catch {
    return [];
  }
  const mails = await Promise.all(files.map((file) => parseCaughtMail(dir, file)));
  return mails.sort((a, b) => b.file.localeCompare(a.file));
}

export async function parseCaughtMail(dir: string, file: string): Promise<CaughtMail> {
  const parsed = await simpleParser(readFileSync(join(dir, file)));
  const to = Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(", ") : (parsed.to?.text ?? "");
  return {
    file,
    to,
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    date: (parsed.date ?? new Date(0)).toISOString(),
    messageId: parsed.messageId ?? "",
    attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? "", contentType: a.contentType, size: a.size })),
  };
}
