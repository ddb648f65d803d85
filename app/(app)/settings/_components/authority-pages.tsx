import Link from "next/link";
import { FeeSchedulePanel } from "@/components/fees/fee-schedule-panel";
import { DataTable } from "@/components/ui/data-table";
import { AUTHORITY_SPECS, authorityFormValues, type AuthorityColumn } from "@/lib/authorities/specs";
import type { AuthorityKind } from "@/lib/domain/authorities";
import { can } from "@/lib/domain/permissions";
import { requirePermission } from "@/lib/server/auth";
import { getAuthorityById, listAuthorities } from "@/lib/server/data/authorities";
import { getFeeSchedule } from "@/lib/server/data/fee-schedules";
import { orNotFoundPage } from "@/lib/server/pages";
import { saveAuthorityAction } from "../authority-actions";
import { saveFeeScheduleAction } from "../fee-schedule-actions";
import { AuthorityForm } from "./authority-form";

// The list and edit pages of the AHJs and the utilities: one pair of pages, the kind's declaration
// (lib/authorities/specs.ts) deciding the columns and fields.

function Cell({ column, record }: { column: AuthorityColumn; record: Record<string, unknown> }) {
  const value = record[column.key];
  if (column.show === "list") {
    const items = Array.isArray(value) ? (value as string[]) : [];
    return items.length ? (
      <ul className="space-y-0.5">
        {items.map((item) => (
          <li key={item}>{item}</li>
        ))}
      </ul>
    ) : (
      <span className="text-ink-faint">not recorded</span>
    );
  }
  const text = `${value ?? ""}${column.unit ? ` ${column.unit}` : ""}`;
  return column.show === "measure" ? <span className="measure">{text}</span> : <>{text}</>;
}

export async function AuthorityListPage({ kind }: { kind: AuthorityKind }) {
  const viewer = await requirePermission("settings:view");
  const spec = AUTHORITY_SPECS[kind];
  const rows = (await listAuthorities({ viewer, kind })) as unknown as (Record<string, unknown> & { id: string; name: string })[];
  const canEdit = can(viewer, "reference:edit");
  return (
    <div className="space-y-4">
      <h1>{spec.title}</h1>
      <p className="text-sm text-ink-soft">{spec.intro}</p>
      <DataTable columns={[...spec.columns.map((c) => c.label), canEdit ? { label: "Actions", hidden: true } : null]}>
        {rows.map((r) => (
          <tr key={r.id} className="border-b border-paper-edge/70 align-top last:border-0">
            {spec.columns.map((c, i) => (
              <td key={c.key} className={`px-3 py-2 ${i === 0 ? "font-medium" : c.key === "notes" ? "text-ink-soft" : ""}`}>
                <Cell column={c} record={r} />
              </td>
            ))}
            {canEdit ? (
              <td className="px-3 py-2 text-right">
                <Link href={`${spec.path}/${r.id}`} aria-label={`Edit ${r.name}`}>
                  Edit
                </Link>
              </td>
            ) : null}
          </tr>
        ))}
      </DataTable>
      {canEdit ? (
        <section className="panel" aria-labelledby={`add-${kind}`}>
          <h2 id={`add-${kind}`} className="mb-3">
            Add a {spec.noun}
          </h2>
          <AuthorityForm kind={kind} save={saveAuthorityAction} />
        </section>
      ) : null}
    </div>
  );
}

export async function AuthorityEditPage({ kind, authorityId }: { kind: AuthorityKind; authorityId: string }) {
  const viewer = await requirePermission("reference:edit");
  const spec = AUTHORITY_SPECS[kind];
  const record = await orNotFoundPage(getAuthorityById({ viewer, kind, authorityId }));
  const feeLines = await getFeeSchedule({ viewer, authorityKind: kind, authorityId: record.id });
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <p className="text-sm">
        <Link href={spec.path}>Back to the {spec.title.split(" ")[0]!.toLowerCase()}</Link>
      </p>
      <h1>{record.name}</h1>
      <section className="panel">
        <AuthorityForm
          kind={kind}
          authorityId={record.id}
          initial={authorityFormValues(kind, record as unknown as Record<string, unknown>)}
          save={saveAuthorityAction}
        />
      </section>
      <FeeSchedulePanel
        authorityKind={kind}
        authorityId={record.id}
        authorityName={record.name}
        initialLines={feeLines}
        save={saveFeeScheduleAction}
      />
    </div>
  );
}
