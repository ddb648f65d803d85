import type { ImportMapping } from "@/lib/spreadsheets/project-import";

/** One data row of an import as the preview and the result show it. */
export type ImportRowDto = {
  line: number;
  label: string;
  status: "ready" | "problem" | "already" | "imported";
  problems: string[];
  /** The project it matched (already) or became (imported). */
  projectNumber: number | null;
  projectId: string | null;
  sameAsLine: number | null;
};

export type ImportPreviewDto = {
  mapping: ImportMapping;
  problem: string | null;
  rows: ImportRowDto[];
  counts: { ready: number; problem: number; already: number; imported: number };
};
