"use client";

import { useFormContext, useWatch } from "react-hook-form";
import { SafetyNote } from "@/components/review/safety-note";
import { SingleLineSvg } from "@/components/sld/single-line-svg";
import { conductorSchedule } from "@/lib/design/conductor-schedule";
import type { DesignReviewOutcome } from "@/lib/design/run-review";
import { DesignInput, type DesignFormValues } from "@/lib/schemas/design";
import { layoutSingleLine } from "@/lib/sld";
import { ReviewPanel } from "./review-panel";
import { StorageSummary } from "./storage-summary";

type Reviewed = Extract<DesignReviewOutcome, { status: "reviewed" }>;

/** The runs as the plans list them: one row per raceway, with its circuits and conductor count. */
function ConductorScheduleTable({ outcome }: { outcome: Reviewed }) {
  const { control } = useFormContext<DesignFormValues>();
  const values = useWatch({ control });
  const parsed = DesignInput.safeParse(values);
  if (!parsed.success) return null;
  const lines = outcome.design.inverters.map((i) => ({ lineId: i.id, quantity: i.quantity, model: i.model }));
  const rows = conductorSchedule(parsed.data, outcome.design, lines);
  return (
    <section className="space-y-2">
      <h3 className="font-semibold">Conductor schedule</h3>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[40rem] text-left text-sm" data-testid="conductor-schedule">
          <thead className="text-xs uppercase tracking-wide text-ink-faint">
            <tr>
              <th className="py-1 pr-3 font-medium">Run</th>
              <th className="py-1 pr-3 font-medium">Carries</th>
              <th className="py-1 pr-3 font-medium">Conductors</th>
              <th className="py-1 pr-3 font-medium">Raceway</th>
              <th className="py-1 pr-3 font-medium">EGC</th>
              <th className="py-1 pr-3 text-right font-medium">Length</th>
              <th className="py-1 font-medium">Protection</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.runId} className="border-t border-paper-edge/70 align-top" data-testid="schedule-row">
                <td className="py-1 pr-3">{r.label}</td>
                <td className="py-1 pr-3">{r.carries}</td>
                <td className="measure py-1 pr-3">{r.conductors}</td>
                <td className="py-1 pr-3">{r.raceway}</td>
                <td className="measure py-1 pr-3">{r.egc}</td>
                <td className="measure py-1 pr-3 text-right">{r.lengthFt}</td>
                <td className="py-1">{r.ocpd}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}

export function ReviewStep({ outcome, onGoToStep }: { outcome: DesignReviewOutcome; onGoToStep: (step: number) => void }) {
  return (
    <div className="min-w-0 space-y-5">
      <ReviewPanel outcome={outcome} onGoToStep={onGoToStep} full />
      {outcome.status === "reviewed" ? <StorageSummary outcome={outcome} /> : null}
      {outcome.status === "reviewed" ? <ConductorScheduleTable outcome={outcome} /> : null}
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
              <li
                key={label.id}
                className="min-w-0 space-y-2 rounded border-2 border-ink/80 bg-white p-3 text-sm"
                data-testid="warning-label"
              >
                <p className="break-words text-xs uppercase tracking-wide text-ink-faint">
                  {label.clause} · {label.placement}
                </p>
                <p className="whitespace-pre-line break-words font-medium" data-testid="label-text">
                  {label.text}
                </p>
                <p className="text-xs text-ink-faint">
                  {label.prescribed
                    ? `Wording prescribed by ${label.clause}.`
                    : `${label.clause} asks for this content; the wording is ours.`}
                </p>
                <p className="break-words text-ink-soft" data-testid="label-explanation">
                  <span className="font-medium text-ink">What it means: </span>
                  {label.explanation}
                </p>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <SafetyNote />
    </div>
  );
}
