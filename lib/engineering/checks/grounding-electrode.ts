import { makeCheck, withArticle } from "../check-result";
import { type ClauseId, clauses } from "../clauses";
import { areaCmil } from "../tables/conductor-area";
import { sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import { ROD_ELECTRODE_GEC_CAP, table250_66GecSize } from "../tables/gec";
import type { CheckResult, ConductorSize, Design, Site } from "../types";

/**
 * 690.47 and Table 250.66, where the design adds a grounding electrode conductor: sized from the largest
 * service-entrance conductor, but a GEC that is the sole connection to a rod, pipe or plate electrode need
 * not exceed 6 AWG copper (250.66(A)). An 8 AWG GEC needs a raceway or armor (250.64(B), from memory).
 */
export function checkGroundingElectrodeConductor(design: Design, site: Site): CheckResult[] {
  const gec = design.groundingElectrodeConductor;
  if (!gec) return [];
  const edition = site.necEdition;
  const service = design.service.serviceConductor;
  const cap: ConductorSize = ROD_ELECTRODE_GEC_CAP[gec.material];
  const rod = gec.electrode === "rod-pipe-plate";
  const ids: ClauseId[] = ["pvGrounding", "gecTable"];
  if (rod) ids.push("gecRodCap");
  const base = {
    id: "gec",
    title: "Grounding electrode conductor",
    unit: "kcmil",
    clause: clauses(edition, ...ids),
    edition,
    value: areaCmil(gec.size) / 1000,
  };
  const metal = gec.material === "Cu" ? "copper" : "aluminum";
  let required: ConductorSize | null = service ? table250_66GecSize(service, gec.material) : null;
  if (required !== null && rod && sizeIndex(required) > sizeIndex(cap)) required = cap;
  const results: CheckResult[] = [];
  if (required === null) {
    // Without the service conductor size only the rod-electrode cap can settle it.
    const settled = rod && sizeIndex(gec.size) >= sizeIndex(cap);
    results.push(
      makeCheck({
        ...base,
        status: settled ? "pass" : "warn",
        limit: settled ? areaCmil(cap) / 1000 : null,
        message: settled
          ? `The ${sizeLabel(gec.size)} ${metal} GEC to a rod, pipe or plate electrode is at least ${sizeLabel(cap)}, the most such a connection needs.`
          : `The ${sizeLabel(gec.size)} ${metal} GEC cannot be checked against Table 250.66: the size of the largest service-entrance conductor is not entered.`,
        fix: settled ? undefined : "Enter the service-entrance conductor size and material.",
        field: settled ? undefined : "service.serviceConductor",
      }),
    );
  } else {
    const ok = sizeIndex(gec.size) >= sizeIndex(required);
    results.push(
      makeCheck({
        ...base,
        status: ok ? "pass" : "fail",
        limit: areaCmil(required) / 1000,
        message: `The ${sizeLabel(gec.size)} ${metal} GEC ${ok ? "meets" : "is smaller than"} the ${sizeLabel(required)} that ${service ? `${sizeLabel(service.size)} ${service.material === "Cu" ? "copper" : "aluminum"} service conductors` : "the service"} call for${rod ? " (a rod, pipe or plate electrode caps it at 6 AWG copper)" : ""}.`,
        fix: ok ? undefined : `Use ${withArticle(sizeLabel(required))} ${metal} grounding electrode conductor.`,
      }),
    );
  }
  if (gec.size === "8") {
    results.push(
      makeCheck({
        id: "gec-protection",
        title: "Grounding electrode conductor protection",
        status: "warn",
        value: null,
        limit: null,
        unit: "",
        clause: clauses(edition, "gecProtection"),
        edition,
        message: "An 8 AWG grounding electrode conductor must run in a raceway or cable armor for its whole length.",
        fix: "Show the 8 AWG GEC in a raceway, or use 6 AWG.",
      }),
    );
  }
  return results;
}
