"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import type { setHoldAction } from "../../actions";

/** Sets the project aside (on hold or cancelled, with the reason) or takes it up again. */
export function HoldForm({
  projectId,
  holdState,
  setHold,
}: {
  projectId: string;
  holdState: "on_hold" | "cancelled" | null;
  setHold: typeof setHoldAction;
}) {
  const router = useRouter();
  const [hold, setHoldChoice] = useState<"on_hold" | "cancelled">("on_hold");
  const [reason, setReason] = useState("");
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const send = (to: "on_hold" | "cancelled" | "active") =>
    startTransition(async () => {
      setMessage(undefined);
      const result = await setHold({ projectId, hold: to, reason: to === "active" ? "" : reason });
      if (!result.ok) setMessage(result.fieldErrors?.reason?.[0] ?? result.message);
      else {
        setReason("");
        router.refresh();
      }
    });
  if (holdState) {
    return (
      <Button type="button" variant="secondary" disabled={pending} onClick={() => send("active")}>
        Take the project up again
      </Button>
    );
  }
  return (
    <details className="text-sm">
      <summary className="cursor-pointer text-ink-soft">Set the project aside</summary>
      <div className="mt-2 space-y-2">
        <div className="flex flex-wrap gap-4">
          <label className="inline-flex items-center gap-2">
            <input type="radio" name="hold" checked={hold === "on_hold"} onChange={() => setHoldChoice("on_hold")} />
            On hold (it comes back)
          </label>
          <label className="inline-flex items-center gap-2">
            <input type="radio" name="hold" checked={hold === "cancelled"} onChange={() => setHoldChoice("cancelled")} />
            Cancelled
          </label>
        </div>
        <label className="label" htmlFor="hold-reason">
          Why
        </label>
        <textarea id="hold-reason" rows={2} className="input" value={reason} onChange={(e) => setReason(e.target.value)} />
        {message ? (
          <p className="text-sm text-result-fail" role="alert">
            {message}
          </p>
        ) : null}
        <Button type="button" variant="danger" disabled={pending} onClick={() => send(hold)}>
          {hold === "on_hold" ? "Put on hold" : "Cancel the project"}
        </Button>
      </div>
    </details>
  );
}
