"use client";

import { useId, useMemo, useState, useSyncExternalStore } from "react";
import { useWatch, type Control } from "react-hook-form";
import { computeFees, feeAmountText, formatUsd, parseUsd, type FeeComputation } from "@/lib/fees";
import { FeeScheduleInput } from "@/lib/schemas/fee-schedule";
import { todayIso, type FeeScheduleFormInput, type FeeScheduleFormValues } from "./fee-schedule-form";

const KW = /^\d*\.?\d+$/;
const readKw = (text: string) => (KW.test(text.trim()) ? Number(text.trim()) : null);
const noSubscription = () => () => {};

type Preview = { kind: "hint"; text: string } | { kind: "fees"; computation: FeeComputation; notCounted: string[] };

/**
 * "Try it": the schedule as typed, worked out for a system the admin describes, with the same
 * arithmetic a project's fees use. Shown only while every line parses; nothing here is saved.
 */
export function FeePreview({
  control,
  authorityName,
}: {
  control: Control<FeeScheduleFormInput, unknown, FeeScheduleFormValues>;
  authorityName: string;
}) {
  const id = useId();
  const lines = useWatch({ control, name: "lines" });
  // The server has no say in "today" for this box: it is read once the page runs in the browser.
  const today = useSyncExternalStore(noSubscription, todayIso, () => "");
  const [dcKw, setDcKw] = useState("7.6");
  const [acKw, setAcKw] = useState("6.0");
  const [valuation, setValuation] = useState("25000");
  const [asOf, setAsOf] = useState("");
  const date = asOf || today;

  const preview = useMemo((): Preview => {
    if (!lines || lines.length === 0) return { kind: "hint", text: "Add a fee line to try the schedule." };
    const parsed = FeeScheduleInput.safeParse(lines);
    if (!parsed.success) {
      const [issue] = parsed.error.issues;
      const where = typeof issue?.path[0] === "number" ? `Fee line ${issue.path[0] + 1} – ` : "";
      return {
        kind: "hint",
        text: `The preview shows once every line is complete and valid. Next to fix: ${where}${issue?.message ?? "check the lines"}.`,
      };
    }
    const dc = readKw(dcKw);
    const ac = readKw(acKw);
    const valuationCents = valuation.trim() === "" ? null : parseUsd(valuation);
    if (dc === null || ac === null) return { kind: "hint", text: "Enter the sizes in kW, e.g. 7.6." };
    if (valuationCents === null && valuation.trim() !== "")
      return { kind: "hint", text: "Enter the valuation in dollars, e.g. 25000, or leave it blank." };
    if (!date) return { kind: "hint", text: "Loading the preview…" }; // before the browser has said which day it is
    try {
      const computation = computeFees({ lines: parsed.data, facts: { dcKw: dc, acKw: ac, valuationCents, asOf: date } });
      const counted = new Set(computation.lines.map((line) => line.lineId));
      return { kind: "fees", computation, notCounted: parsed.data.filter((line) => !counted.has(line.id)).map((line) => line.name) };
    } catch (error) {
      return { kind: "hint", text: error instanceof Error ? error.message : "These figures cannot be worked out." };
    }
  }, [lines, dcKw, acKw, valuation, date]);

  const input = (key: string, label: string, value: string, set: (v: string) => void, hint?: string, type: "text" | "date" = "text") => (
    <div>
      <label className="label" htmlFor={`${id}-${key}`}>
        {label}
      </label>
      <input
        id={`${id}-${key}`}
        type={type}
        inputMode={type === "text" ? "decimal" : undefined}
        autoComplete="off"
        className="input measure"
        value={value}
        onChange={(e) => set(e.target.value)}
      />
      {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
    </div>
  );

  return (
    <section
      aria-labelledby={`${id}-title`}
      className="space-y-3 rounded-md border border-dashed border-copper/40 bg-copper-light/20 p-3 sm:p-4"
    >
      <div>
        <h3 id={`${id}-title`} className="font-semibold">
          Try it
        </h3>
        <p className="text-xs text-ink-soft">
          What {authorityName} would charge a system like this under the lines above, as typed. Nothing here is saved.
        </p>
      </div>
      <div className="grid gap-3 sm:grid-cols-4">
        {input("dc", "DC size (kW)", dcKw, setDcKw, "Module nameplate total")}
        {input("ac", "AC size (kW)", acKw, setAcKw, "Inverter output total")}
        {input("valuation", "Valuation ($)", valuation, setValuation, "Blank: not declared yet")}
        {input("as-of", "Fees as of", date, setAsOf, undefined, "date")}
      </div>
      {preview.kind === "hint" ? (
        <p className="text-sm text-ink-soft" data-testid="fee-preview-hint">
          {preview.text}
        </p>
      ) : (
        <PreviewResult computation={preview.computation} notCounted={preview.notCounted} date={date} />
      )}
    </section>
  );
}

function PreviewResult({ computation, notCounted, date }: { computation: FeeComputation; notCounted: string[]; date: string }) {
  return (
    <div className="space-y-2" data-testid="fee-preview">
      {computation.lines.length === 0 ? <p className="text-sm text-ink-soft">No line is in effect on {date}.</p> : null}
      <ol className="space-y-2">
        {computation.lines.map((line) => (
          <li key={line.lineId} className="rounded border border-paper-edge bg-white px-3 py-2">
            <div className="flex flex-wrap items-baseline justify-between gap-x-3">
              <span className="font-medium">{line.name}</span>
              <span className="measure">{feeAmountText({ amountCents: line.amountCents, problem: line.problem?.code })}</span>
            </div>
            <ul className="mt-1 space-y-0.5 text-xs tabular-nums text-ink-soft">
              {line.arithmetic.map((step, k) => (
                <li key={k}>{step}</li>
              ))}
            </ul>
            {line.problem ? <p className="mt-1 text-xs text-copper-dark">{line.problem.message}</p> : null}
          </li>
        ))}
      </ol>
      {notCounted.length > 0 ? (
        <p className="text-xs text-ink-soft">
          Not counted on {date} (not yet in effect, ended, or replaced by a later version): {notCounted.join(", ")}.
        </p>
      ) : null}
      <p className="flex items-baseline justify-between gap-3 border-t border-paper-edge pt-2 font-semibold" aria-live="polite">
        <span>{computation.isComplete ? "Total" : "At least (a line needs the valuation)"}</span>
        <span className="measure" data-testid="fee-preview-total">
          {formatUsd(computation.totalCents)}
        </span>
      </p>
    </div>
  );
}
