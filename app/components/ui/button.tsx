import type { ButtonHTMLAttributes } from "react";

export type ButtonVariant = "primary" | "secondary" | "danger" | "quiet";

const VARIANTS: Record<ButtonVariant, string> = {
  primary: "bg-action text-white hover:bg-action-strong border-transparent",
  secondary: "bg-sheet text-ink border-rule-strong hover:bg-paper",
  danger: "bg-danger text-white hover:opacity-90 border-transparent",
  quiet: "bg-transparent text-action border-transparent hover:bg-action-tint",
};

export function buttonClass(variant: ButtonVariant = "primary", extra = ""): string {
  return `inline-flex items-center justify-center gap-2 rounded-control border px-3.5 py-2 text-sm font-semibold
    disabled:cursor-not-allowed disabled:opacity-50 no-underline hover:no-underline ${VARIANTS[variant]} ${extra}`;
}

export function Button({
  variant = "primary",
  className = "",
  type = "button",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: ButtonVariant }) {
  return <button type={type} className={buttonClass(variant, className)} {...props} />;
}
