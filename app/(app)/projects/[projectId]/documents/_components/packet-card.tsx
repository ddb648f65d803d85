"use client";

import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { PacketKind } from "@/lib/domain/stored-values";
import { PACKET_TITLES } from "@/lib/documents/packets/input";
import type { PacketDto } from "@/lib/dto/packets";
import type { requestPacketAction, retryPacketAction } from "../actions";
import { PacketRevision } from "./packet-revision";

const PURPOSE: Record<PacketKind, string> = {
  permit:
    "For the AHJ: cover, system summary, single-line diagram, calculations, labels, structural summary and the equipment data sheets. 11 × 17 in sheets.",
  interconnection:
    "For the utility: application with account and meter, equipment and ratings, single-line diagram, signature blocks. Letter-size forms.",
};

/** The page hands down the two generation actions. */
export type PacketActions = { request: typeof requestPacketAction; retry: typeof retryPacketAction };

export function PacketCard({
  projectId,
  kind,
  packets,
  canGenerate,
  reviewStatus,
  designRevision,
  onChange,
  actions,
}: {
  actions: PacketActions;
  projectId: string;
  kind: PacketKind;
  packets: PacketDto[];
  canGenerate: boolean;
  reviewStatus: string;
  designRevision: number | null;
  onChange: () => void;
}) {
  const [reason, setReason] = useState("");
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const inFlight = packets.find((p) => p.status === "queued" || p.status === "running");
  const failed = packets.find((p) => p.status === "failed");
  const ready = packets.filter((p) => p.status === "ready");
  const next = (ready[0]?.revision ?? 0) + 1;
  const needsReason = reviewStatus === "fail";
  const progress = useForwardProgress(inFlight);

  const run = (action: () => Promise<{ ok: boolean; message?: string }>) =>
    startTransition(async () => {
      setMessage(undefined);
      const result = await action();
      if (!result.ok) setMessage(result.message);
      onChange();
    });

  return (
    <section className="panel space-y-4" aria-labelledby={`${kind}-heading`} data-testid={`packet-${kind}`}>
      <div>
        <h2 id={`${kind}-heading`}>{PACKET_TITLES[kind]}</h2>
        <p className="text-sm text-ink-soft">{PURPOSE[kind]}</p>
      </div>
      <FormMessage kind="error">{message}</FormMessage>

      {inFlight ? (
        <div className="space-y-1" data-testid="packet-progress">
          <p className="flex items-baseline justify-between gap-3 text-sm">
            <span className="font-medium">
              {inFlight.status === "queued" ? `Rev ${inFlight.revision} is queued` : `Generating Rev ${inFlight.revision}`}
            </span>
            <span className="measure text-xs text-ink-soft">{progress} %</span>
          </p>
          <div
            className="h-2 overflow-hidden rounded-full bg-paper-edge"
            role="progressbar"
            aria-label={`${PACKET_TITLES[kind]} progress`}
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={progress}
            aria-valuetext={`${progress} %: ${inFlight.step}`}
          >
            <div className="h-full bg-copper transition-all" style={{ width: `${Math.max(4, progress)}%` }} />
          </div>
          <p className="truncate text-xs text-ink-soft" data-testid="packet-step" title={inFlight.step}>
            {inFlight.step}
          </p>
        </div>
      ) : null}

      {failed && !inFlight ? (
        <div className="space-y-2 rounded border border-result-fail/40 p-3 text-sm" data-testid="packet-failed">
          <p className="text-result-fail">
            Rev {failed.revision} could not be made: {failed.error}
          </p>
          {canGenerate ? (
            <Button variant="secondary" disabled={pending} onClick={() => run(() => actions.retry({ packetId: failed.id }))}>
              Retry
            </Button>
          ) : null}
        </div>
      ) : null}

      {canGenerate && !inFlight ? (
        <div className="space-y-2">
          {needsReason ? (
            <>
              <label className="label" htmlFor={`${kind}-reason`}>
                The design review has failing checks. Reason for generating anyway (printed on the cover)
              </label>
              <textarea
                id={`${kind}-reason`}
                className="input"
                rows={2}
                maxLength={1000}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
              />
            </>
          ) : null}
          <Button
            disabled={pending || reviewStatus === "incomplete" || (needsReason && !reason.trim())}
            onClick={() => run(() => actions.request({ projectId, kind, overrideReason: reason || undefined }))}
          >
            {pending ? "Queueing…" : `Generate Rev ${next}`}
          </Button>
          {reviewStatus === "incomplete" ? (
            <p className="text-xs text-ink-faint">Complete the design first: packets are made from a reviewed design.</p>
          ) : null}
        </div>
      ) : null}

      {ready.length ? (
        <ol className="space-y-3">
          {ready.map((p) => (
            <PacketRevision key={p.id} packet={p} designRevision={designRevision} />
          ))}
        </ol>
      ) : (
        <p className="text-sm text-ink-faint">No revision yet.</p>
      )}
    </section>
  );
}

/** The in-flight generation's progress, never shown going back: a poll answered out of order cannot move the bar backwards. */
function useForwardProgress(packet: PacketDto | undefined): number {
  const [highest, setHighest] = useState<{ id: string; progress: number } | null>(null);
  // Adjusting state while rendering (React's pattern for state derived from props): no effect, no extra paint.
  if (!packet) {
    if (highest) setHighest(null); // a retry of the same revision starts again from its first step
    return 0;
  }
  const seen = highest?.id === packet.id ? highest.progress : 0;
  const progress = Math.max(seen, packet.progress);
  if (highest?.id !== packet.id || highest.progress !== progress) setHighest({ id: packet.id, progress });
  return progress;
}
