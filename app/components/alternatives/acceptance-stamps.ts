import type { CheckAcceptance } from "./api-types";

/**
 * The draft's acceptances with the server's stamps (who accepted, when) filled in from the
 * last saved version, where the check and the reason are the same: the server stamps on save,
 * and the editor should not wait for a reload to show it.
 */
export function withSavedStamps(draft: CheckAcceptance[], saved: CheckAcceptance[] | null): CheckAcceptance[] {
  if (!saved || saved.length === 0) return draft;
  const byId = new Map(saved.map((a) => [a.id, a]));
  let changed = false;
  const out = draft.map((a) => {
    const s = byId.get(a.id);
    if (a.acceptedBy || !s?.acceptedBy || s.reason !== a.reason) return a;
    changed = true;
    return { ...a, acceptedBy: s.acceptedBy, ...(s.acceptedAt ? { acceptedAt: s.acceptedAt } : {}) };
  });
  return changed ? out : draft;
}
