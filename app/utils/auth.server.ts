import { Authenticator } from "remix-auth";
import { FormStrategy } from "remix-auth-form";
import { z } from "zod";
import { clearSignInFailures, recordSignInFailure, signInRetryDelayMs } from "~/models/sign-in-failures.server";
import { findUserByEmail, normalizeEmail, toPublicUser, type PublicUser } from "~/models/users.server";
import { decoyPasswordHash, verifyPassword } from "./password.server";

export const SignInSchema = z.object({
  email: z.string().trim().email("Enter an e-mail address.").max(254),
  password: z.string().min(1, "Enter your password.").max(200),
  redirectTo: z.string().optional(),
});

/** A sign-in refused for a reason the user may be told. Never says whether the account exists. */
export class SignInError extends Error {
  constructor(
    message: string,
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
  }
}

/** Checks an e-mail and password; throttles after repeated failures for the same e-mail. */
export async function verifyCredentials(emailInput: string, password: string): Promise<PublicUser> {
  const email = normalizeEmail(emailInput);
  const waitMs = signInRetryDelayMs(email);
  if (waitMs > 0) {
    const seconds = Math.ceil(waitMs / 1000);
    throw new SignInError(`Too many failed sign-ins for this e-mail. Try again in ${seconds} s.`, seconds);
  }
  const user = findUserByEmail(email);
  const usable = user && user.status === "active" && user.passwordHash;
  // Hash the attempt even for unknown accounts so the response time does not tell them apart.
  const ok = await verifyPassword(password, usable ? user.passwordHash! : await decoyPasswordHash());
  if (!usable || !ok) {
    recordSignInFailure(email);
    throw new SignInError("That e-mail and password do not match an active account.");
  }
  clearSignInFailures(email);
  return toPublicUser(user);
}

export const authenticator = new Authenticator<PublicUser>();

authenticator.use(
  new FormStrategy(async ({ form }) => {
    const parsed = SignInSchema.safeParse(Object.fromEntries(form));
    if (!parsed.success) throw new SignInError(parsed.error.issues[0]?.message ?? "Check the form.");
    return verifyCredentials(parsed.data.email, parsed.data.password);
  }),
  "form",
);
