"use client";

import { LocalTime } from "@/components/time/local-time";
import { formatUsd } from "@/lib/fees/money";
import type { PaymentDto } from "@/lib/dto/fees";
import { RefundForm } from "./refund-form";
import type { refundPaymentAction } from "../actions";

const STATUS_TEXT: Record<PaymentDto["status"], string> = {
  pending: "Waiting for payment",
  paid: "Paid",
  expired: "Not completed",
  partially_refunded: "Partly refunded",
  refunded: "Refunded",
};

const when = (iso: string) => <LocalTime iso={iso} />;

export function PaymentHistory({
  payments,
  canRefund,
  refund,
}: {
  payments: PaymentDto[];
  canRefund: boolean;
  refund: typeof refundPaymentAction;
}) {
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
            <p className="text-sm text-ink-soft">
              {p.lines.map((l) => `${l.authority}: ${l.name} ${formatUsd(l.amountCents)}${l.refunded ? " (refunded)" : ""}`).join(" · ")}
            </p>
            {p.failureStillOpen ? (
              <p className="text-sm text-result-fail" role="alert" data-testid="payment-failure">
                Last attempt: {p.failureMessage} The fees stay unpaid; pay again with another card.
              </p>
            ) : null}
            {p.refunds.length ? (
              <ul className="text-sm text-ink-soft" data-testid="refunds">
                {p.refunds.map((r) => (
                  <li key={r.id} data-failed={r.failed || undefined}>
                    Refunded <span className="measure">{formatUsd(r.amountCents)}</span>
                    {r.lineNames.length ? ` for ${r.lineNames.join(", ")}` : ""} on {when(r.createdAt)}
                    {r.createdBy ? ` by ${r.createdBy}` : ""}
                    {r.reason ? `: ${r.reason}` : ""}
                    {r.failed ? " — the processor could not return this money, so it is not counted as refunded" : null}
                  </li>
                ))}
              </ul>
            ) : null}
            {canRefund && (p.status === "paid" || p.status === "partially_refunded") ? <RefundForm payment={p} refund={refund} /> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
