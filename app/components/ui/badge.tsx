import type { ReactNode } from "react";

export type BadgeTone = "neutral" | "action" | "take" | "caution" | "danger" | "info";

const TONES: Record<BadgeTone, string> = {
  neutral: "bg-paper text-ink-soft border-rule",
  action: "bg-action-tint text-action-strong border-action/20",
  take: "bg-take-tint text-take border-take/20",
  caution: "bg-caution-tint text-caution border-caution/20",
  danger: "bg-danger-tint text-danger border-danger/20",
  info: "bg-info-tint text-info border-info/20",
};

export function Badge({ tone = "neutral", children }: { tone?: BadgeTone; children: ReactNode }) {
  return <span className={`inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-semibold ${TONES[tone]}`}>{children}</span>;
}
