import { useFetcher } from "react-router";
import { Badge } from "~/components/ui/badge";
import { Button } from "~/components/ui/button";
import { Notice } from "~/components/ui/notice";
import { describeRule, formatRuleValue, type ProjectRuleRow, type ProjectUnits, type TakeRuleKey } from "./take-rule-labels";

/** What the page action answers to a rules save. */
export type RulesSaveResult = { ok: boolean; fieldErrors: Partial<Record<TakeRuleKey, string>> };

function RulesNotice() {
  return (
    <Notice>
      <strong>Placeholders, not figures to rely on.</strong> The default rules are starting values only: replace them with
      your agency's own thresholds and unit costs. Every cost worked out from them is an order-of-magnitude estimate for
      comparing alternatives, not an appraisal; defer to local practice and to qualified appraisers.
    </Notice>
  );
}

function SourceBadge({ row }: { row: ProjectRuleRow }) {
  return row.source === "project" ? <Badge tone="action">this project</Badge> : <Badge>default</Badge>;
}

function RuleRow({ row, units, mayEdit, error }: { row: ProjectRuleRow; units: ProjectUnits; mayEdit: boolean; error: string | undefined }) {
  const rule = describeRule(row.key, units);
  const inputId = `rule-${row.key}`;
  return (
    <tr className="border-b border-rule last:border-0 align-top" data-rule={row.key}>
      <th scope="row" className="px-3 py-2 text-left font-semibold">
        {mayEdit ? <label htmlFor={inputId}>{rule.label}</label> : rule.label}
        <p className="text-xs font-normal text-ink-soft">{rule.hint}</p>
      </th>
      <td className="px-3 py-2 text-ink-soft">{rule.unit}</td>
      <td className="px-3 py-2 text-right tabular-nums" data-testid={`rule-value-${row.key}`}>{formatRuleValue(row.value)}</td>
      <td className="px-3 py-2" data-testid={`rule-source-${row.key}`}><SourceBadge row={row} /></td>
      {mayEdit && (
        <td className="px-3 py-2">
          <input
            id={inputId}
            name={row.key}
            inputMode="decimal"
            defaultValue={row.source === "project" ? String(row.value) : ""}
            placeholder={`default ${formatRuleValue(row.defaultValue)}`}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${inputId}-error` : undefined}
            className="block w-36 rounded-control border border-rule-strong bg-sheet px-2 py-1 text-right text-sm tabular-nums aria-[invalid=true]:border-danger"
          />
          {error && <p id={`${inputId}-error`} role="alert" className="mt-1 text-xs font-semibold text-danger">{error}</p>}
        </td>
      )}
    </tr>
  );
}

/**
 * The project's take and cost rules: each with its unit in the project's units, the value in
 * effect and whether it is the project's own or the default. Planners (and admins) change them
 * here; a blank field goes back to the default. Saved through the project page's action.
 */
export function TakeRulesForm({ rows, units, mayEdit }: { rows: ProjectRuleRow[]; units: ProjectUnits; mayEdit: boolean }) {
  const fetcher = useFetcher<RulesSaveResult>();
  const errors = fetcher.data?.fieldErrors ?? {};
  const saved = fetcher.state === "idle" && fetcher.data?.ok === true;
  const table = (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-rule-strong text-left text-label text-ink-soft">
            <th scope="col" className="px-3 py-2 font-semibold">Rule</th>
            <th scope="col" className="px-3 py-2 font-semibold">Unit</th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">In effect</th>
            <th scope="col" className="px-3 py-2 font-semibold">From</th>
            {mayEdit && <th scope="col" className="px-3 py-2 font-semibold">This project's value</th>}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => <RuleRow key={row.key} row={row} units={units} mayEdit={mayEdit} error={errors[row.key]} />)}
        </tbody>
      </table>
    </div>
  );
  return (
    <div className="space-y-4">
      <RulesNotice />
      {!mayEdit ? table : (
        // Keyed by the stored rules, so the fields show what was saved once the page data reloads.
        <fetcher.Form method="post" key={JSON.stringify(rows)} className="space-y-3" aria-label="Take and cost rules">
          <input type="hidden" name="intent" value="save-rules" />
          {table}
          <div className="flex items-center gap-3">
            <Button type="submit" disabled={fetcher.state !== "idle"}>Save rules</Button>
            <p className="text-xs text-ink-soft">Leave a field blank to use the default. Saving recomputes every alternative's takes and costs.</p>
            {saved && <p role="status" className="text-sm font-semibold text-action-strong">Rules saved.</p>}
          </div>
        </fetcher.Form>
      )}
    </div>
  );
}
