import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/lib/domain/permissions";
import { requirePermission } from "@/lib/server/auth";
import { listJurisdictions } from "@/lib/server/data/reference-data";
import { JurisdictionForm } from "./_components/jurisdiction-form";
import { DataTable } from "@/components/ui/data-table";

export const metadata: Metadata = { title: "Jurisdictions" };

export default async function JurisdictionsPage() {
  const viewer = await requirePermission("settings:view");
  const rows = await listJurisdictions({ viewer });
  const canEdit = can(viewer, "reference:edit");
  return (
    <div className="space-y-4">
      <h1>Jurisdictions (AHJ)</h1>
      <p className="text-sm text-ink-soft">Design temperatures feed the string voltage checks: record low is the ASHRAE extreme annual mean minimum design dry-bulb temperature.</p>
      <DataTable columns={["Authority", "State", "NEC edition", "Record low", "High design", "Notes", canEdit ? { label: "Actions", hidden: true } : null]}>
            {rows.map((j) => (
              <tr key={j.id} className="border-b border-paper-edge/70 last:border-0">
                <td className="px-3 py-2 font-medium">{j.name}</td>
                <td className="px-3 py-2">{j.state}</td>
                <td className="measure px-3 py-2">{j.necEdition}</td>
                <td className="measure px-3 py-2">{j.recordLowTempC} °C</td>
                <td className="measure px-3 py-2">{j.highDesignTempC} °C</td>
                <td className="px-3 py-2 text-ink-soft">{j.notes}</td>
                {canEdit ? (
                  <td className="px-3 py-2 text-right">
                    <Link href={`/settings/jurisdictions/${j.id}`} aria-label={`Edit ${j.name}`}>Edit</Link>
                  </td>
                ) : null}
              </tr>
            ))}
          </DataTable>
      {canEdit ? (
        <section className="panel" aria-labelledby="add-jurisdiction">
          <h2 id="add-jurisdiction" className="mb-3">Add a jurisdiction</h2>
          <JurisdictionForm />
        </section>
      ) : null}
    </div>
  );
}
