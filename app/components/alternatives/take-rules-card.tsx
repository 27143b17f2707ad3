import { useMemo } from "react";
import { Badge } from "~/components/ui/badge";
import { Notice } from "~/components/ui/notice";
import { formatNumber, type Units } from "./format";
import { NumberInput } from "./number-input";
import { describeRuleSources, RULE_FIELDS, setRuleOverride, type RuleOverrides, type RuleSource } from "./rule-sources";

const SOURCE_TEXT: Record<RuleSource, string> = { alternative: "this alternative", project: "project", default: "placeholder default" };

/**
 * The take and cost rules this alternative is computed with: each value in effect, where it comes
 * from, and (for a planner) an override or its removal — each one edit, previewed at once.
 */
export function TakeRulesCard({ units, projectRules, rules, editable, onChange }: {
  units: Units;
  projectRules: RuleOverrides | null;
  rules: RuleOverrides | undefined;
  editable: boolean;
  onChange: (rules: RuleOverrides) => void;
}) {
  const rows = useMemo(() => describeRuleSources(units, projectRules, rules), [units, projectRules, rules]);
  const fields = new Map(RULE_FIELDS.map((f) => [f.key, f]));
  return (
    <div className="space-y-3" data-testid="take-rules">
      <Notice>
        The defaults are placeholders, not published figures: replace them with your own. Every amount these rules produce is an
        order-of-magnitude estimate, not an appraisal. Areas and rates are in the project&apos;s units; amounts in its currency.
      </Notice>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" aria-label="Take and cost rules">
          <thead>
            <tr className="border-b border-rule-strong text-left text-label text-ink-soft">
              <th scope="col" className="px-2 py-2 font-semibold">Rule</th>
              <th scope="col" className="px-2 py-2 font-semibold">In effect</th>
              <th scope="col" className="px-2 py-2 font-semibold">From</th>
              {editable && <th scope="col" className="px-2 py-2"><span className="sr-only">Actions</span></th>}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const f = fields.get(r.key)!;
              const name = `${f.label} (${f.unit(units)})`;
              return (
                <tr key={r.key} className="border-b border-rule last:border-0" data-testid={`rule-${r.key}`}>
                  <th scope="row" className="px-2 py-1 text-left font-normal">{f.label} <span className="text-ink-soft">({f.unit(units)})</span></th>
                  <td className="px-2 py-1">
                    {editable ? <NumberInput label={name} value={r.value} min={f.min} max={f.max} onCommit={(v) => onChange(setRuleOverride(rules, r.key, v))} className="min-w-28" />
                      : <span className="tabular-nums">{formatNumber(r.value, r.value % 1 === 0 ? 0 : 2)}</span>}
                  </td>
                  <td className="px-2 py-1 whitespace-nowrap" data-testid={`rule-source-${r.key}`}>
                    <Badge tone={r.source === "alternative" ? "action" : "neutral"}>{SOURCE_TEXT[r.source]}</Badge>
                    {r.source === "alternative" && <span className="block text-xs text-ink-soft">{SOURCE_TEXT[r.inheritedSource]}: {formatNumber(r.inherited, r.inherited % 1 === 0 ? 0 : 2)}</span>}
                  </td>
                  {editable && (
                    <td className="px-2 py-1">
                      {r.source === "alternative" && (
                        <button type="button" onClick={() => onChange(setRuleOverride(rules, r.key, undefined))} aria-label={`Clear the override of ${f.label.toLowerCase()}`}
                          className="rounded-control px-2 py-1 text-sm font-semibold text-action hover:bg-action-tint">Clear override</button>
                      )}
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {editable && <p className="text-xs text-ink-soft">A value typed here applies to this alternative only; “Clear override” returns it to the project&apos;s value or the default.</p>}
    </div>
  );
}
