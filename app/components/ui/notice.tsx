import type { ReactNode } from "react";

/** A standing caution — e.g. that takes are estimates — shown wherever a number could be relied on too far. */
export function Notice({ tone = "caution", children }: { tone?: "caution" | "info"; children: ReactNode }) {
  const cls = tone === "caution" ? "border-caution bg-caution-tint text-ink" : "border-info bg-info-tint text-ink";
  return <div className={`rounded-md border-l-4 px-4 py-3 text-sm ${cls}`}>{children}</div>;
}
