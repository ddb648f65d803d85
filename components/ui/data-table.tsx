import type { ReactNode } from "react";

/** A column heading; `null` columns are left out, a hidden one is read by screen readers only. */
export type Column = string | { label: string; hidden: true } | null;

/** The plain bordered table of the settings pages: headings on paper, rows supplied by the caller. */
export function DataTable({ columns, children }: { columns: Column[]; children: ReactNode }) {
  return (
    <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/70">
      <table className="w-full text-left text-sm">
        <thead className="border-b border-paper-edge bg-paper-deep/70 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            {columns.map((column, i) =>
              column === null ? null : (
                <th key={i} className="px-3 py-2">
                  {typeof column === "string" ? column : <span className="sr-only">{column.label}</span>}
                </th>
              ),
            )}
          </tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </div>
  );
}
