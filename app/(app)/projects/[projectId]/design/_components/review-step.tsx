"use client";

import { SafetyNote } from "@/components/review/safety-note";
import { SingleLineSvg } from "@/components/sld/single-line-svg";
import { layoutSingleLine } from "@/lib/sld";
import type { DesignReviewOutcome } from "@/lib/design/run-review";
import { ReviewPanel } from "./review-panel";

export function ReviewStep({ outcome, onGoToStep }: { outcome: DesignReviewOutcome; onGoToStep: (step: number) => void }) {
  return (
    <div className="space-y-5">
      <ReviewPanel outcome={outcome} onGoToStep={onGoToStep} full />
      {outcome.status === "reviewed" ? (
        <section className="space-y-2">
          <h3 className="font-semibold">Single-line diagram</h3>
          <div className="overflow-x-auto rounded border border-paper-edge bg-white p-2">
            <SingleLineSvg scene={layoutSingleLine(outcome.design, { necEdition: outcome.site.necEdition })} className="min-w-[900px]" />
          </div>
        </section>
      ) : null}
      {outcome.status === "reviewed" && outcome.review.labels.length ? (
        <section className="space-y-2">
          <h3 className="font-semibold">Required warning labels</h3>
          <ul className="grid gap-3 sm:grid-cols-2">
            {outcome.review.labels.map((label) => (
              <li key={label.id} className="rounded border-2 border-ink/80 bg-white p-3 text-sm" data-testid="warning-label">
                <p className="text-xs uppercase tracking-wide text-ink-faint">
                  {label.clause} · {label.placement}
                </p>
                <p className="mt-1 whitespace-pre-line font-medium">{label.text}</p>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <SafetyNote />
    </div>
  );
}
