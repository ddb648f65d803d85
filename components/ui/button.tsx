import { clsx } from "clsx";
import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "quiet" | "danger";

const VARIANTS: Record<Variant, string> = {
  primary: "bg-copper text-white hover:bg-copper-dark disabled:bg-copper/50",
  secondary: "border border-paper-edge bg-white text-ink hover:bg-paper-deep",
  quiet: "text-copper-dark hover:bg-copper-light/50",
  danger: "border border-result-fail/40 bg-white text-result-fail hover:bg-result-fail/10",
};

export function Button({ variant = "primary", className, ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      className={clsx(
        "inline-flex items-center justify-center gap-2 rounded px-4 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed",
        VARIANTS[variant],
        className,
      )}
      {...props}
    />
  );
}
