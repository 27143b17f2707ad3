import { Form, useNavigation } from "react-router";
import { Button } from "~/components/ui/button";

/** A planner submits an alternative's current version for decision, or withdraws a submission. */
export function SubmissionForm({ alternative, intent }: { alternative: { id: number; name: string; version: number }; intent: "submit" | "withdraw" }) {
  const busy = useNavigation().state === "submitting";
  const id = `${intent}-${alternative.id}`;
  return (
    <Form method="post" className="flex flex-wrap items-end gap-3" aria-label={`${intent === "submit" ? "Submit" : "Withdraw"} ${alternative.name}`}>
      <input type="hidden" name="intent" value={intent} />
      <input type="hidden" name="alternativeId" value={alternative.id} />
      <div className="min-w-64 flex-1 space-y-1">
        <label htmlFor={`${id}-comment`} className="block text-label font-semibold">{intent === "submit" ? `Note for the manager on ${alternative.name}` : `Why withdraw ${alternative.name}?`} (optional)</label>
        <input id={`${id}-comment`} name="comment" maxLength={4000} className="block w-full rounded-control border border-rule-strong bg-sheet px-3 py-2 text-sm" />
      </div>
      <Button type="submit" variant={intent === "submit" ? "primary" : "secondary"} disabled={busy}>
        {intent === "submit" ? `Submit version ${alternative.version} for decision` : "Withdraw submission"}
      </Button>
    </Form>
  );
}
