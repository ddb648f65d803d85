import { STAGES, STAGE_LABELS, stageIndex, type Stage } from "../stages";
import { isFiled, type FilingStatus } from "./statuses";

/** One authority's filing, as far as the stage needs it. */
export type FilingFacts = { status: FilingStatus; referenceNumber: string | null; submittedAt: string | null; decidedAt: string | null };

/** The facts of a project that move its stage; each date says when the fact became true. */
export type StageFacts = {
  designChecked: boolean;
  permit: FilingFacts | null;
  interconnection: FilingFacts | null;
  /** When the crew's work first showed: an inspection recorded or the field record begun. */
  installedAt: string | null;
  finalInspectionPassedAt: string | null;
  commissionedAt: string | null;
  ptoAt: string | null;
};

/** A stage the facts reach, with the fact that reached it. */
export type StageReason = { stage: Stage; fact: string; at: string | null };

type Rule = { holds: (f: StageFacts) => boolean; fact: string; at: (f: StageFacts) => string | null; implies?: readonly Stage[] };

const approved = (filing: FilingFacts | null) => filing?.status === "approved" && Boolean(filing.referenceNumber?.trim());

/**
 * The fact behind each stage. A later fact stands in for earlier ones it cannot happen without (a passed
 * final inspection means the work was installed under an issued permit); PTO stands in for everything.
 * "Closed" has no fact: the office closes a project by hand.
 */
const RULES: Partial<Record<Stage, Rule>> = {
  draft: { holds: () => true, fact: "Project created", at: () => null },
  design_checked: { holds: (f) => f.designChecked, fact: "The design passes its review", at: () => null },
  permit_filed: {
    holds: (f) => Boolean(f.permit && isFiled(f.permit.status)),
    fact: "Permit application submitted",
    at: (f) => f.permit?.submittedAt ?? null,
    implies: ["design_checked"],
  },
  permit_issued: {
    holds: (f) => approved(f.permit),
    fact: "Permit issued with its number",
    at: (f) => f.permit?.decidedAt ?? null,
    implies: ["design_checked", "permit_filed"],
  },
  installed: { holds: (f) => f.installedAt !== null, fact: "Installation under way", at: (f) => f.installedAt },
  inspection_passed: {
    holds: (f) => f.finalInspectionPassedAt !== null,
    fact: "Final inspection passed",
    at: (f) => f.finalInspectionPassedAt,
    implies: ["design_checked", "permit_filed", "permit_issued", "installed"],
  },
  utility_filed: {
    holds: (f) => Boolean(f.interconnection && isFiled(f.interconnection.status)),
    fact: "Interconnection application submitted",
    at: (f) => f.interconnection?.submittedAt ?? null,
  },
  utility_approved: {
    holds: (f) => approved(f.interconnection),
    fact: "Interconnection approved",
    at: (f) => f.interconnection?.decidedAt ?? null,
    implies: ["utility_filed"],
  },
  commissioned: {
    holds: (f) => f.commissionedAt !== null,
    fact: "Field record completed",
    at: (f) => f.commissionedAt,
    implies: ["installed"],
  },
  pto_received: {
    holds: (f) => f.ptoAt !== null,
    fact: "Permission to operate received",
    at: (f) => f.ptoAt,
    implies: STAGES.slice(0, stageIndex("pto_received")),
  },
};

/** The stages that stand for a recorded fact: moving past one by hand asks for a reason. */
export const FACT_STAGES: readonly Stage[] = [
  "permit_filed",
  "permit_issued",
  "inspection_passed",
  "utility_filed",
  "utility_approved",
  "commissioned",
  "pto_received",
];

/**
 * The stage the facts reach: the end of the unbroken run of facts from the start of the line, where a
 * fact that holds stands in for the earlier stages it implies, and a stage set by hand stands in for every
 * stage up to it. Facts further along that are already true (an interconnection filed the same day as the
 * permit) wait until the run reaches them.
 */
export function stageFromFacts(facts: StageFacts, handStage: Stage | null = null): { stage: Stage; reached: StageReason[] } {
  const implied = new Set<Stage>();
  for (const stage of STAGES) {
    const rule = RULES[stage];
    if (rule?.holds(facts)) for (const earlier of rule.implies ?? []) implied.add(earlier);
  }
  const byHand = handStage ? stageIndex(handStage) : -1;
  const reached: StageReason[] = [];
  for (const stage of STAGES) {
    const rule = RULES[stage];
    if (rule?.holds(facts)) reached.push({ stage, fact: rule.fact, at: rule.at(facts) });
    else if (stageIndex(stage) <= byHand) reached.push({ stage, fact: "Set by hand", at: null });
    else if (rule && implied.has(stage)) reached.push({ stage, fact: "Implied by a later fact", at: null });
    else break;
  }
  return { stage: reached[reached.length - 1]!.stage, reached };
}

/** The stages a hand move from the current stage to the target passes whose facts are not recorded. */
export function stagesSkippedBy(target: Stage, facts: StageFacts, current: Stage): Stage[] {
  const { reached } = stageFromFacts(facts);
  const held = new Set(reached.map((r) => r.stage));
  for (const stage of STAGES) if (RULES[stage]?.holds(facts)) held.add(stage);
  return STAGES.slice(stageIndex(current) + 1, stageIndex(target) + 1).filter((stage) => FACT_STAGES.includes(stage) && !held.has(stage));
}

/** Words for the stages a hand move skips, for the reason prompt and the audit row. */
export function skippedFactsText(stages: readonly Stage[]): string {
  return stages.map((s) => STAGE_LABELS[s]).join(", ");
}

/** The project's stage: what the facts reach, counting a stage set by hand as standing for those before it. */
export function resolveStage(facts: StageFacts, handSet: Stage | null): Stage {
  return stageFromFacts(facts, handSet).stage;
}
