import nodemailer, { type Transporter } from "nodemailer";
import { env } from "./env.server";

/** A nodemailer transport to the configured SMTP server (SMTP_URL) or to a loopback port. */
export function createMailTransport(target: { url: string } | { port: number }): Transporter {
  if ("url" in target) return nodemailer.createTransport(target.url);
  // The fake server speaks plain SMTP on loopback: no TLS, no auth.
  return nodemailer.createTransport({ host: "127.0.0.1", port: target.port, secure: false, ignoreTLS: true });
}

export function mailFrom(): string {
  return env().MAIL_FROM;
}
