import { SingleLineSvg } from "@/components/sld/single-line-svg";
import { formatInZone } from "@/lib/domain/time-zones";
import { inverterCounts, siteAddress } from "@/lib/documents/packets/facts";
import { formatNumber } from "@/lib/documents/text";
import type { SharedView } from "@/lib/server/data/share-links";
import { layoutSingleLine } from "@/lib/sld";

function Fact({ name, value }: { name: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-ink-faint">{name}</dt>
      <dd className="text-sm">{value}</dd>
    </div>
  );
}

/** Everything the inspector sees; nothing on it changes anything. */
export function SharedPacketView({ token, view }: { token: string; view: SharedView }) {
  const { input } = view;
  const { ratings } = input.review.summary;
  const { module, device } = input.equipment;
  return (
    <div className="space-y-6">
      <div>
        <p className="text-sm text-ink-faint">Shared by {view.organizationName}</p>
        <h1>{siteAddress(input)}</h1>
        <p className="mt-1 text-sm text-ink-soft" data-testid="read-only-note">
          This page is read only: you can view and download the documents below, nothing here can be changed. The link works until{" "}
          {formatInZone(view.expiresAt, view.timeZone, "date")}.
        </p>
        {view.note ? <p className="mt-2 text-sm">Note from the sender: {view.note}</p> : null}
      </div>

      <section className="panel space-y-3" aria-labelledby="summary-heading">
        <h2 id="summary-heading">Project summary</h2>
        <dl className="grid gap-3 sm:grid-cols-2">
          <Fact name="Site" value={siteAddress(input)} />
          <Fact
            name="System size"
            value={`${formatNumber(ratings.dcKw)} kW DC / ${formatNumber(ratings.acKw)} kW AC (${ratings.moduleCount} modules)`}
          />
          <Fact
            name="Jurisdiction (AHJ)"
            value={`${input.jurisdiction.name}, ${input.jurisdiction.state} · NEC ${input.jurisdiction.necEdition}`}
          />
          <Fact name="Utility" value={input.utility?.name ?? "—"} />
          <Fact name="Modules" value={`${module.maker} ${module.model}`} />
          <Fact
            name="Inverters"
            value={inverterCounts(input)
              .map((i) => `${i.quantity} × ${i.item.maker} ${i.item.model}`)
              .join("; ")}
          />
          {device ? <Fact name="Module-level devices" value={`${device.maker} ${device.model}`} /> : null}
        </dl>
      </section>

      <section className="panel space-y-3" aria-labelledby="documents-heading">
        <h2 id="documents-heading">Documents</h2>
        <ul className="divide-y divide-paper-edge">
          {view.revisions.map((r) => (
            <li key={r.packetId} className="flex flex-wrap items-center justify-between gap-2 py-2" data-testid="shared-revision">
              <span>
                <span className="font-medium">{r.label}</span>
                <span className="ml-2 text-xs text-ink-faint">
                  {[
                    r.pageCount ? `${r.pageCount} pages` : null,
                    r.readyAt ? `generated ${formatInZone(r.readyAt, view.timeZone, "date")}` : null,
                  ]
                    .filter(Boolean)
                    .join(" · ")}
                </span>
                {r.supersededBy ? (
                  <span className="block text-sm text-result-warn" data-testid="superseded">
                    Superseded: {r.supersededBy} below is newer.
                  </span>
                ) : null}
              </span>
              <a
                className="rounded bg-copper px-3 py-1.5 text-sm text-white no-underline"
                href={`/share/${encodeURIComponent(token)}/packets/${r.packetId}`}
                download
              >
                Download PDF
              </a>
            </li>
          ))}
        </ul>
      </section>

      <section className="panel space-y-2" aria-labelledby="sld-heading">
        <h2 id="sld-heading">Single-line diagram</h2>
        <p className="text-xs text-ink-faint">As printed in the newest shared revision.</p>
        <div className="overflow-x-auto rounded border border-paper-edge bg-white p-2">
          <SingleLineSvg scene={layoutSingleLine(input.design, { necEdition: input.site.necEdition })} className="min-w-[900px]" />
        </div>
      </section>
    </div>
  );
}
