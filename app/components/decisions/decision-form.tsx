import { Form, useNavigation } from "react-router";
import { Button } from "~/components/ui/button";

/**
 * A manager's decision on a submitted alternative: approve it as the preferred alternative or
 * return it with comments; on approval the parcels can be split among the land agents at once.
 */
export function DecisionForm({ alternative, agents, hasPreferred }: { alternative: { id: number; name: string; version: number }; agents: number; hasPreferred: boolean }) {
  const busy = useNavigation().state === "submitting";
  const id = `decision-${alternative.id}`;
  return (
    <Form method="post" className="space-y-3" aria-label={`Decision on ${alternative.name}`}>
      <input type="hidden" name="alternativeId" value={alternative.id} />
      <input type="hidden" name="version" value={alternative.version} />
      <fieldset className="flex flex-wrap gap-4 text-sm">
        <legend className="mb-1 text-label font-semibold">Decision on version {alternative.version}</legend>
        <label className="flex items-center gap-2"><input type="radio" name="intent" value="approve" required /> Approve as the preferred alternative</label>
        <label className="flex items-center gap-2"><input type="radio" name="intent" value="return" /> Return with comments</label>
      </fieldset>
      <div className="space-y-1">
        <label htmlFor={`${id}-comment`} className="block text-label font-semibold">Comment (required to return)</label>
        <textarea id={`${id}-comment`} name="comment" rows={3} maxLength={4000} className="block w-full rounded-control border border-rule-strong bg-sheet px-3 py-2 text-sm" />
      </div>
      {agents > 0 ? (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" name="split" value="even" /> On approval, split its parcels evenly among the project's {agents} land agents, in station order
          {hasPreferred ? " (otherwise parcels keep the agents they already have)" : ""}
        </label>
      ) : (
        <p className="text-xs text-ink-soft">The project has no land agents yet; assign parcels later, once they are members.</p>
      )}
      {hasPreferred && <p className="text-xs text-ink-soft">Approving replaces the current preferred alternative; both stay on record.</p>}
      <Button type="submit" disabled={busy}>{busy ? "Recording…" : "Record decision"}</Button>
    </Form>
  );
}
