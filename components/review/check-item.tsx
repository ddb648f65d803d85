import type { CheckResult } from "@/lib/engineering";
import { CheckStatusChip } from "./check-status";

const fmt = (v: number | null, unit: string) =>
  v === null ? "—" : `${v.toLocaleString("en-US", { maximumFractionDigits: 2 })}${unit ? ` ${unit}` : ""}`;

export function CheckItem({ check }: { check: CheckResult }) {
  return (
    <li className="space-y-1 border-b border-paper-edge/70 py-2 last:border-0" data-testid="check" data-status={check.status}>
      <div className="flex items-start gap-2">
        <CheckStatusChip status={check.status} />
        <div className="min-w-0 flex-1">
          <p className="text-sm font-medium">{check.title}</p>
          <p className="measure text-xs text-ink-soft">
            {fmt(check.value, check.unit)} {check.limit !== null ? <>against {fmt(check.limit, check.unit)}</> : null} · {check.clause}
          </p>
        </div>
      </div>
      <p className="text-sm text-ink-soft">{check.message}</p>
      {check.fix ? <p className="text-sm text-copper-dark">Suggested: {check.fix}</p> : null}
    </li>
  );
}
