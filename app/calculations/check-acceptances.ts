import type { DesignCheckResult } from "~/geometry/design-check-types";

/** A planner's decision to go ahead despite a failed check, with the reason they gave. */
export type CheckAcceptance = { id: string; reason: string; acceptedBy?: string; acceptedAt?: string };
export type ReviewedCheck = DesignCheckResult & { accepted?: CheckAcceptance };

/**
 * Marks failed checks that a planner accepted. Acceptances that match no current warning — the
 * design changed and the check now passes, or the PI is gone — come back as `stale` so they are
 * dropped visibly rather than silently carried onto a different curve.
 */
export function applyCheckAcceptances(checks: DesignCheckResult[], acceptances: CheckAcceptance[] = []): { checks: ReviewedCheck[]; stale: CheckAcceptance[] } {
  const byId = new Map(acceptances.map((a) => [a.id, a]));
  const used = new Set<string>();
  const reviewed = checks.map((check): ReviewedCheck => {
    const acceptance = check.severity === "warning" ? byId.get(check.id) : undefined;
    if (!acceptance) return check;
    used.add(acceptance.id);
    return { ...check, accepted: acceptance };
  });
  return { checks: reviewed, stale: acceptances.filter((a) => !used.has(a.id)) };
}
