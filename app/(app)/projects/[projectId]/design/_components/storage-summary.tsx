"use client";

import { CheckStatusChip } from "@/components/review/check-status";
import type { DesignReviewOutcome } from "@/lib/design/run-review";
import { Figure } from "./review-panel";
import { LOCATION_LABELS } from "./storage-words";

type Reviewed = Extract<DesignReviewOutcome, { status: "reviewed" }>;

const MODE_WORDS = { "backup-only": "Backup only", "self-consumption": "Self-consumption", export: "Export", "non-export": "Non-export" };
const kw = (v: number | null) => (v === null ? "—" : `${v.toLocaleString("en-US")} kW`);

/** The batteries in brief on the Review step: energy, power, what the point of connection counts, and each location against its limit. */
export function StorageSummary({ outcome }: { outcome: Reviewed }) {
  const s = outcome.review.storage;
  const figures = outcome.review.figures.storage;
  if (!s || !figures) return null;
  const poc =
    s.pointOfConnectionA === null
      ? "—"
      : `${s.pointOfConnectionA} A ${s.countedBy === "power-control-system" ? "(power control setting)" : "(inverter outputs)"}`;
  return (
    <section className="space-y-2" data-testid="storage-summary">
      <h3 className="font-semibold">Energy storage</h3>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        <Figure label="Coupling" value={s.coupling === "dc" ? "DC, multimode inverter" : "AC, battery inverter"} />
        <Figure label="Operating mode" value={MODE_WORDS[s.operatingMode]} />
        <Figure label="Units" value={String(s.units)} />
        <Figure label="Usable energy" value={`${s.totalUsableKwh} kWh`} />
        <Figure label="Nameplate energy" value={`${s.totalNameplateKwh} kWh`} />
        <Figure label="Maximum discharge" value={kw(s.maxDischargeKw)} />
        <Figure label="Counted at the main panel" value={poc} />
        <Figure label="Export limit" value={s.exportLimitKw === null ? "none" : kw(s.exportLimitKw)} />
      </dl>
      <ul className="space-y-1 text-sm">
        {figures.locations.map((l) => (
          <li key={l.location} className="flex flex-wrap items-center gap-2" data-testid="storage-location">
            <CheckStatusChip status={l.status} />
            <span>
              {LOCATION_LABELS[l.location]}: <span className="measure">{l.nameplateKwh} kWh</span>
              {l.limitKwh === null ? "" : l.limitKwh === 0 ? " (not allowed there)" : ` of ${l.limitKwh} kWh allowed`}
            </span>
          </li>
        ))}
        {figures.backupPanel ? (
          <li className="flex flex-wrap items-center gap-2">
            <CheckStatusChip status={figures.backupPanel.status} />
            <span>
              Backup loads panel: <span className="measure">{figures.backupPanel.sourceA} A</span> from the inverter
              {figures.backupPanel.rule
                ? `, ${figures.backupPanel.rule === "sum" ? "sum-of-breakers" : figures.backupPanel.rule} rule`
                : ""}
            </span>
          </li>
        ) : null}
      </ul>
    </section>
  );
}
