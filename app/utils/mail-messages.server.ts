import type { OutgoingMail } from "~/models/mail-outbox.server";
import { ROLE_LABELS, type Role } from "./roles";

export function invitationMail(to: string, role: Role, inviterName: string, link: string): OutgoingMail {
  return {
    to,
    subject: "You are invited to Takeline",
    text: [
      `${inviterName} has invited you to Takeline as ${ROLE_LABELS[role]}.`,
      "",
      "Choose your name and password here (the link works once and expires in 7 days):",
      link,
      "",
      "If you did not expect this, ignore this message.",
    ].join("\n"),
  };
}

export function passwordResetMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: "Reset your Takeline password",
    text: [
      "Someone asked to reset the password of this Takeline account.",
      "",
      "Choose a new password here (the link works once and expires in 1 hour):",
      link,
      "",
      "If it was not you, ignore this message: your password stays as it is.",
    ].join("\n"),
  };
}
