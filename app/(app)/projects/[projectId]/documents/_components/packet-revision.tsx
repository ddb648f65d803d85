import { LocalTime } from "@/components/time/local-time";
import type { PacketDto } from "@/lib/dto/packets";

const size = (bytes: number | null) =>
  bytes === null ? "" : bytes > 1_000_000 ? `${(bytes / 1_000_000).toFixed(1)} MB` : `${Math.round(bytes / 1000)} kB`;

export function PacketRevision({ packet }: { packet: PacketDto }) {
  return (
    <li className="rounded border border-paper-edge bg-white/60 p-3" data-testid="packet-revision">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-semibold">Rev {packet.revision}</p>
        <a href={`/api/v1/packets/${packet.id}/file`} className="text-sm font-medium" download>
          Download PDF
        </a>
      </div>
      <p className="measure text-xs text-ink-faint">
        {packet.readyAt ? <LocalTime iso={packet.readyAt} /> : ""} · {packet.pageCount} pages · {size(packet.sizeBytes)} · SHA-256{" "}
        {packet.sha256?.slice(0, 12)}…{packet.requestedBy ? ` · ${packet.requestedBy}` : ""}
      </p>
      {packet.overrideReason ? (
        <p className="mt-1 text-sm text-result-warn">Generated with failing checks: {packet.overrideReason}</p>
      ) : null}
      {packet.changes.length ? (
        <details className="mt-1 text-sm">
          <summary className="cursor-pointer text-ink-soft">
            What changed since Rev {packet.revision - 1} ({packet.changes.length})
          </summary>
          <ul className="mt-1 list-disc pl-5 text-ink-soft" data-testid="packet-changes">
            {packet.changes.map((line, i) => (
              <li key={i}>{line}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </li>
  );
}
