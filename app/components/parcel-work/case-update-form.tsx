import { Form, useNavigation } from "react-router";
import { ACQUISITION_LABELS, nextStatuses, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { Button } from "~/components/ui/button";
import { SelectField } from "~/components/ui/field";

/** Move the parcel on (only the moves the status rules allow are offered) and/or add a note. */
export function CaseUpdateForm({ status, error }: { status: AcquisitionStatus; error?: string | null }) {
  const busy = useNavigation().state === "submitting";
  const options = [{ value: "", label: `Keep “${ACQUISITION_LABELS[status]}”` }, ...nextStatuses(status).map((s) => ({ value: s, label: ACQUISITION_LABELS[s] }))];
  return (
    <Form method="post" className="space-y-3">
      {nextStatuses(status).length > 0 ? (
        <SelectField label="Status" name="status" defaultValue="" options={options} />
      ) : (
        <p className="text-sm text-ink-soft">This parcel is acquired; its status is final. You can still add notes.</p>
      )}
      <div className="space-y-1">
        <label htmlFor="case-note" className="block text-label font-semibold">Note</label>
        <textarea id="case-note" name="note" rows={3} maxLength={4000} className="block w-full rounded-control border border-rule-strong bg-sheet px-3 py-2 text-sm" placeholder="Who you spoke to, what was agreed, the next step…" />
      </div>
      {error && <p role="alert" className="text-sm font-semibold text-danger">{error}</p>}
      <Button type="submit" disabled={busy}>{busy ? "Saving…" : "Save"}</Button>
    </Form>
  );
}
