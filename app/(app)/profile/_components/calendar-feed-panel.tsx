"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { CopyField } from "@/components/ui/copy-field";
import { FormMessage } from "@/components/ui/form-message";
import type { createCalendarFeedAction, revokeCalendarFeedAction } from "../actions";

/**
 * The person's private calendar address: made (or replaced) on request and shown once, since only a
 * fingerprint of it is kept; revoked at once when it should stop working.
 */
export function CalendarFeedPanel({
  hasFeed,
  create,
  revoke,
}: {
  hasFeed: boolean;
  create: typeof createCalendarFeedAction;
  revoke: typeof revokeCalendarFeedAction;
}) {
  const router = useRouter();
  const [url, setUrl] = useState<string>();
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();

  function make() {
    if (hasFeed && !window.confirm("Make a new address? The current one stops working at once.")) return;
    setMessage(undefined);
    startTransition(async () => {
      const result = await create({});
      if (!result.ok) return setMessage(result.message);
      setUrl(result.data.url);
      router.refresh();
    });
  }

  function turnOff() {
    if (!window.confirm("Turn the calendar address off? Calendars subscribed to it stop updating.")) return;
    setMessage(undefined);
    startTransition(async () => {
      const result = await revoke({});
      if (!result.ok) return setMessage(result.message);
      setUrl(undefined);
      router.refresh();
    });
  }

  return (
    <div className="space-y-3">
      <FormMessage kind="error">{message}</FormMessage>
      {url ? (
        <div className="space-y-2 rounded border border-copper/40 bg-copper-light/30 p-3" data-testid="new-calendar-feed">
          <p className="text-sm font-medium">Copy this address now. It is shown only this once; Ohmstead keeps only a fingerprint of it.</p>
          <CopyField key={url} label="Calendar address" value={url} />
          <p className="text-xs text-ink-soft">
            In your calendar program choose to subscribe to a calendar from a web address and paste it. Anyone with the address can read the
            inspections it lists: keep it private, and turn it off here if it leaks.
          </p>
        </div>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button type="button" onClick={make} disabled={pending}>
          {hasFeed ? "Make a new address" : "Make my calendar address"}
        </Button>
        {hasFeed ? (
          <Button type="button" variant="danger" onClick={turnOff} disabled={pending}>
            Turn it off
          </Button>
        ) : null}
      </div>
    </div>
  );
}
