"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { LocalTime } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { centsToDollarsText, formatUsd } from "@/lib/fees/money";
import type { PaymentDto } from "@/lib/server/data/project-fees";
import { refundPaymentAction } from "../actions";

const STATUS_TEXT: Record<PaymentDto["status"], string> = { pending: "Waiting for payment", paid: "Paid", expired: "Not completed", partially_refunded: "Partly refunded", refunded: "Refunded" };

const when = (iso: string) => <LocalTime iso={iso} />;

export function PaymentHistory({ payments, canRefund }: { payments: PaymentDto[]; canRefund: boolean }) {
  if (payments.length === 0) return null;
  return (
    <section className="panel space-y-3" aria-labelledby="payments-heading">
      <h2 id="payments-heading">Payments</h2>
      <ul className="divide-y divide-paper-edge/70">
        {payments.map((p) => (
          <li key={p.id} className="space-y-1 py-3" data-testid="payment" data-status={p.status}>
            <div className="flex flex-wrap items-baseline gap-x-4">
              <span className="measure font-semibold">{formatUsd(p.amountCents)}</span>
              <span className="text-sm font-medium" data-testid="payment-status">
                {STATUS_TEXT[p.status]}
              </span>
              <span className="text-xs text-ink-faint">
                {p.paidAt ? <>paid {when(p.paidAt)}</> : <>started {when(p.createdAt)}</>} by {p.createdBy ?? "someone"}
                {p.card ? ` · ${p.card}` : ""}
              </span>
              {p.hasReceipt ? (
                <a className="text-sm" href={`/api/v1/payments/${p.id}/receipt`} download>
                  Receipt {p.receiptNumber}
                </a>
              ) : null}
            </div>
            <p className="text-sm text-ink-soft">{p.lines.map((l) => `${l.authority}: ${l.name} ${formatUsd(l.amountCents)}`).join(" · ")}</p>
            {p.failureMessage && p.status !== "paid" ? (
              <p className="text-sm text-result-fail" role="alert" data-testid="payment-failure">
                Last attempt: {p.failureMessage} The fees stay unpaid; pay again with another card.
              </p>
            ) : null}
            {p.refunds.length ? (
              <ul className="text-sm text-ink-soft" data-testid="refunds">
                {p.refunds.map((r) => (
                  <li key={r.id} data-failed={r.failed || undefined}>
                    Refunded <span className="measure">{formatUsd(r.amountCents)}</span> on {when(r.createdAt)}
                    {r.createdBy ? ` by ${r.createdBy}` : ""}
                    {r.reason ? `: ${r.reason}` : ""}
                    {r.failed ? " — the processor could not return this money, so it is not counted as refunded" : null}
                  </li>
                ))}
              </ul>
            ) : null}
            {canRefund && (p.status === "paid" || p.status === "partially_refunded") ? <RefundForm payment={p} /> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}

function RefundForm({ payment }: { payment: PaymentDto }) {
  const router = useRouter();
  const left = payment.amountCents - payment.refundedCents;
  const [open, setOpen] = useState(false);
  const [amount, setAmount] = useState(centsToDollarsText(left));
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Record<string, string[] | undefined>>({});
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  if (!open) {
    return (
      <Button type="button" variant="quiet" onClick={() => setOpen(true)}>
        Refund…
      </Button>
    );
  }
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    setMessage(undefined);
    startTransition(async () => {
      const result = await refundPaymentAction({ paymentId: payment.id, amount, reason });
      if (!result.ok) {
        setErrors(result.fieldErrors ?? {});
        setMessage(result.message);
        return;
      }
      setOpen(false);
      router.refresh();
    });
  };
  return (
    <form onSubmit={submit} className="grid gap-2 rounded border border-paper-edge bg-paper/60 p-3 sm:grid-cols-[10rem_1fr_auto] sm:items-end" aria-label="Refund">
      <div>
        <label className="label" htmlFor={`refund-amount-${payment.id}`}>
          Refund amount ($)
        </label>
        <input id={`refund-amount-${payment.id}`} className="input measure" inputMode="decimal" value={amount} onChange={(e) => setAmount(e.target.value)} />
        {errors.amount ? <p className="mt-1 text-sm text-result-fail">{errors.amount[0]}</p> : <p className="mt-1 text-xs text-ink-faint">Up to {formatUsd(left)}</p>}
      </div>
      <div>
        <label className="label" htmlFor={`refund-reason-${payment.id}`}>
          Reason
        </label>
        <input id={`refund-reason-${payment.id}`} className="input" value={reason} onChange={(e) => setReason(e.target.value)} />
        {errors.reason ? <p className="mt-1 text-sm text-result-fail">{errors.reason[0]}</p> : null}
      </div>
      <Button type="submit" variant="danger" disabled={pending}>
        {pending ? "Refunding…" : "Refund"}
      </Button>
      {message ? (
        <p className="text-sm text-result-fail sm:col-span-3" role="alert">
          {message}
        </p>
      ) : null}
    </form>
  );
}
