import type { CheckAcceptance } from "./check-acceptances";

/** Who is saving and when: the signed-in user's display name and the save's instant. */
export type AcceptanceStamp = { by: string; at: Date };

/** The name an acceptance records for a user: their name, or their e-mail when they gave none. */
export function nameAcceptor(user: { name: string; email: string }): string {
  return user.name.trim() || user.email;
}

/**
 * The acceptances to store for a save, each with who accepted it and when (ISO 8601 UTC).
 *
 * An acceptance is new when its check `id` was not accepted in `previous` (the stored version the
 * save starts from) or its reason differs from the stored one: it gets `stamp`. One carried over
 * unchanged keeps the stamp it was stored with (none, if it predates stamping — inventing one would
 * credit the wrong person). `acceptedBy`/`acceptedAt` in `incoming` come from the client and are
 * never read.
 */
export function stampAcceptances(incoming: readonly CheckAcceptance[], previous: readonly CheckAcceptance[], stamp: AcceptanceStamp): CheckAcceptance[] {
  if (!stamp.by.trim()) throw new RangeError("stamp.by must name who accepted the checks (got an empty name).");
  if (Number.isNaN(stamp.at.getTime())) throw new RangeError("stamp.at must be a valid date.");
  const stored = new Map(previous.map((a) => [a.id, a]));
  const at = stamp.at.toISOString();
  return incoming.map(({ id, reason }) => {
    const before = stored.get(id);
    if (!before || before.reason !== reason) return { id, reason, acceptedBy: stamp.by, acceptedAt: at };
    return { id, reason, ...(before.acceptedBy ? { acceptedBy: before.acceptedBy } : {}), ...(before.acceptedAt ? { acceptedAt: before.acceptedAt } : {}) };
  });
}
