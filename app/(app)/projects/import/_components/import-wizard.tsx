"use client";

import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionResult } from "@/lib/dto/action-result";
import type { ImportPreviewDto, ImportRowDto } from "@/lib/dto/project-import";
import { PROJECT_SHEET_FIELDS } from "@/lib/spreadsheets/project-columns";
import { guessMapping, type ImportMapping } from "@/lib/spreadsheets/project-import";
import { readCsv } from "@/lib/spreadsheets/read-csv";
import { IMPORT_MAX_CHARS, type ProjectImportInput } from "@/lib/schemas/project-import";

type Run = (input: ProjectImportInput) => Promise<ActionResult<ImportPreviewDto>>;

const STATUS_WORDS: Record<ImportRowDto["status"], string> = {
  ready: "Ready to import",
  problem: "Not imported",
  already: "Already a project",
  imported: "Imported",
};

function RowStatus({ row }: { row: ImportRowDto }) {
  if (row.status === "problem")
    return (
      <div>
        <span className="font-medium">✕ {STATUS_WORDS.problem}</span>
        <ul className="ml-4 list-disc text-ink-soft">
          {row.problems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      </div>
    );
  if (row.status === "already")
    return (
      <span>
        = {STATUS_WORDS.already}
        {row.projectNumber !== null ? ` (no. ${row.projectNumber})` : row.sameAsLine !== null ? ` (same as line ${row.sameAsLine})` : ""}
      </span>
    );
  if (row.status === "imported")
    return (
      <span className="font-medium">
        ✓ {STATUS_WORDS.imported}:{" "}
        {row.projectId ? <Link href={`/projects/${row.projectId}`}>project {row.projectNumber}</Link> : `project ${row.projectNumber}`}
      </span>
    );
  return <span>○ {STATUS_WORDS.ready}</span>;
}

/** Upload, map the columns, preview each row with its problems, then import the good rows in one go. */
export function ImportWizard({ preview, run }: { preview: Run; run: Run }) {
  const [fileName, setFileName] = useState("");
  const [csv, setCsv] = useState("");
  const [headers, setHeaders] = useState<string[]>([]);
  const [mapping, setMapping] = useState<ImportMapping | null>(null);
  const [result, setResult] = useState<ImportPreviewDto | null>(null);
  const [done, setDone] = useState(false);
  const [message, setMessage] = useState("");
  const [busy, setBusy] = useState(false);

  async function choose(file: File | undefined) {
    setResult(null);
    setDone(false);
    setMessage("");
    if (!file) return;
    const text = await file.text();
    if (text.length > IMPORT_MAX_CHARS)
      return setMessage("The file is larger than 900 KB; split it and import the parts one after the other.");
    const sheet = readCsv(text);
    if (sheet.problem) return setMessage(sheet.problem);
    setFileName(file.name);
    setCsv(text);
    setHeaders(sheet.headers);
    setMapping(guessMapping(sheet.headers));
  }

  async function send(action: Run, finished: boolean) {
    if (!mapping) return;
    setBusy(true);
    setMessage("");
    const answer = await action({ csv, mapping });
    setBusy(false);
    if (!answer.ok) return setMessage(answer.message);
    if (answer.data.problem) return setMessage(answer.data.problem);
    setResult(answer.data);
    setDone(finished);
  }

  return (
    <div className="space-y-5">
      <section className="panel space-y-2">
        <h2 className="text-base">1. Choose the file</h2>
        <p className="text-sm text-ink-soft">
          A CSV file (comma, semicolon or tab separated) whose first line names the columns, at most 1000 projects. Save a spreadsheet as
          “CSV UTF-8” first.
        </p>
        <label className="label" htmlFor="import-file">
          Spreadsheet (.csv)
        </label>
        <input id="import-file" type="file" accept=".csv,text/csv" className="text-sm" onChange={(e) => void choose(e.target.files?.[0])} />
        {fileName ? (
          <p className="text-sm">
            Read {fileName}: {headers.length} columns.
          </p>
        ) : null}
      </section>

      {mapping ? (
        <section className="panel space-y-3">
          <h2 className="text-base">2. Match the columns</h2>
          <p className="text-sm text-ink-soft">
            Each project field takes one column of your file; the ones found by their headings are chosen already. AHJ, utility, coordinator
            and installer are matched by name (people also by e-mail).
          </p>
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {PROJECT_SHEET_FIELDS.map((field) => (
              <div key={field.key}>
                <label className="label" htmlFor={`map-${field.key}`}>
                  {field.header}
                  {"required" in field ? " (required)" : ""}
                </label>
                <select
                  id={`map-${field.key}`}
                  className="input"
                  value={mapping[field.key] ?? ""}
                  onChange={(e) => {
                    setResult(null);
                    setMapping({ ...mapping, [field.key]: e.target.value === "" ? null : Number(e.target.value) });
                  }}
                >
                  <option value="">Leave blank</option>
                  {headers.map((h, i) => (
                    <option key={i} value={i}>
                      {h || `Column ${i + 1}`}
                    </option>
                  ))}
                </select>
              </div>
            ))}
          </div>
          <Button type="button" variant="secondary" disabled={busy} onClick={() => void send(preview, false)}>
            Check every row
          </Button>
        </section>
      ) : null}

      <FormMessage kind="error">{message}</FormMessage>

      {result ? (
        <section className="panel space-y-3" aria-live="polite">
          <h2 className="text-base">{done ? "3. What was imported" : "3. Check the rows"}</h2>
          <p className="text-sm" data-testid="import-counts">
            {done
              ? `${result.counts.imported} imported, ${result.counts.problem} not imported because of a problem, ${result.counts.already} already in Ohmstead.`
              : `${result.counts.ready} ready to import, ${result.counts.problem} with a problem (they will not be imported), ${result.counts.already} already in Ohmstead.`}
          </p>
          <DataTable columns={["Line", "Project", "Result"]}>
            {result.rows.map((row) => (
              <tr key={row.line} className="border-b border-paper-edge align-top" data-status={row.status}>
                <td className="measure px-3 py-2">{row.line}</td>
                <td className="px-3 py-2">{row.label}</td>
                <td className="px-3 py-2">
                  <RowStatus row={row} />
                </td>
              </tr>
            ))}
          </DataTable>
          {!done && result.counts.ready > 0 ? (
            <Button type="button" disabled={busy} onClick={() => void send(run, true)}>
              Import {result.counts.ready} {result.counts.ready === 1 ? "project" : "projects"}
            </Button>
          ) : null}
          {done ? <Link href="/dashboard">Back to the projects</Link> : null}
        </section>
      ) : null}
    </div>
  );
}
