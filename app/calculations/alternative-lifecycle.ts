import type { Role } from "~/utils/roles";

/** The states an alternative's current version can be in (the `alternatives.status` column). */
export const ALTERNATIVE_STATES = ["draft", "submitted", "approved", "returned", "superseded"] as const;
export type AlternativeState = (typeof ALTERNATIVE_STATES)[number];

/** Plain words shown to people for each state. */
export const STATE_LABELS: Record<AlternativeState, string> = {
  draft: "Draft",
  submitted: "Awaiting decision",
  approved: "Preferred",
  returned: "Returned for changes",
  superseded: "Replaced by a later decision",
};

/**
 * What can happen to an alternative. `edit` is a planner's save; `supersede` happens to the
 * previous preferred alternative when another one is approved, never on anyone's direct request.
 */
export const LIFECYCLE_ACTIONS = ["submit", "withdraw", "approve", "return", "edit", "supersede"] as const;
export type LifecycleAction = (typeof LIFECYCLE_ACTIONS)[number];

/** Who acts: a user's role, or Takeline itself as a consequence of another decision. */
export type LifecycleActor = Role | "system";

export const ACTION_LABELS: Record<LifecycleAction, string> = {
  submit: "Submitted for decision",
  withdraw: "Submission withdrawn",
  approve: "Approved as the preferred alternative",
  return: "Returned with comments",
  edit: "Edited (new draft version)",
  supersede: "Replaced by a later decision",
};

interface Rule {
  actors: readonly LifecycleActor[];
  /** State reached from each state the action is allowed in. */
  from: Partial<Record<AlternativeState, AlternativeState>>;
  /** Why the action is refused in the other states, in words a person can act on. */
  refusal: string;
}

const RULES: Record<LifecycleAction, Rule> = {
  submit: { actors: ["planner"], from: { draft: "submitted", returned: "submitted" }, refusal: "Only a draft or a returned alternative can be submitted for decision." },
  withdraw: { actors: ["planner"], from: { submitted: "draft" }, refusal: "Only an alternative awaiting a decision can be withdrawn." },
  approve: { actors: ["manager"], from: { submitted: "approved" }, refusal: "Only an alternative awaiting a decision can be approved." },
  return: { actors: ["manager"], from: { submitted: "returned" }, refusal: "Only an alternative awaiting a decision can be returned." },
  // Editing an approved (or replaced) version leaves that version frozen and starts the next one as a draft.
  edit: {
    actors: ["planner"],
    from: { draft: "draft", returned: "draft", approved: "draft", superseded: "draft" },
    refusal: "This alternative is awaiting a decision; withdraw the submission before editing it.",
  },
  supersede: { actors: ["system"], from: { approved: "superseded" }, refusal: "Only the preferred alternative can be replaced." },
};

export type TransitionPlan =
  | { ok: true; to: AlternativeState; startsNewVersion: boolean }
  | { ok: false; refusal: "role"; neededActors: LifecycleActor[]; message: string }
  | { ok: false; refusal: "state"; message: string };

/**
 * Whether `actor` may take `action` on an alternative in state `from`, and the state it leads to.
 * The role is checked first: a role that may never take the action is refused whatever the state
 * (the API's 403), a role that may is refused only by the state (the API's 409).
 */
export function planTransition(from: AlternativeState, action: LifecycleAction, actor: LifecycleActor): TransitionPlan {
  const rule = RULES[action];
  if (!rule.actors.includes(actor)) {
    return { ok: false, refusal: "role", neededActors: [...rule.actors], message: `Only ${rule.actors.join(" or ")} may do this.` };
  }
  const to = rule.from[from];
  if (!to) return { ok: false, refusal: "state", message: `${rule.refusal} It is ${STATE_LABELS[from].toLowerCase()}.` };
  return { ok: true, to, startsNewVersion: action === "edit" && (from === "approved" || from === "superseded") };
}

/** The states an action is allowed from (for guarded UPDATEs: the state test sits in the WHERE). */
export function statesAllowing(action: LifecycleAction): AlternativeState[] {
  return ALTERNATIVE_STATES.filter((s) => RULES[action].from[s] !== undefined);
}

/** The roles that may take an action (for requireUser). */
export function rolesFor(action: LifecycleAction): Role[] {
  return RULES[action].actors.filter((a): a is Role => a !== "system");
}

/** The actions a role may take now, for the buttons a page shows. */
export function availableActions(from: AlternativeState, actor: LifecycleActor): LifecycleAction[] {
  return LIFECYCLE_ACTIONS.filter((a) => a !== "edit" && planTransition(from, a, actor).ok);
}
