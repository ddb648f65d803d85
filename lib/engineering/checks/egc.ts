import { atLeast, fmt, makeCheck, withArticle } from "../check-result";
import { type ClauseId, clauses } from "../clauses";
import { isDcRun } from "../design-lookup";
import { DesignInputError } from "../errors";
import { areaCmil } from "../tables/conductor-area";
import { CONDUCTOR_SIZES, type ConductorSize, isConductorSize, sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import { minimumEgcSize } from "../tables/egc";
import type { CheckResult, ConductorMaterial, ConductorRun, Design, NecEdition, Site } from "../types";
import { runMaxCurrentA } from "./circuit-current";
import { evaluateRun } from "./conductor-ampacity";
import { maxProtectiveOcpdA } from "./conductor-protection";
import { requiredOcpdA } from "./ocpd";

/**
 * The device the EGC is sized from (690.45, Table 250.122): the run's own OCPD; for AC runs without
 * one, the PV breaker; for DC runs without one, an assumed device. NEC 2017 690.45 assumes a device
 * rated at the PV maximum circuit current (1.25 × Isc); 2020 and 2023 one rated per 690.9(B), the next
 * standard rating at or above 1.25 × that current (from memory, the wording of each edition not seen).
 */
export function egcBasisA(design: Design, run: ConductorRun, edition: NecEdition): { ocpdA: number; assumed: boolean } {
  if (run.ocpdA !== undefined) return { ocpdA: run.ocpdA, assumed: false };
  if (!isDcRun(run)) return { ocpdA: design.service.pvBreakerA, assumed: false };
  const maxCurrentA = runMaxCurrentA(design, run);
  return { ocpdA: edition === 2017 ? maxCurrentA : requiredOcpdA(maxCurrentA, { fuse: true, edition }), assumed: true };
}

/** Table 250.122 size, but never larger than the circuit conductors of the same material (250.122(A)). */
export function requiredEgcSize(
  ocpdA: number,
  egcMaterial: ConductorMaterial,
  circuitSize: ConductorSize,
  circuitMaterial: ConductorMaterial,
): ConductorSize {
  const fromTable = minimumEgcSize(ocpdA, egcMaterial);
  if (egcMaterial === circuitMaterial && sizeIndex(fromTable) > sizeIndex(circuitSize)) return circuitSize;
  return fromTable;
}

// Table 8 areas are rounded to three or four figures, so a proportional increase that lands on a size
// (two AWG steps are one area ratio) can come out a hair above it; 0.5 % absorbs that rounding.
const AREA_ROUNDING = 0.005;

/** The smallest size with at least this area. */
function sizeWithAreaCmil(cmil: number): ConductorSize | null {
  return CONDUCTOR_SIZES.find((s) => areaCmil(s) >= cmil * (1 - AREA_ROUNDING)) ?? null;
}

/** The smallest circuit conductor with enough ampacity where installed and protected by the run's device: the size 250.122(B) measures an increase from. */
function minimumAmpacitySize(design: Design, site: Site, run: ConductorRun, ocpdA: number | null): ConductorSize | null {
  for (const size of CONDUCTOR_SIZES) {
    try {
      const { evaluation: e } = evaluateRun(design, site, { ...run, conductor: { ...run.conductor, size } });
      const protectedOk =
        ocpdA === null || maxProtectiveOcpdA(e.usableAmpacityA, size, run.conductor.material, site.necEdition) >= ocpdA - 1e-9;
      if (e.passesTerminal && e.passesConditions && protectedOk) return size;
    } catch (err) {
      if (!(err instanceof DesignInputError)) throw err;
    }
  }
  return null;
}

export interface EgcRequirement {
  basisA: number;
  assumed: boolean;
  tableSize: ConductorSize; // Table 250.122 for the device (capped at the circuit conductors)
  increase: { minimumSize: ConductorSize; ratio: number } | null; // circuit conductors larger than ampacity needs
  relieved: boolean; // 690.45: PV DC circuits need no increase made for voltage drop
  required: ConductorSize;
}

/**
 * The EGC a run needs: Table 250.122 for its device, increased by the circuit conductors' area ratio
 * where they are larger than ampacity requires (250.122(B)). 690.45 relieves PV DC circuits of
 * increases for voltage drop; the inverter output circuit has no such relief (the relief covers the PV
 * source and output circuits in 2017 and the PV system DC circuits after; from memory). Never larger
 * than the circuit conductors of the same material (250.122(A)).
 */
export function egcRequirement(design: Design, site: Site, run: ConductorRun, egcMaterial: ConductorMaterial): EgcRequirement {
  const { ocpdA, assumed } = egcBasisA(design, run, site.necEdition);
  const { size, material } = run.conductor;
  const tableSize = requiredEgcSize(ocpdA, egcMaterial, size, material);
  const minimumSize = minimumAmpacitySize(design, site, run, assumed ? null : ocpdA);
  const increased = minimumSize !== null && sizeIndex(size) > sizeIndex(minimumSize);
  const increase = increased ? { minimumSize: minimumSize!, ratio: areaCmil(size) / areaCmil(minimumSize!) } : null;
  const relieved = increase !== null && isDcRun(run);
  let required = tableSize;
  if (increase && !relieved) {
    const grown = sizeWithAreaCmil(areaCmil(tableSize) * increase.ratio) ?? "300";
    required = egcMaterial === material && sizeIndex(grown) > sizeIndex(size) ? size : grown;
  }
  return { basisA: ocpdA, assumed, tableSize, increase, relieved, required };
}

const metalName = (m: ConductorMaterial) => (m === "Cu" ? "copper" : "aluminum");
const kcmil = (size: ConductorSize) => areaCmil(size) / 1000;

export function checkEgc(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const edition = site.necEdition;
  if (!isConductorSize(run.conductor.size)) {
    throw new DesignInputError(
      `runs.${run.id}.conductor.size`,
      `Run "${run.label}" has conductor size "${run.conductor.size}", which our tables do not hold.`,
    );
  }
  if (run.egc && !isConductorSize(run.egc.size)) {
    throw new DesignInputError(
      `runs.${run.id}.egc.size`,
      `Run "${run.label}" has grounding conductor size "${run.egc.size}", which our tables do not hold.`,
    );
  }
  const material = run.egc?.material ?? "Cu";
  const req = egcRequirement(design, site, run, material);
  const metal = metalName(material);
  const basis = req.assumed
    ? `an assumed ${fmt(req.basisA)} A device (no fuse on this run; 690.45 ${edition === 2017 ? "takes the circuit's maximum current" : "takes a device sized per 690.9(B)"})`
    : `its ${fmt(req.basisA)} A overcurrent device`;
  const ids: ClauseId[] = isDcRun(run) ? ["pvEgc", "egcTable"] : ["egcTable"];
  if (req.increase && !req.relieved) ids.push("egcIncrease");
  let why = `by ${basis} Table 250.122 calls for ${sizeLabel(req.tableSize)}`;
  if (req.increase && !req.relieved) {
    why += `; the ${sizeLabel(run.conductor.size)} conductors are ${fmt(req.increase.ratio)} × the area of the ${sizeLabel(req.increase.minimumSize)} that ampacity needs, so 250.122(B) grows it to ${sizeLabel(req.required)}`;
  } else if (req.relieved) {
    why += ` (the conductors are larger than ampacity needs, but 690.45 does not ask PV DC circuits to grow the EGC for voltage drop)`;
  }
  const base = {
    id: `egc:${run.id}`,
    title: `Run "${run.label}" grounding conductor`,
    limit: kcmil(req.required),
    unit: "kcmil",
    clause: clauses(edition, ...ids),
    edition,
  };
  if (!run.egc) {
    return [
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        message: `Run "${run.label}" has no equipment grounding conductor entered; ${why}, ${metal}.`,
        fix: `Add ${withArticle(sizeLabel(req.required))} ${metal} equipment grounding conductor.`,
        field: `runs.${run.id}.egc`,
      }),
    ];
  }
  const ok = atLeast(kcmil(run.egc.size), kcmil(req.required));
  return [
    makeCheck({
      ...base,
      status: ok ? "pass" : "fail",
      value: kcmil(run.egc.size),
      message: `Run "${run.label}" has ${withArticle(sizeLabel(run.egc.size))} ${metal} grounding conductor; ${why}.`,
      fix: ok ? undefined : `Use ${withArticle(sizeLabel(req.required))} ${metal} equipment grounding conductor.`,
    }),
  ];
}
