"use client";

import { clsx } from "clsx";
import dynamic from "next/dynamic";
import { useEffect, useMemo, useRef, useState } from "react";
import { FormProvider, useForm, useWatch } from "react-hook-form";
import { LateChecksNotice } from "@/components/forms/late-checks-notice";
import { useModuleAfterHydration } from "@/components/forms/use-module-after-hydration";
import { Button } from "@/components/ui/button";
import { editorValues } from "@/lib/design/defaults";
import type { EditorChecks } from "@/lib/design/editor-checks";
import type { SiteConditions } from "@/lib/design/to-engine";
import type { DesignDraft, DesignFormValues } from "@/lib/schemas/design";
import { DESIGN_STEPS } from "@/lib/schemas/design-options";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import type { saveDesignAction } from "../actions";
import { ArrayStep } from "./array-step";
import { EquipmentStep } from "./equipment-step";
import { ReviewPanel } from "./review-panel";
import { RunsStep } from "./runs-step";
import { ServiceStep } from "./service-step";
import { StorageStep } from "./storage-step";
import type { Issues } from "./design-fields";

type SaveState = { kind: "idle" | "saving" | "saved" | "error"; text: string };
const AUTOSAVE_MS = 1200;

// The diagram and the conductor schedule load when the Review step opens; the placeholder holds the step's room meanwhile.
const ReviewStep = dynamic(() => import("./review-step").then((m) => m.ReviewStep), {
  loading: () => (
    <p className="min-h-[36rem] text-sm text-ink-faint" role="status" data-testid="review-step-loading">
      Loading the review…
    </p>
  ),
});

/** Whether a field path is marked dirty in react-hook-form's nested dirtyFields. */
function isDirty(dirty: unknown, path: string): boolean {
  let node = dirty;
  for (const key of path.split(".")) {
    if (node === true) return true;
    if (!node || typeof node !== "object") return false;
    node = (node as Record<string, unknown>)[key];
  }
  return Boolean(node);
}

export function DesignEditor(props: {
  projectId: string;
  initialDraft: DesignDraft;
  initialRevision: number;
  /** The checks of the initial draft, worked out on the server: shown until the live checks have loaded. */
  initialChecks: EditorChecks;
  catalog: EquipmentDto[];
  conditions: SiteConditions | null;
  readOnly: boolean;
  save: typeof saveDesignAction;
}) {
  const { projectId, catalog, conditions, readOnly } = props;
  const form = useForm<DesignFormValues>({ defaultValues: editorValues(props.initialDraft) });
  const values = useWatch({ control: form.control });
  const [step, setStep] = useState(0);
  const [visited, setVisited] = useState<Set<number>>(() => new Set(props.initialRevision > 0 ? [0, 1, 2, 3, 4] : []));
  const [save, setSave] = useState<SaveState>({
    kind: "idle",
    text: props.initialRevision ? `Saved, revision ${props.initialRevision}` : "Not saved yet",
  });
  const pending = useRef(false);

  // The engine and the schema load after hydration, off the first-load path; until then the server's checks
  // of the initial draft stand, which are what they would compute for an untouched form.
  const liveCheck = useModuleAfterHydration(() => import("@/lib/design/editor-checks"));
  const checks = useMemo(
    () => (typeof liveCheck === "object" ? liveCheck.module.checkEditorValues(values, catalog, conditions) : props.initialChecks),
    [liveCheck, values, catalog, conditions, props.initialChecks],
  );
  const { outcome } = checks;
  const { dirtyFields, isDirty: changed } = form.formState;
  const stale = typeof liveCheck !== "object" && changed;
  const issues: Issues = useMemo(() => {
    const out: Issues = {};
    for (const { path, message } of checks.issues) {
      const stepIndex = DESIGN_STEPS.findIndex((s) => path.startsWith(s.key));
      // A fresh form is not a list of errors: show a field's problem once it was typed in or its step was left.
      if (!(path in out) && (visited.has(stepIndex) || isDirty(dirtyFields, path))) out[path] = message;
    }
    return out;
  }, [checks, visited, dirtyFields]);

  async function saveNow() {
    if (readOnly) return;
    pending.current = false;
    setSave({ kind: "saving", text: "Saving…" });
    const result = await props.save({ projectId, draft: form.getValues() as Record<string, unknown> });
    if (result.ok) setSave({ kind: "saved", text: `Saved, revision ${result.data.revision}` });
    else setSave({ kind: "error", text: `Not saved: ${result.message} Your input stays on this page.` });
  }

  // Save a moment after typing stops.
  useEffect(() => {
    if (readOnly || !form.formState.isDirty) return;
    pending.current = true;
    const timer = setTimeout(() => void saveNow(), AUTOSAVE_MS);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- values is the trigger
  }, [values]);

  // Leaving the page before the autosave fired still keeps what was typed: the
  // last draft goes out with a keepalive request that outlives the page.
  useEffect(() => {
    if (readOnly) return;
    const flush = () => {
      if (!pending.current) return;
      pending.current = false;
      void fetch(`/api/v1/projects/${projectId}/design`, {
        method: "PUT",
        keepalive: true,
        headers: { "content-type": "application/json" },
        body: JSON.stringify(form.getValues()),
      });
    };
    window.addEventListener("pagehide", flush);
    return () => {
      window.removeEventListener("pagehide", flush);
      flush(); // client-side navigation unmounts the editor
    };
  }, [form, projectId, readOnly]);

  const goTo = (next: number) => {
    setVisited((v) => new Set(v).add(step));
    setStep(next);
  };

  return (
    <FormProvider {...form}>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-4">
          <nav aria-label="Design steps" className="flex flex-wrap gap-1">
            {DESIGN_STEPS.map((s, i) => (
              <button
                key={s.key}
                type="button"
                onClick={() => goTo(i)}
                aria-current={i === step ? "step" : undefined}
                className={clsx(
                  "rounded px-3 py-1.5 text-sm",
                  i === step ? "bg-copper text-white" : "bg-paper-deep text-ink-soft hover:bg-paper-edge",
                )}
              >
                <span className="measure">{i + 1}.</span> {s.title}
              </button>
            ))}
          </nav>
          <form onSubmit={(e) => e.preventDefault()} className="panel" noValidate>
            <fieldset disabled={readOnly} className="min-w-0 space-y-4">
              <h2>{DESIGN_STEPS[step].title}</h2>
              {step === 0 ? <EquipmentStep catalog={catalog} issues={issues} /> : null}
              {step === 1 ? <ArrayStep issues={issues} /> : null}
              {step === 2 ? <ServiceStep issues={issues} /> : null}
              {step === 3 ? <RunsStep issues={issues} countedConductors={checks.countedConductors} /> : null}
              {step === 4 ? <StorageStep catalog={catalog} issues={issues} /> : null}
              {step === 5 ? <ReviewStep outcome={outcome} onGoToStep={goTo} /> : null}
            </fieldset>
          </form>
          <div className="flex flex-wrap items-center gap-3">
            <Button type="button" variant="secondary" disabled={step === 0} onClick={() => goTo(step - 1)}>
              Back
            </Button>
            <Button type="button" disabled={step === DESIGN_STEPS.length - 1} onClick={() => goTo(step + 1)}>
              Next
            </Button>
            {readOnly ? (
              <span className="text-sm text-ink-faint">Read only: your role cannot change the design.</span>
            ) : (
              <>
                <Button type="button" variant="quiet" onClick={() => void saveNow()}>
                  Save now
                </Button>
                <span
                  role="status"
                  data-testid="save-state"
                  className={clsx("text-sm", save.kind === "error" ? "text-result-fail" : "text-ink-faint")}
                >
                  {save.text}
                </span>
              </>
            )}
          </div>
        </div>
        {step < DESIGN_STEPS.length - 1 ? (
          <aside className="panel h-fit lg:sticky lg:top-4" aria-label="Live review" aria-busy={stale}>
            <h2 className="mb-2">Live review</h2>
            <LateChecksNotice state={liveCheck} changed={changed} shown="the design as it opened" />
            <ReviewPanel outcome={outcome} onGoToStep={goTo} />
          </aside>
        ) : null}
      </div>
    </FormProvider>
  );
}
