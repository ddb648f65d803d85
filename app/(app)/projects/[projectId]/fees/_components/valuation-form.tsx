"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { centsToDollarsText } from "@/lib/fees/money";
import type { setValuationAction } from "../actions";

/** The valuation the owner declared for the work, which percentage fees read. */
export function ValuationForm({
  projectId,
  valuationCents,
  canEdit,
  setValuation,
}: {
  projectId: string;
  valuationCents: number | null;
  canEdit: boolean;
  setValuation: typeof setValuationAction;
}) {
  const router = useRouter();
  const [value, setValue] = useState(valuationCents === null ? "" : centsToDollarsText(valuationCents));
  const [error, setError] = useState<string>();
  const [pending, startTransition] = useTransition();
  function save(event: React.FormEvent) {
    event.preventDefault();
    setError(undefined);
    startTransition(async () => {
      const result = await setValuation({ projectId, valuation: value });
      if (!result.ok) setError(result.fieldErrors?.valuation?.[0] ?? result.message);
      else router.refresh();
    });
  }
  return (
    <form onSubmit={save} className="panel flex flex-wrap items-end gap-3" aria-label="Declared valuation">
      <div className="min-w-[12rem] flex-1">
        <label className="label" htmlFor="valuation">
          Declared project valuation ($)
        </label>
        <input
          id="valuation"
          className="input measure"
          inputMode="decimal"
          value={value}
          onChange={(e) => setValue(e.target.value)}
          disabled={!canEdit}
          placeholder="e.g. 24,500"
        />
        {error ? (
          <p className="mt-1 text-sm text-result-fail" role="alert">
            {error}
          </p>
        ) : (
          <p className="mt-1 text-xs text-ink-faint">The contract value of the PV work, as stated on the permit application.</p>
        )}
      </div>
      {canEdit ? (
        <Button type="submit" variant="secondary" disabled={pending}>
          Save valuation
        </Button>
      ) : null}
    </form>
  );
}
