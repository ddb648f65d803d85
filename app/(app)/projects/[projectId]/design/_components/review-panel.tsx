"use client";

import { CheckItem } from "@/components/review/check-item";
import { CheckStatusChip } from "@/components/review/check-status";
import type { DesignReviewOutcome } from "@/lib/design/run-review";
import type { CheckResult } from "@/lib/engineering";
import { DESIGN_STEPS } from "@/lib/schemas/design-options";

const ORDER = { fail: 0, warn: 1, pass: 2 } as const;
const stepOf = (path: string) =>
  Math.max(
    0,
    DESIGN_STEPS.findIndex((s) => path.startsWith(s.key)),
  );
const worstFirst = (checks: CheckResult[]) => [...checks].sort((a, b) => ORDER[a.status] - ORDER[b.status]);

export function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="measure text-sm">{value}</dd>
    </div>
  );
}

/** The live review: what is missing with the checks that can already run, or every check worst first. */
export function ReviewPanel({
  outcome,
  onGoToStep,
  full = false,
}: {
  outcome: DesignReviewOutcome;
  onGoToStep: (step: number) => void;
  full?: boolean;
}) {
  if (outcome.status === "incomplete") {
    const partial = worstFirst(outcome.partial);
    const shown = full ? partial : partial.filter((c) => c.status !== "pass");
    return (
      <div className="space-y-3" data-testid="review-panel" data-review="incomplete">
        <div className="space-y-2">
          <p className="text-sm font-medium">Complete these to run the whole review</p>
          <ul className="space-y-1 text-sm" data-testid="missing-entries">
            {outcome.problems.slice(0, full ? 100 : 12).map((p, i) => (
              <li key={`${p.path}-${i}`} className="break-words">
                <button
                  type="button"
                  className="text-left text-copper-dark underline-offset-2 hover:underline"
                  onClick={() => onGoToStep(stepOf(p.path))}
                >
                  {DESIGN_STEPS[stepOf(p.path)].title}
                </button>
                : {p.message}
              </li>
            ))}
          </ul>
        </div>
        {partial.length ? (
          <div className="space-y-1" data-testid="partial-review">
            <p className="text-sm font-medium">Already checked from the equipment and strings</p>
            <ul>
              {shown.map((check) => (
                <CheckItem key={check.id} check={check} />
              ))}
            </ul>
            {!full && partial.length > shown.length ? (
              <p className="text-xs text-ink-faint">{partial.length - shown.length} of these pass.</p>
            ) : null}
          </div>
        ) : null}
      </div>
    );
  }
  const { checks, summary } = outcome.review;
  const sorted = worstFirst(checks);
  const shown = full ? sorted : sorted.filter((c) => c.status !== "pass");
  return (
    <div className="space-y-3" data-testid="review-panel" data-review={summary.status}>
      <div className="flex items-center gap-2">
        <CheckStatusChip status={summary.status} />
        <p className="text-sm">
          <span className="measure">{summary.fail}</span> fail · <span className="measure">{summary.warn}</span> warn ·{" "}
          <span className="measure">{summary.pass}</span> pass
        </p>
      </div>
      <dl className="grid grid-cols-2 gap-2">
        <Figure label="DC at STC" value={`${summary.ratings.dcKw.toFixed(2)} kW`} />
        <Figure label="AC" value={`${summary.ratings.acKw.toFixed(2)} kW`} />
        <Figure label="DC/AC ratio" value={summary.ratings.dcToAcRatio.toFixed(2)} />
        <Figure
          label="Estimated yearly"
          value={
            summary.annualProductionKwh === null
              ? "needs sun hours"
              : `${Math.round(summary.annualProductionKwh).toLocaleString("en-US")} kWh`
          }
        />
        <Figure label="Max DC voltage" value={summary.maxDcVoltageV === null ? "—" : `${summary.maxDcVoltageV} V`} />
        <Figure label="Largest PV breaker" value={summary.largestPvBreakerA === null ? "—" : `${summary.largestPvBreakerA} A`} />
      </dl>
      <ul>
        {shown.map((check) => (
          <CheckItem key={check.id} check={check} />
        ))}
      </ul>
      {!full && summary.pass ? (
        <p className="text-xs text-ink-faint">{summary.pass} passing checks are listed in the Review step.</p>
      ) : null}
    </div>
  );
}
