import Link from "next/link";
import { clsx } from "clsx";
import type { EquipmentKind } from "@/lib/domain/stored-values";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { ArchiveButton } from "./archive-button";
import { FIGURE_COLUMNS, formatFileSize, keyFigures } from "./key-figures";
import { KIND_WORDS } from "./kind-words";
import { DataTable } from "@/components/ui/data-table";
import { setEquipmentArchivedAction } from "../actions";

/** One kind's items as a table; archived ones last and muted. */
export function EquipmentGroup({ kind, items, canEdit }: { kind: EquipmentKind; items: EquipmentDto[]; canEdit: boolean }) {
  const rows = [...items].sort((a, b) => Number(a.isArchived) - Number(b.isArchived));
  return (
    <section aria-labelledby={`group-${kind}`} className="space-y-2">
      <div className="flex items-baseline justify-between gap-4">
        <h2 id={`group-${kind}`}>{KIND_WORDS[kind].plural}</h2>
        {canEdit ? <Link href={`/settings/equipment/new?kind=${kind}`}>{KIND_WORDS[kind].add}</Link> : null}
      </div>
      {rows.length === 0 ? (
        <p className="text-sm text-ink-faint">None in the catalog yet.</p>
      ) : (
        <DataTable
          columns={[
            "Maker and model",
            ...FIGURE_COLUMNS[kind],
            "Listing",
            "Data sheet",
            canEdit ? { label: "Actions", hidden: true } : null,
          ]}
        >
          {rows.map((item) => {
            const name = `${item.maker} ${item.model}`;
            return (
              <tr
                key={item.id}
                className={clsx("border-b border-paper-edge/70 last:border-0", item.isArchived && "text-ink-faint")}
                data-testid={`equipment-${item.id}`}
              >
                <td className="px-3 py-2 font-medium">
                  {name}
                  {item.isArchived ? <span className="ml-2 rounded bg-paper-deep px-1.5 py-0.5 text-xs font-normal">archived</span> : null}
                </td>
                {keyFigures(item).map((value, i) => (
                  <td key={FIGURE_COLUMNS[kind][i]} className="measure whitespace-nowrap px-3 py-2">
                    {value}
                  </td>
                ))}
                <td className="px-3 py-2 text-ink-soft">{item.listing || "—"}</td>
                <td className="px-3 py-2">
                  {item.datasheet ? (
                    <a
                      href={`/api/v1/equipment/${item.id}/datasheet`}
                      target="_blank"
                      rel="noreferrer"
                      aria-label={`Data sheet of ${name}`}
                    >
                      PDF <span className="measure text-xs text-ink-faint">{formatFileSize(item.datasheet.sizeBytes)}</span>
                    </a>
                  ) : (
                    <span className="text-ink-faint">—</span>
                  )}
                </td>
                {canEdit ? (
                  <td className="space-x-2 whitespace-nowrap px-3 py-2 text-right">
                    <Link href={`/settings/equipment/${item.id}`} aria-label={`Edit ${name}`}>
                      Edit
                    </Link>
                    <ArchiveButton
                      equipmentId={item.id}
                      isArchived={item.isArchived}
                      name={name}
                      setArchived={setEquipmentArchivedAction}
                    />
                  </td>
                ) : null}
              </tr>
            );
          })}
        </DataTable>
      )}
    </section>
  );
}
