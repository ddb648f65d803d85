import { z } from "zod";
import { PROJECT_SHEET_FIELDS, type ProjectSheetField } from "@/lib/spreadsheets/project-columns";
import { safeString } from "./fields";

/** Server actions take at most 1 MB; the file's text must fit with room for the mapping. */
export const IMPORT_MAX_CHARS = 900_000;

const column = z.number().int().min(0).max(999).nullable();
const MappingShape = Object.fromEntries(PROJECT_SHEET_FIELDS.map((f) => [f.key, column])) as Record<ProjectSheetField, typeof column>;

/** A spreadsheet's text and which column feeds each project field. */
export const ProjectImportInput = z.object({
  csv: safeString().max(IMPORT_MAX_CHARS, "The file is larger than 900 KB; split it and import the parts one after the other"),
  mapping: z.object(MappingShape).strict(),
});
export type ProjectImportInput = z.infer<typeof ProjectImportInput>;
