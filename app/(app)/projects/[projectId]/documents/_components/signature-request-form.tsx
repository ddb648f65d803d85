"use client";

import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SIGNING_LINK_DAYS } from "@/lib/domain/signature-requests";
import type { SignedDocumentKind } from "@/lib/domain/stored-values";
import type { requestSignaturesAction } from "../signature-actions";

/** A document the coordinator may put up for signatures: `packetId` for a packet revision's application. */
export type SignableDocument = { value: string; label: string; kind: SignedDocumentKind; packetId?: string };

type Person = { name: string; email: string };

function PersonFields({
  legend,
  idPrefix,
  person,
  onChange,
  error,
}: {
  legend: string;
  idPrefix: string;
  person: Person;
  onChange: (p: Person) => void;
  error: (field: keyof Person) => string | undefined;
}) {
  return (
    <fieldset className="grid gap-3 sm:grid-cols-2">
      <legend className="label">{legend}</legend>
      {(["name", "email"] as const).map((field) => (
        <Field key={field} label={field === "name" ? "Name" : "E-mail"} htmlFor={`${idPrefix}-${field}`} error={error(field)}>
          <input
            id={`${idPrefix}-${field}`}
            className="input"
            type={field === "email" ? "email" : "text"}
            value={person[field]}
            onChange={(e) => onChange({ ...person, [field]: e.target.value })}
          />
        </Field>
      ))}
    </fieldset>
  );
}

/** Chooses the document and the signers (the project's customer filled in, a second owner if any) and sends each a link. */
export function SignatureRequestForm({
  projectId,
  documents,
  customer,
  onCreated,
  request,
}: {
  projectId: string;
  documents: SignableDocument[];
  customer: Person;
  onCreated: () => void;
  request: typeof requestSignaturesAction;
}) {
  const [documentValue, setDocumentValue] = useState(documents[0]?.value ?? "");
  const [owner, setOwner] = useState<Person>(customer);
  const [second, setSecond] = useState<Person | null>(null);
  const [days, setDays] = useState(String(SIGNING_LINK_DAYS.default));
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string>();
  const [sent, setSent] = useState<string>();
  const [pending, startTransition] = useTransition();
  const chosen = documents.find((d) => d.value === documentValue);
  const error = (path: string) => errors[`request.${path}`]?.[0];

  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    if (!chosen) return;
    startTransition(async () => {
      const signers = [{ role: "customer" as const, ...owner }, ...(second ? [{ role: "second-owner" as const, ...second }] : [])];
      const result = await request({
        projectId,
        request: { document: chosen.kind, packetId: chosen.packetId, signers, expiresInDays: Number(days) },
      });
      if (!result.ok) {
        setErrors(result.fieldErrors ?? {});
        setMessage(result.message);
        setSent(undefined);
        return;
      }
      setErrors({});
      setMessage(undefined);
      setSent(`Links queued by e-mail to ${signers.map((s) => s.email).join(" and ")}.`);
      setSecond(null);
      onCreated();
    });
  };

  if (documents.length === 0)
    return <p className="text-sm text-ink-faint">Nothing to sign yet: generate the interconnection packet, or record the field work.</p>;
  return (
    <form className="space-y-3" onSubmit={submit} noValidate data-testid="signature-request-form">
      <Field label="Document" htmlFor="sign-document" error={error("packetId") ?? error("document")}>
        <select id="sign-document" className="input" value={documentValue} onChange={(e) => setDocumentValue(e.target.value)}>
          {documents.map((d) => (
            <option key={d.value} value={d.value}>
              {d.label}
            </option>
          ))}
        </select>
      </Field>
      <PersonFields
        legend="Customer (account holder)"
        idPrefix="sign-owner"
        person={owner}
        onChange={setOwner}
        error={(f) => error(`signers.0.${f}`)}
      />
      {second ? (
        <PersonFields
          legend="Second owner"
          idPrefix="sign-second"
          person={second}
          onChange={setSecond}
          error={(f) => error(`signers.1.${f}`)}
        />
      ) : null}
      <div className="flex flex-wrap items-end gap-3">
        <Button type="button" variant="secondary" onClick={() => setSecond(second ? null : { name: "", email: "" })}>
          {second ? "No second owner" : "Add a second owner"}
        </Button>
        <Field label="Days the links stay open" htmlFor="sign-days" error={error("expiresInDays")}>
          <input
            id="sign-days"
            className="input w-24"
            type="number"
            min={SIGNING_LINK_DAYS.min}
            max={SIGNING_LINK_DAYS.max}
            value={days}
            onChange={(e) => setDays(e.target.value)}
          />
        </Field>
      </div>
      {errors["request.signers"] ? <p className="text-sm text-result-fail">{errors["request.signers"][0]}</p> : null}
      <FormMessage kind="error">{message}</FormMessage>
      {sent ? (
        <p className="text-sm" role="status">
          {sent}
        </p>
      ) : null}
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Ask for signatures"}
      </Button>
    </form>
  );
}
