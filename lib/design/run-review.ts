import {
  DesignInputError,
  reviewArray,
  reviewDesign,
  type CheckResult,
  type Design,
  type ReviewResult,
  type Site,
} from "@/lib/engineering";
import { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { toArrayDesign, toEngineInput, type DesignProblem, type SiteConditions } from "./to-engine";

export type DesignReviewOutcome =
  | { status: "incomplete"; problems: DesignProblem[]; partial: CheckResult[] }
  | { status: "reviewed"; review: ReviewResult; design: Design; site: Site };

const at = (value: unknown, ...keys: (string | number)[]): unknown =>
  keys.reduce<unknown>(
    (node, key) => (node && typeof node === "object" ? (node as Record<string | number, unknown>)[key] : undefined),
    value,
  );
const text = (v: unknown) => (typeof v === "string" && v.trim() ? v.trim() : null);

/** What a problem's path points at, in the words of the form: a run by its name, a string by its id. */
function subjectOf(values: unknown, path: (string | number)[]): string | null {
  const [part, list, index] = path;
  if (part === "runs" && typeof list === "number") return `Run "${text(at(values, "runs", list, "label")) ?? list + 1}"`;
  if (part === "array" && list === "strings" && typeof index === "number")
    return `String ${text(at(values, "array", "strings", index, "lineId")) ?? index + 1}`;
  if (part === "array" && list === "roofPlanes" && typeof index === "number")
    return `Roof plane "${text(at(values, "array", "roofPlanes", index, "label")) ?? index + 1}"`;
  if (part === "equipment" && list === "inverters" && typeof index === "number")
    return `Inverter line ${text(at(values, "equipment", "inverters", index, "lineId")) ?? index + 1}`;
  return null;
}

/** A form problem that says which run, string or plane it belongs to. */
function named(values: unknown, path: (string | number)[], message: string): DesignProblem {
  const subject = subjectOf(values, path);
  return { path: path.join("."), message: subject ? `${subject}: ${message[0]!.toLowerCase()}${message.slice(1)}` : message };
}

/**
 * The checks the equipment and strings already allow, while other steps are incomplete: a string that
 * is too long shows on step 2, before the service and the runs are entered.
 */
function partialChecks(values: unknown, catalog: EquipmentDto[], conditions: SiteConditions | null): CheckResult[] {
  if (!conditions) return [];
  const equipment = DesignInput.shape.equipment.safeParse(at(values, "equipment"));
  if (!equipment.success) return [];
  const rawLines = at(values, "array", "strings");
  const lineSchema = DesignInput.shape.array.shape.strings.element;
  const lines = (Array.isArray(rawLines) ? rawLines : []).flatMap((line) => {
    const parsed = lineSchema.safeParse(line);
    return parsed.success ? [parsed.data] : [];
  });
  const mount = at(values, "array", "mount") === "ground" ? "ground" : "roof";
  const design = toArrayDesign(equipment.data, lines, mount, equipment.data.listedRapidShutdownSystem, catalog);
  if (!design) return [];
  const isDwelling = at(values, "site", "isDwelling") !== false;
  try {
    return reviewArray(design, { ...conditions, isDwelling });
  } catch (error) {
    if (error instanceof DesignInputError) return [];
    throw error;
  }
}

/**
 * From whatever the editor holds to a review: the problems that keep the
 * review from running (with the checks that can already run), or its full
 * result. Pure, so the editor runs it on every keystroke and the server runs
 * the same code on save.
 */
export function runDesignReview(draft: unknown, catalog: EquipmentDto[], conditions: SiteConditions | null): DesignReviewOutcome {
  const parsed = DesignInput.safeParse(draft);
  const problems: DesignProblem[] = parsed.success
    ? []
    : parsed.error.issues.map((i) => named(draft, i.path as (string | number)[], i.message));
  if (!conditions)
    problems.unshift({
      path: "project.jurisdiction",
      message: "Choose the project's AHJ (edit the project) so the review knows the NEC edition and design temperatures",
    });
  if (!parsed.success || !conditions) return { status: "incomplete", problems, partial: partialChecks(draft, catalog, conditions) };
  const input = toEngineInput(parsed.data, catalog, conditions);
  if (!input.ok) return { status: "incomplete", problems: input.problems, partial: partialChecks(draft, catalog, conditions) };
  try {
    return { status: "reviewed", review: reviewDesign(input.design, input.site), design: input.design, site: input.site };
  } catch (error) {
    if (error instanceof DesignInputError)
      return {
        status: "incomplete",
        problems: [{ path: error.field ?? "", message: error.message }],
        partial: partialChecks(draft, catalog, conditions),
      };
    throw error;
  }
}
