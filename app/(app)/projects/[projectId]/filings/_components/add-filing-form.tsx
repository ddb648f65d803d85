"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { AddFilingInput } from "@/lib/schemas/filings";
import type { addFilingAction } from "../actions";
import { useFilingForm } from "./use-filing-form";

type Values = { projectId: string; title: string; authority: string; authorityName: string };

// Approvals a residential PV job commonly needs besides the permit and the interconnection (common practice).
const USUAL_TITLES = [
  "HOA approval",
  "Separate electrical permit",
  "Utility pre-approval",
  "Fire department review",
  "Historic district review",
];

/** Another approval the project needs: from an AHJ or utility profile, or a body named here. */
export function AddFilingForm({
  projectId,
  authorities,
  add,
}: {
  projectId: string;
  authorities: { value: string; label: string }[];
  add: typeof addFilingAction;
}) {
  const blank = { projectId, title: "", authority: "other", authorityName: "" };
  const { form, submit, message, errors, busy } = useFilingForm<Values, { filingId: string }>(
    AddFilingInput,
    blank,
    (raw) => add(raw),
    (saved) => saved.reset(blank),
  );
  const other = form.watch("authority") === "other";
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Add a filing">
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Approval" htmlFor="add-filing-title" error={errors.title?.message}>
          <input id="add-filing-title" className="input" list="add-filing-titles" autoComplete="off" {...form.register("title")} />
          <datalist id="add-filing-titles">
            {USUAL_TITLES.map((t) => (
              <option key={t} value={t} />
            ))}
          </datalist>
        </Field>
        <Field label="Approved by" htmlFor="add-filing-authority" error={errors.authority?.message}>
          <select id="add-filing-authority" className="input" {...form.register("authority")}>
            <option value="other">Another body (name it)</option>
            {authorities.map((a) => (
              <option key={a.value} value={a.value}>
                {a.label}
              </option>
            ))}
          </select>
        </Field>
        {other ? (
          <Field label="Name of the body" htmlFor="add-filing-name" error={errors.authorityName?.message}>
            <input id="add-filing-name" className="input" autoComplete="off" {...form.register("authorityName")} />
          </Field>
        ) : null}
      </div>
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? "Adding…" : "Add the filing"}
      </Button>
    </form>
  );
}
