"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { feeAmountText } from "@/lib/fees/line-amount";
import { formatUsd } from "@/lib/fees/money";
import type { ProjectFeeLineDto } from "@/lib/dto/fees";
import type { payFeesAction } from "../actions";

const STATE_TEXT: Record<ProjectFeeLineDto["state"], string> = {
  unpaid: "Unpaid",
  "in-progress": "Payment in progress",
  paid: "Paid",
  refunded: "Refunded, unpaid again",
};

/** The project's fee lines with their working; unpaid ones can be chosen and paid together. */
export function FeeLines({
  projectId,
  lines,
  canPay,
  watchPending,
  payFees,
}: {
  projectId: string;
  lines: ProjectFeeLineDto[];
  canPay: boolean;
  watchPending: boolean;
  payFees: typeof payFeesAction;
}) {
  const router = useRouter();
  const payable = lines.filter((l) => l.payable);
  // What the coordinator ticked or unticked; a line they left alone is chosen while it is owed, so a
  // fee that becomes payable (the valuation was entered) is offered without a reload.
  const [choice, setChoice] = useState<Map<string, boolean>>(() => new Map());
  const isChosen = (l: ProjectFeeLineDto) => choice.get(l.feeKey) ?? (l.state === "unpaid" || l.state === "refunded");
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  // Only lines payable now count: one chosen earlier may since wait for the valuation, or be paid.
  const picked = payable.filter(isChosen);
  const total = picked.reduce((sum, l) => sum + l.amountCents, 0);

  // While a payment waits for the processor's confirmation, look again every couple of seconds.
  useEffect(() => {
    if (!watchPending) return;
    const timer = setInterval(() => router.refresh(), 2_000);
    const stop = setTimeout(() => clearInterval(timer), 60_000);
    return () => {
      clearInterval(timer);
      clearTimeout(stop);
    };
  }, [watchPending, router]);

  function pay() {
    setMessage(undefined);
    startTransition(async () => {
      const result = await payFees({ projectId, feeKeys: picked.map((l) => l.feeKey) });
      if (!result.ok) {
        setMessage(result.message);
        router.refresh();
        return;
      }
      window.location.assign(result.data.checkoutUrl);
    });
  }

  if (lines.length === 0) {
    return (
      <p className="panel text-sm text-ink-soft">
        No fee schedule is entered for this project&apos;s AHJ or utility. An admin enters them under Settings.
      </p>
    );
  }
  return (
    <section className="panel space-y-3" aria-labelledby="fee-lines-heading">
      <h2 id="fee-lines-heading">Fee lines</h2>
      <FormMessage kind="error">{message}</FormMessage>
      <ul className="divide-y divide-paper-edge/70">
        {lines.map((line) => {
          const selectable = canPay && payable.includes(line);
          return (
            <li key={line.feeKey} className="flex gap-3 py-3" data-testid="fee-line" data-state={line.state}>
              <div className="pt-0.5">
                {selectable ? (
                  <input
                    type="checkbox"
                    className="h-5 w-5 accent-copper"
                    aria-label={`Pay ${line.name}`}
                    checked={isChosen(line)}
                    onChange={(e) => setChoice((all) => new Map(all).set(line.feeKey, e.target.checked))}
                  />
                ) : (
                  <span className="inline-block h-5 w-5" aria-hidden />
                )}
              </div>
              <div className="min-w-0 flex-1">
                <div className="flex flex-wrap items-baseline justify-between gap-x-4">
                  <p className="font-medium">
                    {line.name} <span className="text-sm font-normal text-ink-faint">· {line.authority}</span>
                  </p>
                  <p className="measure font-semibold" data-testid="fee-line-amount">
                    {feeAmountText({ amountCents: line.amountCents, problem: line.problemCode })}
                  </p>
                </div>
                <ul className="measure mt-1 space-y-0.5 text-xs text-ink-soft" aria-label={`Working for ${line.name}`}>
                  {line.arithmetic.map((step, i) => (
                    <li key={i}>{step}</li>
                  ))}
                </ul>
                {line.problem ? <p className="mt-1 text-sm text-result-warn">{line.problem}</p> : null}
                <p className="mt-1 text-xs font-semibold uppercase tracking-wide text-ink-faint" data-testid="fee-line-state">
                  {STATE_TEXT[line.state]}
                </p>
              </div>
            </li>
          );
        })}
      </ul>
      {canPay && payable.length > 0 ? (
        <div className="flex flex-wrap items-center gap-3 border-t border-paper-edge pt-3">
          <Button type="button" onClick={pay} disabled={pending || picked.length === 0}>
            {pending ? "Opening the payment page…" : `Pay ${formatUsd(total)} by card`}
          </Button>
          <span className="text-xs text-ink-faint">
            Card payment on the payment service&apos;s page; Ohmstead never sees the card number.
          </span>
        </div>
      ) : null}
    </section>
  );
}
