import { ProjectInput, type ProjectValues } from "@/lib/schemas/project";
import { PROJECT_SHEET_FIELDS, type ProjectSheetField } from "./project-columns";

/** Which column (by position) feeds each project field; null leaves the field blank. */
export type ImportMapping = Record<ProjectSheetField, number | null>;

type Named = { id: string; name: string };
type Person = Named & { email: string };
/** The organization's authorities and people an imported row may name (active office staff and installers only). */
export type ImportLookups = { jurisdictions: Named[]; utilities: Named[]; coordinators: Person[]; installers: Person[] };

export type ImportRowPlan =
  | { line: number; status: "ready"; values: ProjectValues; key: string; label: string }
  | { line: number; status: "problem"; problems: string[]; label: string }
  | { line: number; status: "already"; label: string; existingNumber: number | null; sameAsLine: number | null };

const squash = (text: string) => text.toLowerCase().replace(/[^a-z0-9]/g, "");

/** Each field's column, guessed from the header row by the export's header or a common other name. */
export function guessMapping(headers: readonly string[]): ImportMapping {
  const squashed = headers.map(squash);
  const taken = new Set<number>();
  const mapping = {} as ImportMapping;
  for (const field of PROJECT_SHEET_FIELDS) {
    const names = [field.header, ...field.aliases].map(squash);
    const index = squashed.findIndex((h, i) => !taken.has(i) && names.includes(h));
    mapping[field.key] = index >= 0 ? index : null;
    if (index >= 0) taken.add(index);
  }
  return mapping;
}

/**
 * Two rows are the same project when the utility account number and the address (street and ZIP) agree,
 * compared without case, spaces or punctuation. A re-imported file therefore finds its projects again.
 */
export function projectMatchKey(p: { utilityAccountNumber: string | null; street: string; postalCode: string }): string {
  return [squash(p.utilityAccountNumber ?? ""), squash(p.street), p.postalCode.trim().slice(0, 5)].join("|");
}

const HEADER_OF = Object.fromEntries(PROJECT_SHEET_FIELDS.map((f) => [f.key, f.header])) as Record<ProjectSheetField, string>;
const REFERENCE_FIELD = {
  jurisdiction: "jurisdictionId",
  utility: "utilityId",
  coordinator: "coordinatorId",
  installer: "installerId",
} as const;
type ReferenceField = keyof typeof REFERENCE_FIELD;

function findNamed<T extends Named>(list: readonly T[], text: string, byEmail: boolean): T | undefined {
  const wanted = text.trim().toLowerCase();
  return list.find((x) => x.name.trim().toLowerCase() === wanted || (byEmail && "email" in x && String(x.email).toLowerCase() === wanted));
}

const REFERENCE_WORDS: Record<ReferenceField, string> = {
  jurisdiction: "is not one of your AHJs",
  utility: "is not one of your utilities",
  coordinator: "is not an active coordinator or admin of your company",
  installer: "is not an active installer of your company",
};

/** One data row checked as the project form checks it, with each problem named by its column. */
export function checkImportRow(cells: readonly string[], mapping: ImportMapping, lookups: ImportLookups) {
  const cell = (field: ProjectSheetField) => (mapping[field] === null ? "" : (cells[mapping[field]!] ?? ""));
  const problems: string[] = [];
  const input: Record<string, unknown> = {};
  for (const field of PROJECT_SHEET_FIELDS) {
    if (field.key in REFERENCE_FIELD) continue;
    input[field.key] = cell(field.key);
  }
  const lists: Record<ReferenceField, readonly Named[]> = {
    jurisdiction: lookups.jurisdictions,
    utility: lookups.utilities,
    coordinator: lookups.coordinators,
    installer: lookups.installers,
  };
  for (const ref of Object.keys(REFERENCE_FIELD) as ReferenceField[]) {
    const text = cell(ref);
    const found = text ? findNamed(lists[ref], text, ref === "coordinator" || ref === "installer") : undefined;
    if (text && !found) problems.push(`${HEADER_OF[ref]}: “${text}” ${REFERENCE_WORDS[ref]}`);
    input[REFERENCE_FIELD[ref]] = found?.id ?? "";
  }
  const parsed = ProjectInput.safeParse(input);
  if (!parsed.success)
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? "") as ProjectSheetField;
      problems.push(`${HEADER_OF[key] ?? "Row"}: ${issue.message}`);
    }
  return parsed.success && problems.length === 0 ? { values: parsed.data, problems } : { values: null, problems };
}

/**
 * Every data row's fate: ready to import, refused with its problems named, or already a project (in the
 * company, or earlier in the same file). Lines are numbered as a spreadsheet shows them (the header is line 1).
 */
export function planImport(
  rows: readonly (readonly string[])[],
  mapping: ImportMapping,
  lookups: ImportLookups,
  existing: ReadonlyMap<string, number>,
): ImportRowPlan[] {
  const missing = PROJECT_SHEET_FIELDS.filter((f) => "required" in f && f.required && mapping[f.key] === null).map((f) => f.header);
  const seen = new Map<string, number>();
  return rows.map((cells, i) => {
    const line = i + 2;
    const label = [cells[mapping.customerName ?? -1], cells[mapping.street ?? -1]].filter(Boolean).join(", ") || `Line ${line}`;
    if (missing.length) return { line, status: "problem", label, problems: [`No column is chosen for ${missing.join(", ")}`] };
    const { values, problems } = checkImportRow(cells, mapping, lookups);
    if (!values) return { line, status: "problem", label, problems };
    const key = projectMatchKey(values);
    if (existing.has(key)) return { line, status: "already", label, existingNumber: existing.get(key)!, sameAsLine: null };
    if (seen.has(key)) return { line, status: "already", label, existingNumber: null, sameAsLine: seen.get(key)! };
    seen.set(key, line);
    return { line, status: "ready", label, values, key };
  });
}
