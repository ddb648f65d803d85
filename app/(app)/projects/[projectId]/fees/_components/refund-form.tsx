"use client";

import { useRouter } from "next/navigation";
import { useId, useState, useTransition } from "react";
import { LocalTime } from "@/components/time/local-time";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { formatUsd, parseUsd } from "@/lib/fees/money";
import type { PaymentDto } from "@/lib/dto/fees";
import type { refundPaymentAction } from "../actions";

type Mode = "fees" | "amount";
type Errors = Record<string, string[] | undefined>;

/**
 * An admin's refund of a paid payment: whole fees (which are then unpaid again) or an amount of money
 * (the fees stay paid). Nothing is chosen or filled in beforehand, and a dialog naming the amount and the
 * payment asks before anything is sent.
 */
export function RefundForm({ payment, refund }: { payment: PaymentDto; refund: typeof refundPaymentAction }) {
  const router = useRouter();
  const id = useId();
  const left = payment.amountCents - payment.refundedCents;
  const open = payment.lines.filter((l) => !l.refunded);
  const [shown, setShown] = useState(false);
  const [mode, setMode] = useState<Mode>(open.length ? "fees" : "amount");
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const [amount, setAmount] = useState("");
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<string>();
  const [confirming, setConfirming] = useState<{ cents: number; names: string[] } | null>(null);
  const [pending, startTransition] = useTransition();

  if (!shown) {
    return (
      <Button type="button" variant="quiet" onClick={() => setShown(true)}>
        Refund…
      </Button>
    );
  }

  /** Checks what can be checked here, then asks for confirmation with the amount the server will work out. */
  const review = (event: React.FormEvent) => {
    event.preventDefault();
    setMessage(undefined);
    const found: Errors = {};
    let cents = 0;
    let names: string[] = [];
    if (mode === "fees") {
      const lines = open.filter((l) => chosen.has(l.feeKey));
      if (!lines.length) found.feeKeys = ["Choose at least one fee to refund"];
      cents = lines.reduce((sum, l) => sum + l.amountCents, 0);
      names = lines.map((l) => l.name);
      if (cents > left) found.feeKeys = [`These fees come to ${formatUsd(cents)}; only ${formatUsd(left)} is left to refund`];
    } else {
      const typed = parseUsd(amount);
      if (typed === null || typed <= 0) found.amount = ["Enter the amount in dollars, e.g. 25.00"];
      else if (typed > left) found.amount = [`At most ${formatUsd(left)}`];
      cents = typed ?? 0;
    }
    if (reason.trim().length < 3) found.reason = ["Say why the money is returned"];
    setErrors(found);
    if (Object.keys(found).length === 0) setConfirming({ cents, names });
  };

  const send = () =>
    startTransition(async () => {
      const result = await refund({ paymentId: payment.id, reason, ...(mode === "fees" ? { feeKeys: [...chosen] } : { amount }) });
      setConfirming(null);
      if (!result.ok) {
        setErrors(result.fieldErrors ?? {});
        setMessage(result.message);
        return;
      }
      setShown(false);
      router.refresh();
    });

  const toggle = (feeKey: string, on: boolean) =>
    setChosen((all) => {
      const next = new Set(all);
      if (on) next.add(feeKey);
      else next.delete(feeKey);
      return next;
    });

  return (
    <form onSubmit={review} className="space-y-3 rounded border border-paper-edge bg-paper/60 p-3" aria-label="Refund">
      <fieldset className="space-y-2">
        <legend className="label">What to refund</legend>
        {open.length ? (
          <label className="flex items-center gap-2 text-sm">
            <input type="radio" name={`${id}-mode`} className="accent-copper" checked={mode === "fees"} onChange={() => setMode("fees")} />
            Whole fees: they become unpaid again
          </label>
        ) : null}
        {mode === "fees" ? (
          <ul className="ml-6 space-y-1" aria-label="Fees to refund">
            {open.map((l) => (
              <li key={l.feeKey}>
                <label className="flex items-start gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="mt-0.5 h-4 w-4 shrink-0 accent-copper"
                    checked={chosen.has(l.feeKey)}
                    onChange={(e) => toggle(l.feeKey, e.target.checked)}
                  />
                  <span className="min-w-0 flex-1">
                    {l.authority}: {l.name} <span className="measure whitespace-nowrap">{formatUsd(l.amountCents)}</span>
                  </span>
                </label>
              </li>
            ))}
            {errors.feeKeys ? <li className="text-sm text-result-fail">{errors.feeKeys[0]}</li> : null}
          </ul>
        ) : null}
        <label className="flex items-center gap-2 text-sm">
          <input
            type="radio"
            name={`${id}-mode`}
            className="accent-copper"
            checked={mode === "amount"}
            onChange={() => setMode("amount")}
          />
          An amount of money: the fees stay paid
        </label>
        {mode === "amount" ? (
          <div className="ml-6 max-w-[12rem]">
            <label className="label" htmlFor={`${id}-amount`}>
              Refund amount ($)
            </label>
            <input
              id={`${id}-amount`}
              className="input measure"
              inputMode="decimal"
              value={amount}
              placeholder={`up to ${formatUsd(left)}`}
              onChange={(e) => setAmount(e.target.value)}
            />
            {errors.amount ? (
              <p className="mt-1 text-sm text-result-fail">{errors.amount[0]}</p>
            ) : (
              <p className="mt-1 text-xs text-ink-faint">Up to {formatUsd(left)}</p>
            )}
          </div>
        ) : null}
      </fieldset>
      <div>
        <label className="label" htmlFor={`${id}-reason`}>
          Reason
        </label>
        <input id={`${id}-reason`} className="input" value={reason} onChange={(e) => setReason(e.target.value)} />
        {errors.reason ? <p className="mt-1 text-sm text-result-fail">{errors.reason[0]}</p> : null}
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={pending}>
          Review the refund
        </Button>
        <Button type="button" variant="secondary" onClick={() => setShown(false)} disabled={pending}>
          Cancel
        </Button>
      </div>
      {message ? (
        <p className="text-sm text-result-fail" role="alert">
          {message}
        </p>
      ) : null}
      <ConfirmDialog
        open={confirming !== null}
        title={`Refund ${formatUsd(confirming?.cents ?? 0)}?`}
        confirmLabel={pending ? "Refunding…" : `Refund ${formatUsd(confirming?.cents ?? 0)}`}
        pending={pending}
        onConfirm={send}
        onCancel={() => setConfirming(null)}
      >
        <p data-testid="refund-confirmation">
          <strong className="measure">{formatUsd(confirming?.cents ?? 0)}</strong> of the{" "}
          <span className="measure">{formatUsd(payment.amountCents)}</span> payment{" "}
          {payment.paidAt ? (
            <>
              of <LocalTime iso={payment.paidAt} />
            </>
          ) : null}
          {payment.createdBy ? ` by ${payment.createdBy}` : ""}
          {payment.receiptNumber ? ` (receipt ${payment.receiptNumber})` : ""} goes back to {payment.card ?? "the card it was paid with"}.
        </p>
        <p>{confirming?.names.length ? `${confirming.names.join(", ")} will be unpaid again.` : "The fees stay paid."}</p>
        <p className="text-ink-soft">A refund cannot be undone.</p>
      </ConfirmDialog>
    </form>
  );
}
