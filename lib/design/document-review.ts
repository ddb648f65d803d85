import { DesignInputError, reviewDesign } from "@/lib/engineering";
import { DesignDocument } from "./document";
import { problemsError, problemsOfZod } from "./document-problems";
import { documentToEngine, type DocumentSources } from "./document-to-engine";
import { toReviewJson, type ReviewJson } from "./review-json";
import type { DesignProblem } from "./to-engine";

export type DocumentReviewOutcome = { ok: true; review: ReviewJson } | { ok: false; problems: DesignProblem[] };

const SITE_PATHS: Record<string, string> = {
  "site.necEdition": "codeEdition",
  "site.recordLowTempC": "site.recordLowC",
  "site.highDesignTempC": "site.highAmbientC",
};

/** Points an engine input error back at the document field it came from. */
function documentPathOf(field: string, sources: DocumentSources): string {
  if (field === "roofPlanes") return sources.roofPlanesGiven ? "roofPlanes" : "strings"; // the module count came from the strings
  if (field === "module" || field.startsWith("module.")) return `modules[${sources.moduleIndex}]`;
  if (field.startsWith("moduleLevelDevice")) return sources.deviceIndex === null ? "optimizers" : `optimizers[${sources.deviceIndex}]`;
  // The engine names a battery bank by its id; the document lists batteries by position.
  const bank = /^storage\.banks\.([^.]+)(\.unit)?(.*)$/.exec(field);
  if (bank && sources.batteryIds?.includes(bank[1]!)) return `storage.batteries[${sources.batteryIds.indexOf(bank[1]!)}]${bank[3]}`;
  if (field.startsWith("storage.pcs")) return field.replace("storage.pcs", "storage.powerControl");
  return SITE_PATHS[field] ?? field;
}

/**
 * Any JSON value → the review of the design document it holds, or every problem
 * with its JSON path. Pure, and never throws for bad input.
 */
export function reviewDocument(body: unknown): DocumentReviewOutcome {
  const parsed = DesignDocument.safeParse(body);
  if (!parsed.success) return { ok: false, problems: problemsOfZod(parsed.error) };
  const input = documentToEngine(parsed.data);
  if (!input.ok) return input;
  try {
    const result = reviewDesign(input.design, input.site);
    return { ok: true, review: toReviewJson(result, input.sources) };
  } catch (err) {
    if (!(err instanceof DesignInputError)) throw err;
    return { ok: false, problems: [{ path: documentPathOf(err.field, input.sources), message: err.message }] };
  }
}

/** For route handlers: the review, or a 422 AppError naming every problem by its JSON path. */
export function reviewDocumentOrThrow(body: unknown): ReviewJson {
  const outcome = reviewDocument(body);
  if (outcome.ok) return outcome.review;
  const n = outcome.problems.length;
  throw problemsError(`The design document has ${n} problem${n === 1 ? "" : "s"}; each is listed under its JSON path.`, outcome.problems);
}
