"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { CreateShareLinkInput, SHARE_LINK_DAYS } from "@/lib/schemas/share-link";
import type { createShareLinkAction } from "../share-actions";

export type ShareableRevision = { packetId: string; label: string };

type Values = { packetIds: string[]; recipientEmail: string; expiresInDays: string; note: string };
const EMPTY: Values = { packetIds: [], recipientEmail: "", expiresInDays: String(SHARE_LINK_DAYS.default), note: "" };

/** Chooses ready revisions and makes a link; the link is shown here once and never again. */
export function ShareLinkForm({
  projectId,
  revisions,
  onCreated,
  create,
}: {
  projectId: string;
  revisions: ShareableRevision[];
  onCreated: () => void;
  create: typeof createShareLinkAction;
}) {
  // The shared schema checks the form here and again in the action; a refusal keeps what was typed.
  const form = useForm<Values, unknown, CreateShareLinkInput>({
    resolver: zodResolver(CreateShareLinkInput) as never,
    defaultValues: EMPTY,
  });
  const chosen = useWatch({ control: form.control, name: "packetIds" }) ?? [];
  const [created, setCreated] = useState<{ url: string; recipient: string | null }>();
  const { submit, message } = useActionSubmit(
    form,
    (raw) => create({ projectId, ...raw, expiresInDays: Number(raw.expiresInDays) }),
    (data) => {
      setCreated({ url: data.url, recipient: data.link.recipientEmail });
      form.reset({ ...EMPTY, expiresInDays: form.getValues("expiresInDays") });
      onCreated();
    },
  );
  const errors = form.formState.errors;
  // A list of checkboxes kept as one array field, so a single revision still sends a list.
  const toggle = (id: string) =>
    form.setValue("packetIds", chosen.includes(id) ? chosen.filter((x) => x !== id) : [...chosen, id], {
      shouldValidate: form.formState.isSubmitted,
    });

  if (revisions.length === 0) return <p className="text-sm text-ink-faint">Generate a packet first: only ready revisions can be shared.</p>;
  return (
    <form className="space-y-3" onSubmit={submit} noValidate>
      <fieldset className="space-y-1">
        <legend className="label">Revisions to share</legend>
        {revisions.map((r) => (
          <label key={r.packetId} className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={chosen.includes(r.packetId)} onChange={() => toggle(r.packetId)} />
            {r.label}
          </label>
        ))}
        {errors.packetIds ? (
          <p className="text-sm text-result-fail" role="alert">
            {errors.packetIds.message}
          </p>
        ) : null}
      </fieldset>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field
          label="Inspector's e-mail (optional)"
          htmlFor="share-recipient"
          error={errors.recipientEmail?.message}
          hint="We e-mail the link when you fill this in."
        >
          <input id="share-recipient" className="input" type="email" {...form.register("recipientEmail")} />
        </Field>
        <Field
          label="Days until the link expires"
          htmlFor="share-days"
          error={errors.expiresInDays?.message}
          hint={`${SHARE_LINK_DAYS.min} to ${SHARE_LINK_DAYS.max} days`}
        >
          <input
            id="share-days"
            className="input"
            type="number"
            min={SHARE_LINK_DAYS.min}
            max={SHARE_LINK_DAYS.max}
            {...form.register("expiresInDays")}
          />
        </Field>
      </div>
      <Field label="Note for the inspector (optional)" htmlFor="share-note" error={errors.note?.message}>
        <textarea id="share-note" className="input" rows={2} maxLength={1000} {...form.register("note")} />
      </Field>
      <FormMessage kind="error">{message}</FormMessage>
      <Button type="submit" disabled={form.formState.isSubmitting || chosen.length === 0}>
        {form.formState.isSubmitting ? "Creating…" : "Create link"}
      </Button>
      {created ? (
        <div className="space-y-1 rounded border border-copper/40 p-3" data-testid="new-share-link">
          <p className="text-sm">
            {created.recipient ? `Link created and e-mailed to ${created.recipient}.` : "Link created."} Copy it now: it is shown only once.
          </p>
          <input className="input measure" aria-label="New link" readOnly value={created.url} onFocus={(e) => e.currentTarget.select()} />
          <Button type="button" variant="secondary" onClick={() => navigator.clipboard?.writeText(created.url)}>
            Copy link
          </Button>
        </div>
      ) : null}
    </form>
  );
}
