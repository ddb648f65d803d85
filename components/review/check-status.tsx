import { clsx } from "clsx";
import type { CheckStatus } from "@/lib/engineering";

const TONE: Record<CheckStatus, string> = {
  pass: "border-result-pass/40 bg-result-pass/10 text-result-pass",
  warn: "border-result-warn/40 bg-result-warn/10 text-result-warn",
  fail: "border-result-fail/40 bg-result-fail/10 text-result-fail",
};

/** A result chip: the word is always shown, so colour is never the only signal. */
export function CheckStatusChip({ status }: { status: CheckStatus }) {
  return (
    <span
      className={clsx(
        "inline-block min-w-[3.2rem] rounded border px-1.5 py-0.5 text-center text-xs font-semibold uppercase tracking-wide",
        TONE[status],
      )}
    >
      {status}
    </span>
  );
}
