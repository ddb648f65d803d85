/** The life of a project, in order. Keys are stored; labels are shown. */
export const STAGES = [
  "draft",
  "design_checked",
  "permit_filed",
  "permit_issued",
  "installed",
  "inspection_passed",
  "utility_filed",
  "utility_approved",
  "commissioned",
  "pto_received",
  "closed",
] as const;

export type Stage = (typeof STAGES)[number];

export const STAGE_LABELS: Record<Stage, string> = {
  draft: "Draft",
  design_checked: "Design checked",
  permit_filed: "Permit filed",
  permit_issued: "Permit issued",
  installed: "Installed",
  inspection_passed: "Inspection passed",
  utility_filed: "Utility filed",
  utility_approved: "Utility approved",
  commissioned: "Commissioned",
  pto_received: "PTO received",
  closed: "Closed",
};

/** What the office does next in each stage, shown on the dashboard. */
export const NEXT_ACTION: Record<Stage, string> = {
  draft: "Finish the design and run the review",
  design_checked: "Assemble and file the permit packet",
  permit_filed: "Follow up with the AHJ on plan review",
  permit_issued: "Schedule the crew",
  installed: "Book the AHJ inspection",
  inspection_passed: "File the interconnection application",
  utility_filed: "Follow up with the utility",
  utility_approved: "Commission the system on site",
  commissioned: "Send the certificate of completion, wait for PTO",
  pto_received: "Hand over to the customer and close",
  closed: "Nothing left to do",
};

/** The design review's latest outcome as the project knows it; null when no design was saved yet. */
export type DesignReviewState = "incomplete" | "pass" | "warn" | "fail" | null;

/**
 * What the office does next: the stage's usual step, unless the design says otherwise. A draft whose
 * review passes is ready to be marked checked; a checked design that no longer passes needs fixing first.
 */
export function nextActionFor(stage: Stage, review: DesignReviewState, hold: "on_hold" | "cancelled" | null = null): string {
  // A project set aside waits for the office's decision, whatever its stage would ask next.
  if (hold === "on_hold") return "On hold: take it up again once the reason is resolved";
  if (hold === "cancelled") return "Cancelled: nothing to do unless it is reopened";
  const passes = review === "pass" || review === "warn";
  if (stage === "draft") {
    if (passes)
      return review === "warn"
        ? "Read the checks that need review, then mark the design checked"
        : "The review passes: mark the design checked";
    if (review === "fail") return "Fix the failing checks of the design review";
    return NEXT_ACTION.draft;
  }
  if (stage === "design_checked" && !passes) return "The design no longer passes its review: fix it before filing";
  return NEXT_ACTION[stage];
}

export function isStage(value: string): value is Stage {
  return (STAGES as readonly string[]).includes(value);
}

export function stageIndex(stage: Stage): number {
  return STAGES.indexOf(stage);
}
