import { ACTION_LABELS, type LifecycleAction } from "~/calculations/alternative-lifecycle";
import { formatMoment } from "~/components/parcel-work/figures";

export interface TransitionItem {
  id: number;
  alternativeName: string;
  version: number;
  action: LifecycleAction;
  comment: string;
  at: string;
  actorName: string | null;
}

/** Every lifecycle event of the project, newest first: who, when, which version, and the comment. */
export function TransitionHistory({ items }: { items: TransitionItem[] }) {
  if (items.length === 0) return <p className="text-sm text-ink-soft">Nothing has been submitted or decided yet.</p>;
  return (
    <ol className="space-y-3" data-testid="decision-history">
      {items.map((t) => (
        <li key={t.id} className="border-l-2 border-rule pl-3 text-sm">
          <p>
            <strong>{t.alternativeName}</strong> version {t.version}: {ACTION_LABELS[t.action]}
          </p>
          {t.comment && <p className="whitespace-pre-wrap text-ink-soft">“{t.comment}”</p>}
          <p className="text-xs text-ink-soft">{formatMoment(t.at)}{t.actorName ? ` · ${t.actorName}` : ""}</p>
        </li>
      ))}
    </ol>
  );
}
