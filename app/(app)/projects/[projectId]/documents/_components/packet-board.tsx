"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef } from "react";
import useSWR from "swr";
import { PACKET_KINDS } from "@/lib/domain/stored-values";
import type { PacketDto } from "@/lib/dto/packets";
import { PacketCard, type PacketActions } from "./packet-card";

async function fetchPackets(url: string): Promise<PacketDto[]> {
  const res = await fetch(url, { cache: "no-store" });
  const body = await res.json().catch(() => null);
  if (!res.ok) throw new Error(body?.error?.message ?? `The packets could not be loaded (${res.status}).`);
  return body.items;
}

/** Both packets of a project; polls while a generation is queued or running, often enough to show each step the worker reports. */
export function PacketBoard({
  projectId,
  initial,
  canGenerate,
  reviewStatus,
  designRevision,
  actions,
}: {
  projectId: string;
  initial: PacketDto[];
  canGenerate: boolean;
  reviewStatus: string;
  designRevision: number | null;
  actions: PacketActions;
}) {
  const { data, error, mutate } = useSWR(`/api/v1/projects/${projectId}/packets`, fetchPackets, {
    fallbackData: initial,
    refreshInterval: (latest) => (latest?.some((p) => p.status === "queued" || p.status === "running") ? 400 : 0),
    // SWR skips a poll within the dedupe window of the last request (2 s by default), which hid most steps.
    dedupingInterval: 300,
  });
  // A revision that just became ready can be shared: the server-rendered share panel is refreshed
  // when the set of ready revisions grows, not only on the next page load.
  const router = useRouter();
  const ready = (data ?? [])
    .filter((p) => p.status === "ready")
    .map((p) => p.id)
    .sort()
    .join(",");
  const seen = useRef(ready);
  useEffect(() => {
    if (ready === seen.current) return;
    seen.current = ready;
    router.refresh();
  }, [ready, router]);
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      {error ? (
        <p role="alert" className="text-sm text-result-fail">
          {error.message}
        </p>
      ) : null}
      {PACKET_KINDS.map((kind) => (
        <PacketCard
          key={kind}
          projectId={projectId}
          kind={kind}
          packets={(data ?? []).filter((p) => p.kind === kind)}
          canGenerate={canGenerate}
          reviewStatus={reviewStatus}
          designRevision={designRevision}
          onChange={() => mutate()}
          actions={actions}
        />
      ))}
    </div>
  );
}
