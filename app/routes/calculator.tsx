import { useState } from "react";
import type { Route } from "./+types/calculator";
import { CompoundCurvePanel } from "~/components/calculator/compound-curve-panel";
import { SimpleCurvePanel } from "~/components/calculator/simple-curve-panel";
import { Notice } from "~/components/ui/notice";
import { ACCESS } from "~/utils/access";
import { requireUser } from "~/utils/permissions.server";

export function meta() {
  return [{ title: "Curve calculator · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request, { roles: ACCESS.calculator });
  return null;
}

const KINDS = [
  { id: "simple", label: "Simple curve" },
  { id: "compound", label: "Compound curve" },
] as const;

/** Works on its own, with no project: the same engine the alignments use, run in the browser as you type. */
export default function Calculator() {
  const [kind, setKind] = useState<(typeof KINDS)[number]["id"]>("simple");
  return (
    <div className="space-y-6">
      <h1>Curve calculator</h1>
      <Notice>
        Results support design; they are not a substitute for the checks of a licensed engineer or surveyor under the rules that apply where you work.
      </Notice>
      <div role="radiogroup" aria-label="Kind of curve" className="inline-flex rounded-control border border-rule-strong bg-sheet p-1">
        {KINDS.map((k) => (
          <button
            key={k.id}
            type="button"
            role="radio"
            aria-checked={kind === k.id}
            onClick={() => setKind(k.id)}
            className={`rounded-control px-4 py-1.5 text-sm font-semibold ${kind === k.id ? "bg-action text-white" : "text-ink-soft"}`}
          >
            {k.label}
          </button>
        ))}
      </div>
      {kind === "simple" ? <SimpleCurvePanel /> : <CompoundCurvePanel />}
    </div>
  );
}
