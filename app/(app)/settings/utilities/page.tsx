import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { listUtilities } from "@/lib/server/data/reference-data";

export const metadata: Metadata = { title: "Utilities" };

export default async function UtilitiesPage() {
  const viewer = await requirePermission("settings:view");
  const rows = await listUtilities({ viewer });
  return (
    <div className="space-y-4">
      <h1>Utilities</h1>
      <ul className="grid gap-4 sm:grid-cols-2">
        {rows.map((u) => (
          <li key={u.id} className="panel">
            <h2>{u.name}</h2>
            <p className="measure mt-1 text-sm">{u.serviceVoltages.join(" · ")}</p>
            <p className="mt-2 text-sm text-ink-soft">{u.notes}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
