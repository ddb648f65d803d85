import { LocalTime } from "@/components/time/local-time";
import type { PacketDto } from "@/lib/dto/packets";

const size = (bytes: number | null) =>
  bytes === null ? "" : bytes > 1_000_000 ? `${(bytes / 1_000_000).toFixed(1)} MB` : `${Math.round(bytes / 1000)} kB`;

/** One ready revision; `designRevision` is the saved design's now, to tell a revision drawn from an older one. */
export function PacketRevision({ packet, designRevision }: { packet: PacketDto; designRevision: number | null }) {
  const { sentTo } = packet;
  const stale = packet.designRevision !== null && designRevision !== null && packet.designRevision !== designRevision;
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
      {sentTo.length ? (
        <p className="mt-1 text-sm" data-testid="revision-sent">
          <strong>Submitted</strong> to {sentTo.join(" and ")}: kept exactly as it went in.
        </p>
      ) : null}
      {stale ? (
        <p className="mt-1 text-sm text-result-warn" data-testid="revision-stale">
          <strong>No longer matches the design:</strong> drawn from design revision {packet.designRevision}, the design is now at revision{" "}
          {designRevision}.
        </p>
      ) : null}
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
