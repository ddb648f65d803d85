import { circuitConductorCount, unlessInputError } from "@/lib/engineering";
import { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { runDesignReview, type DesignReviewOutcome } from "./run-review";
import type { SiteConditions } from "./to-engine";

/** One entry the form's schema refuses, at its dotted path. */
export type FormIssue = { path: string; message: string };

/**
 * Everything the editor shows from the engine and the schema for what it holds: the review, the form's
 * issues (before the editor picks which to show) and each run's counted current-carrying conductors.
 * Plain data, so the page can work it out on the server for the first paint and hand it to the editor.
 */
export type EditorChecks = {
  outcome: DesignReviewOutcome;
  issues: FormIssue[];
  /** By run id, once the design reviews; null where the entries do not allow the count yet. */
  countedConductors: Record<string, number | null>;
};

/**
 * The editor's checks of whatever it holds. The same function runs on the server for the page's first
 * paint and in the browser on every change, once this module has loaded after hydration.
 */
export function checkEditorValues(values: unknown, catalog: EquipmentDto[], conditions: SiteConditions | null): EditorChecks {
  const parsed = DesignInput.safeParse(values);
  const issues = parsed.success ? [] : parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
  const outcome = runDesignReview(values, catalog, conditions);
  const countedConductors: Record<string, number | null> = {};
  if (outcome.status === "reviewed")
    for (const run of outcome.design.runs)
      // Two runs sharing an id: the first one speaks for it, as a lookup by id finds it.
      if (!(run.id in countedConductors)) countedConductors[run.id] = unlessInputError(() => circuitConductorCount(outcome.design, run));
  return { outcome, issues, countedConductors };
}
