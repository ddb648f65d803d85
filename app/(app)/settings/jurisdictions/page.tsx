import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { listJurisdictions } from "@/lib/server/data/reference-data";

export const metadata: Metadata = { title: "Jurisdictions" };

export default async function JurisdictionsPage() {
  const viewer = await requirePermission("settings:view");
  const rows = await listJurisdictions({ viewer });
  return (
    <div className="space-y-4">
      <h1>Jurisdictions (AHJ)</h1>
      <p className="text-sm text-ink-soft">Design temperatures feed the string voltage checks: record low is the ASHRAE extreme annual mean minimum design dry-bulb temperature.</p>
      <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/70">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-paper-edge bg-paper-deep/70 text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th className="px-3 py-2">Authority</th>
              <th className="px-3 py-2">State</th>
              <th className="px-3 py-2">NEC edition</th>
              <th className="px-3 py-2">Record low</th>
              <th className="px-3 py-2">High design</th>
              <th className="px-3 py-2">Notes</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((j) => (
              <tr key={j.id} className="border-b border-paper-edge/70 last:border-0">
                <td className="px-3 py-2 font-medium">{j.name}</td>
                <td className="px-3 py-2">{j.state}</td>
                <td className="measure px-3 py-2">{j.necEdition}</td>
                <td className="measure px-3 py-2">{j.recordLowTempC} °C</td>
                <td className="measure px-3 py-2">{j.highDesignTempC} °C</td>
                <td className="px-3 py-2 text-ink-soft">{j.notes}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
