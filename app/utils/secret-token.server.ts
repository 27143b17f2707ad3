import { createHash, randomBytes } from "node:crypto";

/** A random URL-safe token with a readable prefix (e.g. `tl_…` for API tokens). */
export function createSecretToken(prefix: string): string {
  return `${prefix}_${randomBytes(32).toString("base64url")}`;
}

/** Tokens are stored only as SHA-256 hashes; they carry 256 random bits, so no salt or stretching is needed. */
export function hashSecretToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
