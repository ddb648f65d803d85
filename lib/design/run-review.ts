import { DesignInputError, reviewDesign, type Design, type ReviewResult, type Site } from "@/lib/engineering";
import { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { toEngineInput, type DesignProblem, type SiteConditions } from "./to-engine";

export type DesignReviewOutcome = { status: "incomplete"; problems: DesignProblem[] } | { status: "reviewed"; review: ReviewResult; design: Design; site: Site };

/**
 * From whatever the editor holds to a review: the problems that keep the
 * review from running, or its full result. Pure, so the editor runs it on
 * every keystroke and the server runs the same code on save.
 */
export function runDesignReview(draft: unknown, catalog: EquipmentDto[], conditions: SiteConditions | null): DesignReviewOutcome {
  const parsed = DesignInput.safeParse(draft);
  const problems: DesignProblem[] = parsed.success ? [] : parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
  if (!conditions) problems.unshift({ path: "project.jurisdiction", message: "Choose the project's AHJ (edit the project) so the review knows the NEC edition and design temperatures" });
  if (!parsed.success || !conditions) return { status: "incomplete", problems };
  const input = toEngineInput(parsed.data, catalog, conditions);
  if (!input.ok) return { status: "incomplete", problems: input.problems };
  try {
    return { status: "reviewed", review: reviewDesign(input.design, input.site), design: input.design, site: input.site };
  } catch (error) {
    if (error instanceof DesignInputError) return { status: "incomplete", problems: [{ path: error.field ?? "", message: error.message }] };
    throw error;
  }
}
