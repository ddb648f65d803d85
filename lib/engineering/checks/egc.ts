import { makeCheck } from "../check-result";
import { clauses } from "../clauses";
import { isDcRun } from "../design-lookup";
import { DesignInputError } from "../errors";
import { minimumEgcSize } from "../tables/egc";
import { type ConductorSize, isConductorSize, sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorMaterial, ConductorRun, Design, Site } from "../types";
import { runMaxCurrentA } from "./circuit-current";

/**
 * The device the EGC is sized from: the run's own OCPD; for AC runs without one, the PV
 * breaker; for DC runs without one, 690.45 assumes a device rated at the circuit's maximum current.
 */
export function egcBasisA(design: Design, run: ConductorRun): { ocpdA: number; assumed: boolean } {
  if (run.ocpdA !== undefined) return { ocpdA: run.ocpdA, assumed: false };
  if (!isDcRun(run)) return { ocpdA: design.service.pvBreakerA, assumed: false };
  return { ocpdA: runMaxCurrentA(design, run), assumed: true };
}

/** Table 250.122 size, but never larger than the circuit conductors of the same material (250.122(A)). */
export function requiredEgcSize(ocpdA: number, egcMaterial: ConductorMaterial, circuitSize: ConductorSize, circuitMaterial: ConductorMaterial): ConductorSize {
  const fromTable = minimumEgcSize(ocpdA, egcMaterial);
  if (egcMaterial === circuitMaterial && sizeIndex(fromTable) > sizeIndex(circuitSize)) return circuitSize;
  return fromTable;
}

export function checkEgc(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const edition = site.necEdition;
  if (!isConductorSize(run.conductor.size)) {
    throw new DesignInputError(`runs.${run.id}.conductor.size`, `Run "${run.label}" has conductor size "${run.conductor.size}", which our tables do not hold.`);
  }
  const { ocpdA, assumed } = egcBasisA(design, run);
  const material = run.egc?.material ?? "Cu";
  const required = requiredEgcSize(ocpdA, material, run.conductor.size, run.conductor.material);
  const metal = material === "Cu" ? "copper" : "aluminum";
  const basis = assumed ? `an assumed ${Math.round(ocpdA * 100) / 100} A device (no fuse on this run)` : `its ${ocpdA} A overcurrent device`;
  const clauseText = clauses(edition, ...(isDcRun(run) ? (["pvEgc", "egcTable"] as const) : (["egcTable"] as const)));
  if (!run.egc) {
    return [
      makeCheck({
        id: `egc:${run.id}`,
        title: `Run "${run.label}" grounding conductor`,
        status: "warn",
        value: null,
        limit: null,
        unit: "",
        clause: clauseText,
        edition,
        message: `Run "${run.label}" has no equipment grounding conductor entered; by ${basis} it needs at least ${sizeLabel(required)} ${metal}.`,
        fix: `Add a ${sizeLabel(required)} ${metal} equipment grounding conductor.`,
      }),
    ];
  }
  if (!isConductorSize(run.egc.size)) {
    throw new DesignInputError(`runs.${run.id}.egc.size`, `Run "${run.label}" has grounding conductor size "${run.egc.size}", which our tables do not hold.`);
  }
  const ok = sizeIndex(run.egc.size) >= sizeIndex(required);
  return [
    makeCheck({
      id: `egc:${run.id}`,
      title: `Run "${run.label}" grounding conductor`,
      status: ok ? "pass" : "fail",
      value: null,
      limit: null,
      unit: "",
      clause: clauseText,
      edition,
      message: `Run "${run.label}" has a ${sizeLabel(run.egc.size)} ${metal} grounding conductor; by ${basis} it needs at least ${sizeLabel(required)}.`,
      fix: ok ? undefined : `Use a ${sizeLabel(required)} ${metal} equipment grounding conductor.`,
    }),
  ];
}
