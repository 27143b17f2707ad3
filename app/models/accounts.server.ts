import { db } from "~/utils/db.server";
import { hashPassword } from "~/utils/password.server";
import { invitationMail, passwordResetMail } from "~/utils/mail-messages.server";
import type { Role } from "~/utils/roles";
import { recordAuditEvent } from "./audit.server";
import { consumeEmailLink, createEmailLink, findValidEmailLink } from "./email-links.server";
import { enqueueMail } from "./mail-outbox.server";
import { findUserByEmail, findUserById, insertUser, setUserPassword, updateUserProfile, type PublicUser } from "./users.server";

export class AccountConflictError extends Error {}

/**
 * Creates an invited (not yet active) user and queues the invitation mail in the same
 * transaction, so the mail exists exactly when the invitation does.
 */
export function inviteUser(input: { email: string; role: Role; name?: string }, inviter: PublicUser, baseUrl: string) {
  return db().transaction((tx) => {
    const existing = findUserByEmail(input.email, tx);
    if (existing && existing.status !== "invited") throw new AccountConflictError("That e-mail already has an account.");
    const user =
      existing ?? insertUser({ email: input.email, name: input.name ?? "", role: input.role, passwordHash: null, status: "invited" }, tx);
    const token = createEmailLink(user.id, "invitation", tx);
    enqueueMail(invitationMail(user.email, input.role, inviter.name, `${baseUrl}/invitations/${token}`), tx);
    recordAuditEvent({ actorId: inviter.id, action: "user.invited", subject: user.email, details: { role: input.role } }, tx);
    return { id: user.id, email: user.email, role: user.role };
  });
}

/** The invited user behind a valid invitation token, for the acceptance form. */
export function findInvitation(token: string) {
  const link = findValidEmailLink(token, "invitation");
  const user = link ? findUserById(link.userId) : undefined;
  return link && user && user.status === "invited" ? { link, user } : undefined;
}

export async function acceptInvitation(token: string, name: string, password: string): Promise<boolean> {
  const found = findInvitation(token);
  if (!found) return false;
  const passwordHash = await hashPassword(password);
  return db().transaction((tx) => {
    if (!consumeEmailLink(found.link.id, tx)) return false;
    setUserPassword(found.user.id, passwordHash, tx);
    updateUserProfile(found.user.id, { name }, tx);
    recordAuditEvent({ actorId: found.user.id, action: "user.accepted-invitation", subject: found.user.email }, tx);
    return true;
  });
}

/** Queues a reset mail if the account exists; says nothing either way, to avoid an account oracle. */
export function requestPasswordReset(email: string, baseUrl: string): void {
  db().transaction((tx) => {
    const user = findUserByEmail(email, tx);
    if (!user || user.status !== "active") return;
    const token = createEmailLink(user.id, "password-reset", tx);
    enqueueMail(passwordResetMail(user.email, `${baseUrl}/reset-password/${token}`), tx);
    recordAuditEvent({ actorId: user.id, action: "user.requested-password-reset", subject: user.email }, tx);
  });
}

export function isResetTokenValid(token: string): boolean {
  return Boolean(findValidEmailLink(token, "password-reset"));
}

export async function resetPassword(token: string, password: string): Promise<boolean> {
  const link = findValidEmailLink(token, "password-reset");
  if (!link) return false;
  const passwordHash = await hashPassword(password);
  return db().transaction((tx) => {
    if (!consumeEmailLink(link.id, tx)) return false;
    setUserPassword(link.userId, passwordHash, tx);
    recordAuditEvent({ actorId: link.userId, action: "user.reset-password" }, tx);
    return true;
  });
}
