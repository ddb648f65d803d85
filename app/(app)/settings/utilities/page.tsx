import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/lib/domain/permissions";
import { requirePermission } from "@/lib/server/auth";
import { listUtilities } from "@/lib/server/data/reference-data";
import { UtilityForm } from "./_components/utility-form";

export const metadata: Metadata = { title: "Utilities" };

export default async function UtilitiesPage() {
  const viewer = await requirePermission("settings:view");
  const rows = await listUtilities({ viewer });
  const canEdit = can(viewer, "reference:edit");
  return (
    <div className="space-y-4">
      <h1>Utilities</h1>
      <ul className="grid gap-4 sm:grid-cols-2">
        {rows.map((u) => (
          <li key={u.id} className="panel">
            <div className="flex items-baseline justify-between gap-3">
              <h2>{u.name}</h2>
              {canEdit ? <Link href={`/settings/utilities/${u.id}`} aria-label={`Edit ${u.name}`}>Edit</Link> : null}
            </div>
            <p className="measure mt-1 text-sm">{u.serviceVoltages.join(" · ")}</p>
            <div className="mt-2 text-sm">
              <span className="text-ink-faint">Accepted grid profiles: </span>
              {u.acceptedGridProfiles.length ? (
                <ul className="list-disc pl-5">
                  {u.acceptedGridProfiles.map((p) => (
                    <li key={p}>{p}</li>
                  ))}
                </ul>
              ) : (
                <span className="text-ink-faint">not recorded</span>
              )}
            </div>
            <p className="mt-2 text-sm text-ink-soft">{u.notes}</p>
          </li>
        ))}
      </ul>
      {canEdit ? (
        <section className="panel" aria-labelledby="add-utility">
          <h2 id="add-utility" className="mb-3">Add a utility</h2>
          <UtilityForm />
        </section>
      ) : null}
    </div>
  );
}
