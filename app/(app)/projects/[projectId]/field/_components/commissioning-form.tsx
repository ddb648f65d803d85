"use client";

import { clsx } from "clsx";
import { useEffect, useMemo, useRef, useState } from "react";
import { useForm, useWatch, type UseFormRegisterReturn } from "react-hook-form";
import { CheckStatusChip } from "@/components/review/check-status";
import { useTimeZone } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { checkCommissioning, commissioningComplete, shutdownWindow, type CommissioningCheck } from "@/lib/engineering/commissioning";
import { toCommissioningRecord, type CommissioningFacts } from "@/lib/field/commissioning-facts";
import { formatInZone } from "@/lib/domain/time-zones";
import { CommissioningReadings } from "@/lib/schemas/commissioning";
import { saveCommissioningAction } from "../actions";

type FormValues = {
  gridProfileSet: string;
  acVoltageV: string;
  strings: { id: string; measuredV: string }[];
  modulesReporting: string;
  firstPowerW: string;
  firstPowerTime: string;
  rapidShutdown: { boundary: "outside" | "inside"; measuredV: string; seconds: string };
};

const text = (v: number | string | null) => (v === null ? "" : String(v));
const fmtV = (v: number) => v.toLocaleString("en-US", { maximumFractionDigits: 1 });

function toFormValues(r: CommissioningReadings): FormValues {
  return {
    gridProfileSet: text(r.gridProfileSet),
    acVoltageV: text(r.acVoltageV),
    strings: r.strings.map((s) => ({ id: s.id, measuredV: text(s.measuredV) })),
    modulesReporting: text(r.modulesReporting),
    firstPowerW: text(r.firstPowerW),
    firstPowerTime: text(r.firstPowerTime),
    rapidShutdown: { boundary: r.rapidShutdown.boundary, measuredV: text(r.rapidShutdown.measuredV), seconds: text(r.rapidShutdown.seconds) },
  };
}

/** The typed values as readings; a field that is not a number is left out of the checks and its problem shown beside it. */
function liveReadings(values: FormValues): { readings: CommissioningReadings; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const copy = structuredClone(values) as Record<string, unknown>;
  let parsed = CommissioningReadings.safeParse(copy);
  for (let i = 0; i < 3 && !parsed.success; i++) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.map(String);
      errors[path.join(".")] ??= issue.message;
      let node = copy as Record<string, unknown>;
      for (const key of path.slice(0, -1)) node = node[key] as Record<string, unknown>;
      node[path[path.length - 1]] = "";
    }
    parsed = CommissioningReadings.safeParse(copy);
  }
  return { readings: parsed.success ? parsed.data : CommissioningReadings.parse({}), errors };
}

type SaveState = { kind: "idle" | "saving" | "saved" | "error" | "refused"; text: string };
const AUTOSAVE_MS = 1500;

function savedText(updatedAt: string | null, timeZone: string) {
  return updatedAt ? `Saved ${formatInZone(updatedAt, timeZone, "time")}` : "Not saved yet";
}

export function CommissioningForm(props: { projectId: string; facts: CommissioningFacts; initialReadings: CommissioningReadings; initialStatus: "open" | "complete"; initialUpdatedAt: string | null; readOnly: boolean }) {
  const { projectId, facts, readOnly } = props;
  const form = useForm<FormValues>({ defaultValues: toFormValues(props.initialReadings) });
  const values = useWatch({ control: form.control }) as FormValues;
  const [status, setStatus] = useState(props.initialStatus);
  const timeZone = useTimeZone();
  const [save, setSave] = useState<SaveState>({ kind: "idle", text: savedText(props.initialUpdatedAt, timeZone) });
  const typed = useRef(false);
  const autosave = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const latest = useRef(0); // only the newest save's answer is shown

  const { errors, results, completion } = useMemo(() => {
    const live = liveReadings(values);
    const checks = checkCommissioning(toCommissioningRecord(facts, live.readings));
    return { errors: live.errors, results: checks, completion: commissioningComplete(checks) };
  }, [values, facts]);
  const byId = (id: string) => results.find((r) => r.id === id);

  async function saveNow(complete = false) {
    if (readOnly) return;
    // An explicit save supersedes the autosave waiting to fire, so its answer is the one shown.
    clearTimeout(autosave.current);
    typed.current = false;
    setSave({ kind: "saving", text: "Saving…" });
    const mine = ++latest.current;
    const result = await saveCommissioningAction({ projectId, readings: form.getValues(), complete });
    if (mine !== latest.current) return;
    if (!result.ok) {
      setSave({ kind: "error", text: `Not saved: ${result.message} Your readings stay on this page.` });
      return;
    }
    setStatus(result.data.status);
    if (result.data.completeRefused) setSave({ kind: "refused", text: result.data.completeRefused });
    else setSave({ kind: "saved", text: result.data.status === "complete" && complete ? "Saved and marked complete." : savedText(result.data.updatedAt, timeZone) });
  }

  // Save a moment after typing stops, so a dropped signal on site loses at most the last few seconds.
  useEffect(() => {
    if (readOnly || !typed.current) return;
    autosave.current = setTimeout(() => void saveNow(), AUTOSAVE_MS);
    return () => clearTimeout(autosave.current);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- values is the trigger
  }, [values]);

  const reg = (name: Parameters<typeof form.register>[0]): UseFormRegisterReturn => form.register(name, { onChange: () => (typed.current = true) });

  return (
    <form onSubmit={(e) => e.preventDefault()} noValidate className="space-y-4" aria-label="Commissioning record">
      <div className="panel flex flex-wrap items-center gap-3" data-testid="commissioning-status">
        <h2 className="text-base">Commissioning record</h2>
        <span className={clsx("rounded border px-2 py-0.5 text-xs font-semibold uppercase tracking-wide", status === "complete" ? "border-result-pass/40 bg-result-pass/10 text-result-pass" : "border-paper-edge bg-paper-deep text-ink-soft")}>
          {status === "complete" ? "Complete" : "Open"}
        </span>
        <span className="measure text-sm text-ink-soft" data-testid="completion-counts">
          {completion.failing.length} failing · {completion.missing.length} to record
        </span>
      </div>

      <fieldset disabled={readOnly} className="space-y-4">
        <Reading title="Grid profile set on the inverter" inputId="gridProfileSet" hint={facts.requiredGridProfile ? `The utility requires: ${facts.requiredGridProfile}` : "The utility's required profile is not on file; ask the office."} result={byId("grid-profile")} error={errors.gridProfileSet}>
          <input id="gridProfileSet" data-required={facts.requiredGridProfile ?? ""} className="input text-base" autoComplete="off" {...reg("gridProfileSet")} />
        </Reading>

        <Reading title="AC voltage at the point of connection" inputId="acVoltageV" hint={`Nominal service ${facts.nominalServiceV} V.`} result={byId("ac-voltage")} error={errors.acVoltageV} unit="V">
          <input id="acVoltageV" className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg("acVoltageV")} />
        </Reading>

        {values.strings.length > 0 ? (
          <section className="panel space-y-3" aria-labelledby="strings-heading">
            <div>
              <h3 id="strings-heading">String voltages with the array shut down</h3>
              <p className="text-xs text-ink-soft">Open the shutdown switch and wait for the inverter to report a safe DC voltage before you measure each string at the inverter.</p>
            </div>
            {values.strings.map((s, i) => {
              const fact = facts.strings.find((f) => f.id === s.id);
              const window = fact ? shutdownWindow(fact.devicesInSeries, fact.perDeviceV) : null;
              const hint = fact && window ? `${fact.devicesInSeries} devices in series: expect about ${fmtV(window.expectedV)} to ${fmtV(window.highV)} V.` : undefined;
              return (
                <Reading key={s.id} title={`String ${s.id}`} inputId={`strings.${i}.measuredV`} hint={hint} result={byId(`string-shutdown:${s.id}`)} error={errors[`strings.${i}.measuredV`]} unit="V" bare>
                  <input id={`strings.${i}.measuredV`} data-expected-v={window?.expectedV} className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg(`strings.${i}.measuredV`)} />
                </Reading>
              );
            })}
          </section>
        ) : null}

        <Reading title="Modules reporting" inputId="modulesReporting" hint={`${facts.modulesInstalled} modules installed. Every one must report before the record is complete.`} result={byId("modules-reporting")} error={errors.modulesReporting} unit="modules">
          <input id="modulesReporting" data-installed={facts.modulesInstalled} className="input measure text-base" inputMode="numeric" autoComplete="off" {...reg("modulesReporting")} />
        </Reading>

        <section className="panel space-y-3" aria-labelledby="first-power-heading">
          <h3 id="first-power-heading">First power</h3>
          <div className="grid gap-3 sm:grid-cols-2">
            <LabelledInput label="AC output" htmlFor="firstPowerW" unit="W" error={errors.firstPowerW}>
              <input id="firstPowerW" data-rating-w={facts.acRatingW} className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg("firstPowerW")} />
            </LabelledInput>
            <LabelledInput label="Time of day (24-hour)" htmlFor="firstPowerTime" error={errors.firstPowerTime}>
              <input id="firstPowerTime" type="time" className="input measure text-base" {...reg("firstPowerTime")} />
            </LabelledInput>
          </div>
          <ResultLine result={byId("first-power")} />
        </section>

        <section className="panel space-y-3" aria-labelledby="rsd-heading">
          <div>
            <h3 id="rsd-heading">Rapid shutdown test</h3>
            <p className="text-xs text-ink-soft">Operate the rapid shutdown initiator, then read the voltage on the PV conductors and how long it took to fall.</p>
          </div>
          <LabelledInput label="Where the conductors were read" htmlFor="rapidShutdown.boundary">
            <select id="rapidShutdown.boundary" className="input text-base" {...reg("rapidShutdown.boundary")}>
              <option value="outside">Outside the array boundary (30 V limit)</option>
              <option value="inside">Inside the array boundary (80 V limit)</option>
            </select>
          </LabelledInput>
          <div className="grid gap-3 sm:grid-cols-2">
            <LabelledInput label="Voltage reached" htmlFor="rapidShutdown.measuredV" unit="V" error={errors["rapidShutdown.measuredV"]}>
              <input id="rapidShutdown.measuredV" className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg("rapidShutdown.measuredV")} />
            </LabelledInput>
            <LabelledInput label="Seconds to reach it" htmlFor="rapidShutdown.seconds" unit="s" error={errors["rapidShutdown.seconds"]}>
              <input id="rapidShutdown.seconds" className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg("rapidShutdown.seconds")} />
            </LabelledInput>
          </div>
          <ResultLine result={byId("rapid-shutdown-voltage")} />
          <ResultLine result={byId("rapid-shutdown-time")} />
        </section>
      </fieldset>

      {readOnly ? (
        <p className="text-sm text-ink-faint">Read only: only the assigned installer or the office can change these readings.</p>
      ) : (
        <div className="sticky bottom-0 -mx-4 flex flex-wrap items-center gap-3 border-t border-paper-edge bg-paper/95 px-4 py-3 backdrop-blur sm:mx-0 sm:rounded sm:border">
          <Button type="button" variant="secondary" onClick={() => void saveNow(false)}>
            Save readings
          </Button>
          <Button type="button" onClick={() => void saveNow(true)}>
            Mark complete
          </Button>
          <span role="status" data-testid="save-state" className={clsx("text-sm", save.kind === "error" || save.kind === "refused" ? "text-result-fail" : "text-ink-faint")}>
            {save.text}
          </span>
        </div>
      )}
    </form>
  );
}

function LabelledInput({ label, htmlFor, unit, error, children }: { label: string; htmlFor: string; unit?: string; error?: string; children: React.ReactNode }) {
  return (
    <div>
      <label className="label" htmlFor={htmlFor}>
        {label}
        {unit ? <span className="text-ink-faint"> ({unit})</span> : null}
      </label>
      {children}
      {error ? (
        <p className="mt-1 text-sm text-result-fail" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** One reading with its check right under it: the result word, what was found, and what to do. */
function Reading({ title, inputId, hint, unit, result, error, bare, children }: { title: string; inputId: string; hint?: string; unit?: string; result?: CommissioningCheck; error?: string; bare?: boolean; children: React.ReactNode }) {
  return (
    <section className={clsx("space-y-2", !bare && "panel")} aria-label={title}>
      <LabelledInput label={title} htmlFor={inputId} unit={unit} error={error}>
        {children}
      </LabelledInput>
      {hint ? <p className="text-xs text-ink-soft">{hint}</p> : null}
      <ResultLine result={result} />
    </section>
  );
}

function ResultLine({ result }: { result?: CommissioningCheck }) {
  if (!result) return null;
  return (
    <div className="flex items-start gap-2" data-testid={`result-${result.id}`} data-status={result.status} data-reading={result.reading}>
      <CheckStatusChip status={result.status} />
      <div className="min-w-0 text-sm">
        <p className="text-ink-soft">{result.message}</p>
        {result.fix ? <p className="text-copper-dark">What to do: {result.fix}</p> : null}
        <p className="text-xs text-ink-faint">{result.clause}</p>
      </div>
    </div>
  );
}
