"use client";

import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SHARE_LINK_DAYS } from "@/lib/schemas/share-link";
import { createShareLinkAction } from "../share-actions";

export type ShareableRevision = { packetId: string; label: string };

/** Chooses ready revisions and makes a link; the link is shown here once and never again. */
export function ShareLinkForm({ projectId, revisions, onCreated }: { projectId: string; revisions: ShareableRevision[]; onCreated: () => void }) {
  const [chosen, setChosen] = useState<string[]>([]);
  const [recipientEmail, setRecipientEmail] = useState("");
  const [expiresInDays, setExpiresInDays] = useState(String(SHARE_LINK_DAYS.default));
  const [note, setNote] = useState("");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string>();
  const [created, setCreated] = useState<{ url: string; recipient: string | null }>();
  const [pending, startTransition] = useTransition();

  const toggle = (id: string) => setChosen((c) => (c.includes(id) ? c.filter((x) => x !== id) : [...c, id]));
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    startTransition(async () => {
      setMessage(undefined);
      const result = await createShareLinkAction({ projectId, packetIds: chosen, recipientEmail, expiresInDays: Number(expiresInDays), note });
      if (!result.ok) {
        setErrors(result.fieldErrors ?? {});
        setMessage(result.message);
        return;
      }
      setErrors({});
      setCreated({ url: result.data.url, recipient: result.data.link.recipientEmail });
      setChosen([]);
      setNote("");
      setRecipientEmail("");
      onCreated();
    });
  };

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
        {errors.packetIds ? <p className="text-sm text-result-fail" role="alert">{errors.packetIds[0]}</p> : null}
      </fieldset>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Inspector's e-mail (optional)" htmlFor="share-recipient" error={errors.recipientEmail?.[0]} hint="We e-mail the link when you fill this in.">
          <input id="share-recipient" className="input" type="email" value={recipientEmail} onChange={(e) => setRecipientEmail(e.target.value)} />
        </Field>
        <Field label="Days until the link expires" htmlFor="share-days" error={errors.expiresInDays?.[0]} hint={`${SHARE_LINK_DAYS.min} to ${SHARE_LINK_DAYS.max} days`}>
          <input id="share-days" className="input" type="number" min={SHARE_LINK_DAYS.min} max={SHARE_LINK_DAYS.max} value={expiresInDays} onChange={(e) => setExpiresInDays(e.target.value)} />
        </Field>
      </div>
      <Field label="Note for the inspector (optional)" htmlFor="share-note" error={errors.note?.[0]}>
        <textarea id="share-note" className="input" rows={2} maxLength={1000} value={note} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <FormMessage kind="error">{message}</FormMessage>
      <Button type="submit" disabled={pending || chosen.length === 0}>
        {pending ? "Creating…" : "Create link"}
      </Button>
      {created ? (
        <div className="space-y-1 rounded border border-copper/40 p-3" data-testid="new-share-link">
          <p className="text-sm">{created.recipient ? `Link created and e-mailed to ${created.recipient}.` : "Link created."} Copy it now: it is shown only once.</p>
          <input className="input measure" aria-label="New link" readOnly value={created.url} onFocus={(e) => e.currentTarget.select()} />
          <Button type="button" variant="secondary" onClick={() => navigator.clipboard?.writeText(created.url)}>
            Copy link
          </Button>
        </div>
      ) : null}
    </form>
  );
}
