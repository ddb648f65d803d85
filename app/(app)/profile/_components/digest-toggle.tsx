"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { FormMessage } from "@/components/ui/form-message";
import type { setDailyDigestAction } from "../actions";

/** The person's own choice: the morning digest on or off, saved as soon as it is ticked. */
export function DigestToggle({ enabled, save }: { enabled: boolean; save: typeof setDailyDigestAction }) {
  const router = useRouter();
  const [checked, setChecked] = useState(enabled);
  const [message, setMessage] = useState<string>();
  const [saved, setSaved] = useState<string>();
  const [pending, startTransition] = useTransition();

  function change(next: boolean) {
    setChecked(next);
    setMessage(undefined);
    setSaved(undefined);
    startTransition(async () => {
      const result = await save({ enabled: next });
      if (!result.ok) {
        setChecked(!next);
        setMessage(result.message);
        return;
      }
      setSaved(next ? "The digest will come on working mornings." : "No more digests: the desk is still on the Projects page.");
      router.refresh();
    });
  }

  return (
    <div className="space-y-2">
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" className="mt-1" checked={checked} disabled={pending} onChange={(e) => change(e.target.checked)} />
        <span>E-mail me the morning digest</span>
      </label>
      <FormMessage kind="error">{message}</FormMessage>
      <FormMessage kind="info">{saved}</FormMessage>
    </div>
  );
}
