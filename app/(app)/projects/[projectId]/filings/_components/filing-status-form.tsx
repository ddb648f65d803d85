"use client";

import { useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { FILING_STATUS_LABELS, SUBMISSION_CHANNELS, SUBMISSION_CHANNEL_LABELS, type FilingStatus } from "@/lib/domain/filings";
import { ChangeFilingStatusInput } from "@/lib/schemas/filings";
import type { changeFilingStatusAction } from "../actions";
import { useFilingForm } from "./use-filing-form";

type Values = {
  filingId: string;
  status: string;
  on: string;
  referenceNumber: string;
  packetId: string;
  channel: string;
  sentTo: string;
  note: string;
  unsignedReason: string;
};

/**
 * Moves a filing on: to submitted with the revision sent, to approved with the authority's number, and so
 * on. Only the statuses the filing may take next are offered; corrections are recorded as a round below.
 */
export function FilingStatusForm(props: {
  filingId: string;
  nextStatuses: FilingStatus[];
  referenceNumber: string | null;
  revisions: { id: string; label: string }[];
  today: string;
  change: typeof changeFilingStatusAction;
  /** The interconnection application carries the customer's signature: filing it unsigned needs a reason. */
  asksCustomerSignature?: boolean;
}) {
  const { filingId, nextStatuses, today } = props;
  const first = nextStatuses[0] ?? "";
  const { form, submit, message, errors, busy } = useFilingForm<Values, { status: string }>(
    ChangeFilingStatusInput,
    {
      filingId,
      status: first,
      on: today,
      referenceNumber: props.referenceNumber ?? "",
      packetId: props.revisions[0]?.id ?? "",
      channel: "portal",
      sentTo: "",
      note: "",
      unsignedReason: "",
    },
    (raw) => props.change(raw as never),
    (saved) => saved.reset({ ...saved.getValues(), note: "" }),
  );
  const status = useWatch({ control: form.control, name: "status" }) as FilingStatus;
  const sending = status === "submitted" || status === "resubmitted";
  const id = (name: string) => `${filingId}-status-${name}`;
  if (!nextStatuses.length) return null;
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Change the filing's status">
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="New status" htmlFor={id("status")} error={errors.status?.message}>
          <select id={id("status")} className="input" {...form.register("status")}>
            {nextStatuses.map((s) => (
              <option key={s} value={s}>
                {FILING_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </Field>
        <Field label="On" htmlFor={id("on")} error={errors.on?.message}>
          <input id={id("on")} type="date" className="input" {...form.register("on")} />
        </Field>
        {status === "approved" || props.referenceNumber ? (
          <Field
            label="Reference number"
            htmlFor={id("ref")}
            error={errors.referenceNumber?.message}
            hint="Permit, application or queue number"
          >
            <input id={id("ref")} className="input measure" autoComplete="off" {...form.register("referenceNumber")} />
          </Field>
        ) : null}
      </div>
      {sending ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <Field
            label="Packet revision sent"
            htmlFor={id("packet")}
            error={errors.packetId?.message}
            hint={props.revisions.length ? undefined : "Generate the packet on the Documents page first"}
          >
            <select id={id("packet")} className="input" {...form.register("packetId")}>
              <option value="">Choose a revision</option>
              {props.revisions.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.label}
                </option>
              ))}
            </select>
          </Field>
          {status === "submitted" ? (
            <>
              <Field label="Sent by" htmlFor={id("channel")} error={errors.channel?.message}>
                <select id={id("channel")} className="input" {...form.register("channel")}>
                  {SUBMISSION_CHANNELS.map((c) => (
                    <option key={c} value={c}>
                      {SUBMISSION_CHANNEL_LABELS[c]}
                    </option>
                  ))}
                </select>
              </Field>
              <Field label="Sent to" htmlFor={id("to")} error={errors.sentTo?.message} hint="A desk, a person or an address">
                <input id={id("to")} className="input" {...form.register("sentTo")} />
              </Field>
            </>
          ) : null}
        </div>
      ) : null}
      {status === "submitted" && props.asksCustomerSignature ? (
        <Field
          label="If the customer has not signed it here: why it goes anyway"
          htmlFor={id("unsigned")}
          error={errors.unsignedReason?.message}
          hint="Leave empty when the customer signed this revision's application by link"
        >
          <input id={id("unsigned")} className="input" {...form.register("unsignedReason")} />
        </Field>
      ) : null}
      <Field label="Note (optional)" htmlFor={id("note")} error={errors.note?.message}>
        <input id={id("note")} className="input" {...form.register("note")} />
      </Field>
      <Button type="submit" disabled={busy}>
        {busy ? "Saving…" : "Save the status"}
      </Button>
    </form>
  );
}
