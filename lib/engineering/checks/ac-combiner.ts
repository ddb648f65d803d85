import { atMost, fmt, makeCheck } from "../check-result";
import { clause } from "../clauses";
import { microInverters } from "../design-lookup";
import type { CheckResult, ConductorRun, Design, Site } from "../types";

/** Runs that carry one micro-inverter line each: the branch circuits landing in the AC combiner. */
function branchRuns(design: Design): ConductorRun[] {
  const micro = new Set(microInverters(design).map((i) => i.id));
  return design.runs.filter(
    (r) => r.circuit.kind === "ac-output" && r.circuit.sources.length === 1 && micro.has(r.circuit.sources[0]!.inverterId),
  );
}

/** Whether branch circuits are joined in an AC combiner panel: a run carries the combined output of more than one micro-inverter line. */
export function hasAcCombiner(design: Design): boolean {
  const micro = new Set(microInverters(design).map((i) => i.id));
  return design.runs.some(
    (r) =>
      r.circuit.kind === "ac-output" && r.circuit.combined !== false && r.circuit.sources.filter((s) => micro.has(s.inverterId)).length > 1,
  );
}

/**
 * The busbar of an AC combiner panel for micro-inverter branch circuits is fed by sources only: by the
 * sum rule of 705.12 its breakers (other than the one feeding out) must not total more than its rating.
 */
export function checkAcCombiner(design: Design, site: Site): CheckResult[] {
  if (!hasAcCombiner(design)) return [];
  const edition = site.necEdition;
  const combiner = design.acCombiner;
  const base = { id: "ac-combiner-busbar", title: "AC combiner busbar", unit: "A", clause: clause("loadSideSum", edition), edition };
  const branches = branchRuns(design);
  const breakersA =
    combiner?.breakersA ?? (branches.every((r) => r.ocpdA !== undefined) && branches.length > 0 ? branches.map((r) => r.ocpdA!) : null);
  if (combiner?.busbarA === undefined || breakersA === null) {
    return [
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        limit: combiner?.busbarA ?? null,
        field: combiner?.busbarA === undefined ? "acCombiner.busbarA" : "acCombiner.breakersA",
        message:
          combiner?.busbarA === undefined
            ? "The branch circuits are joined in an AC combiner panel whose busbar rating is not entered, so its load is not checked."
            : "The breakers in the AC combiner panel are not known: enter them, or the breaker of each branch run.",
        fix: "Enter the AC combiner's busbar rating and its branch breakers.",
      }),
    ];
  }
  const sumA = breakersA.reduce((a, b) => a + b, 0);
  const ok = atMost(sumA, combiner.busbarA);
  return [
    makeCheck({
      ...base,
      status: ok ? "pass" : "fail",
      value: sumA,
      limit: combiner.busbarA,
      message: `The AC combiner's ${breakersA.length === 1 ? "breaker totals" : `${breakersA.length} branch breakers total`} ${fmt(sumA)} A, ${ok ? "within" : "above"} its ${combiner.busbarA} A busbar.`,
      fix: ok ? undefined : "Use a combiner with a larger busbar, or fewer branch circuits in it.",
    }),
  ];
}
