"use client";
/* eslint-disable react-hooks/refs -- the refs are written only by event handlers (typing, saving); the compiler rule cannot tell the handlers that reg() and setValue() return apart from reads during render. */

import { clsx } from "clsx";
import { useEffect, useMemo, useRef, useState } from "react";
import { useForm, useWatch, type Path, type UseFormRegisterReturn } from "react-hook-form";
import { LateChecksNotice } from "@/components/forms/late-checks-notice";
import { useModuleAfterHydration } from "@/components/forms/use-module-after-hydration";
import { useTimeZone } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { shutdownWindow } from "@/lib/engineering/commissioning/shutdown-string";
import type { CommissioningFacts } from "@/lib/field/commissioning-facts";
import { formatInZone } from "@/lib/domain/time-zones";
import type { CommissioningReadings } from "@/lib/schemas/commissioning";
import type { saveCommissioningAction } from "../actions";
import { BeforeEnergizingStep } from "./before-energizing-step";
import { toFormValues, toReadingsInput, type FormValues } from "./form-values";
import type { LiveRecord } from "./live-record";
import { GridProfileStep } from "./grid-profile-step";
import { InverterStep } from "./inverter-step";
import { PairingStep } from "./pairing-step";
import { LabelledInput, Reading, ResultLine, Step } from "./reading-parts";
import { fmtV, type StepProps } from "./step-props";
import { StorageStep } from "./storage-step";

type SaveState = { kind: "idle" | "saving" | "saved" | "error" | "refused"; text: string };
const AUTOSAVE_MS = 1500;

function savedText(updatedAt: string | null, timeZone: string) {
  return updatedAt ? `Saved ${formatInZone(updatedAt, timeZone, "time")}` : "Not saved yet";
}

export function CommissioningForm(props: {
  projectId: string;
  facts: CommissioningFacts;
  initialReadings: CommissioningReadings;
  /** The saved readings' checks, worked out by the page, shown until the form's own checker has loaded. */
  initialCheck: LiveRecord;
  initialStatus: "open" | "complete";
  initialUpdatedAt: string | null;
  readOnly: boolean;
  save: typeof saveCommissioningAction;
}) {
  const { projectId, facts, readOnly } = props;
  const form = useForm<FormValues>({ defaultValues: toFormValues(props.initialReadings, facts.acceptedGridProfiles) });
  const values = useWatch({ control: form.control }) as FormValues;
  const [status, setStatus] = useState(props.initialStatus);
  const timeZone = useTimeZone();
  const [save, setSave] = useState<SaveState>({ kind: "idle", text: savedText(props.initialUpdatedAt, timeZone) });
  const typed = useRef(false);
  const autosave = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const latest = useRef(0); // only the newest save's answer is shown

  // The checker (the readings' schema and the checks) loads after the form is on screen; until then, and
  // while nothing was changed, the page's checks of the saved readings stand.
  const checker = useModuleAfterHydration(() => import("./live-record"));
  const { isDirty } = form.formState;
  const { errors, results, completion } = useMemo(
    () => (typeof checker === "object" && isDirty ? checker.module.checkLiveRecord(values, facts) : props.initialCheck),
    [checker, isDirty, values, facts, props.initialCheck],
  );
  const byId = (id: string) => results.find((r) => r.id === id);

  async function saveNow(complete = false) {
    if (readOnly) return;
    // An explicit save supersedes the autosave waiting to fire, so its answer is the one shown.
    clearTimeout(autosave.current);
    typed.current = false;
    setSave({ kind: "saving", text: "Saving…" });
    const mine = ++latest.current;
    const result = await props.save({ projectId, readings: toReadingsInput(form.getValues()), complete });
    if (mine !== latest.current) return;
    if (!result.ok) {
      setSave({ kind: "error", text: `Not saved: ${result.message} Your readings stay on this page.` });
      return;
    }
    setStatus(result.data.status);
    if (result.data.completeRefused) setSave({ kind: "refused", text: result.data.completeRefused });
    else
      setSave({
        kind: "saved",
        text: result.data.status === "complete" && complete ? "Saved and marked complete." : savedText(result.data.updatedAt, timeZone),
      });
  }

  // Save a moment after typing stops, so a dropped signal on site loses at most the last few seconds.
  useEffect(() => {
    if (readOnly || !typed.current) return;
    autosave.current = setTimeout(() => void saveNow(), AUTOSAVE_MS);
    return () => clearTimeout(autosave.current);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- values is the trigger
  }, [values]);

  const reg = (name: Path<FormValues>): UseFormRegisterReturn => form.register(name, { onChange: () => (typed.current = true) });
  const setValue: StepProps["setValue"] = (name, value, options) => {
    typed.current = true;
    form.setValue(name, value, options);
  };
  // Steps appear in the order of the work; each gets the next number.
  let step = 0;
  const props_ = (): StepProps => ({ number: ++step, facts, values, errors, byId, reg, setValue });

  return (
    <form onSubmit={(e) => e.preventDefault()} noValidate className="space-y-4" aria-label="Commissioning record">
      <div className="panel flex flex-wrap items-center gap-3" data-testid="commissioning-status">
        <h2 className="text-base">Commissioning record</h2>
        <span
          className={clsx(
            "rounded border px-2 py-0.5 text-xs font-semibold uppercase tracking-wide",
            status === "complete"
              ? "border-result-pass/40 bg-result-pass/10 text-result-pass"
              : "border-paper-edge bg-paper-deep text-ink-soft",
          )}
        >
          {status === "complete" ? "Complete" : "Open"}
        </span>
        <span className="measure text-sm text-ink-soft" data-testid="completion-counts">
          {completion.failing.length} failing · {completion.missing.length} to record
          {completion.waiting.length ? ` · ${completion.waiting.length} waiting` : ""}
        </span>
      </div>
      <LateChecksNotice state={checker} changed={isDirty} shown="the readings as last saved" />

      <fieldset disabled={readOnly} className="space-y-4">
        {facts.stringTests.length ? <BeforeEnergizingStep {...props_()} /> : null}
        {facts.inverters.length ? <InverterStep {...props_()} /> : null}
        <GridProfileStep {...props_()} />
        {facts.pairing ? <PairingStep {...props_()} /> : null}

        {facts.strings.length > 0 ? (
          <Step
            id="shutdown"
            number={++step}
            title="String voltages with the array shut down"
            intro={
              <p>
                Operate the rapid shutdown initiator and wait for the inverter to report a safe DC voltage, then measure each string at the
                inverter.
              </p>
            }
          >
            {facts.strings.map((fact) => {
              const i = values.strings.findIndex((s) => s.id === fact.id);
              if (i < 0) return null;
              const window = shutdownWindow(fact.devicesInSeries, fact.perDeviceV);
              const hint = `${fact.devicesInSeries} devices × ${fmtV(fact.perDeviceV ?? 1)} V: expect about ${fmtV(window.expectedV)} V (${fmtV(window.lowV)} to ${fmtV(window.highV)} V).`;
              return (
                <Reading
                  key={fact.id}
                  title={`String ${fact.id}`}
                  inputId={`strings.${i}.measuredV`}
                  hint={hint}
                  result={byId(`string-shutdown:${fact.id}`)}
                  error={errors[`strings.${i}.measuredV`]}
                  unit="V"
                  bare
                >
                  <input
                    id={`strings.${i}.measuredV`}
                    data-expected-v={window.expectedV}
                    className="input measure text-base"
                    inputMode="decimal"
                    autoComplete="off"
                    {...reg(`strings.${i}.measuredV`)}
                  />
                </Reading>
              );
            })}
          </Step>
        ) : null}

        <Step
          id="ac-voltage"
          number={++step}
          title="AC voltage at the point of connection"
          intro={<p>Measure at the PV breaker or the supply-side connection, before the inverter starts exporting.</p>}
        >
          <Reading
            title="AC voltage"
            inputId="acVoltageV"
            hint={`Nominal service ${facts.nominalServiceV} V.`}
            result={byId("ac-voltage")}
            error={errors.acVoltageV}
            unit="V"
            bare
          >
            <input id="acVoltageV" className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg("acVoltageV")} />
          </Reading>
        </Step>

        <Step id="first-power" number={++step} title="First power">
          <div className="grid gap-3 sm:grid-cols-2">
            <LabelledInput label="AC output" htmlFor="firstPowerW" unit="W" error={errors.firstPowerW}>
              <input
                id="firstPowerW"
                data-rating-w={facts.acRatingW}
                className="input measure text-base"
                inputMode="decimal"
                autoComplete="off"
                {...reg("firstPowerW")}
              />
            </LabelledInput>
            <LabelledInput label="Time of day (24-hour)" htmlFor="firstPowerTime" error={errors.firstPowerTime}>
              <input id="firstPowerTime" type="time" className="input measure text-base" {...reg("firstPowerTime")} />
            </LabelledInput>
          </div>
          <ResultLine result={byId("first-power")} />
        </Step>

        {facts.moduleMonitoring ? (
          <Step id="modules-reporting" number={++step} title="Modules reporting">
            <Reading
              title="Modules reporting in the monitoring"
              inputId="modulesReporting"
              hint={`${facts.modulesInstalled} modules installed. Every one must report before the record is complete.`}
              result={byId("modules-reporting")}
              error={errors.modulesReporting}
              unit="modules"
              bare
            >
              <input
                id="modulesReporting"
                data-installed={facts.modulesInstalled}
                className="input measure text-base"
                inputMode="numeric"
                autoComplete="off"
                {...reg("modulesReporting")}
              />
            </Reading>
          </Step>
        ) : (
          <p className="px-1 text-sm text-ink-soft" data-testid="no-module-monitoring">
            This system has no module-level monitoring, so there is no count of modules reporting to record.
          </p>
        )}

        <Step
          id="rapid-shutdown"
          number={++step}
          title="Rapid shutdown test"
          intro={<p>Operate the rapid shutdown initiator, then read the voltage on the PV conductors and how long it took to fall.</p>}
        >
          <LabelledInput label="Where the conductors were read" htmlFor="rapidShutdown.boundary">
            <select id="rapidShutdown.boundary" className="input text-base" {...reg("rapidShutdown.boundary")}>
              <option value="outside">Outside the array boundary (30 V limit)</option>
              <option value="inside">Inside the array boundary (80 V limit)</option>
            </select>
          </LabelledInput>
          <div className="grid gap-3 sm:grid-cols-2">
            <LabelledInput label="Voltage reached" htmlFor="rapidShutdown.measuredV" unit="V" error={errors["rapidShutdown.measuredV"]}>
              <input
                id="rapidShutdown.measuredV"
                className="input measure text-base"
                inputMode="decimal"
                autoComplete="off"
                {...reg("rapidShutdown.measuredV")}
              />
            </LabelledInput>
            <LabelledInput label="Seconds to reach it" htmlFor="rapidShutdown.seconds" unit="s" error={errors["rapidShutdown.seconds"]}>
              <input
                id="rapidShutdown.seconds"
                className="input measure text-base"
                inputMode="decimal"
                autoComplete="off"
                {...reg("rapidShutdown.seconds")}
              />
            </LabelledInput>
          </div>
          <ResultLine result={byId("rapid-shutdown-voltage")} />
          <ResultLine result={byId("rapid-shutdown-time")} />
        </Step>

        {facts.storage ? <StorageStep {...props_()} /> : null}
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
          <span
            role="status"
            data-testid="save-state"
            className={clsx("text-sm", save.kind === "error" || save.kind === "refused" ? "text-result-fail" : "text-ink-faint")}
          >
            {save.text}
          </span>
        </div>
      )}
    </form>
  );
}
