import { Notice } from "~/components/ui/notice";

/** The standing caution wherever takes, costs or design checks could be relied on too far. */
export function EstimateNotice() {
  return (
    <Notice>
      <strong>Preliminary figures.</strong> Design checks support preliminary design only. Take areas and costs are
      order-of-magnitude estimates from the uploaded parcel fabric — not surveys, legal descriptions or appraisals. Defer to
      local codes and to licensed engineers and surveyors before relying on any of them.
    </Notice>
  );
}
