import { makeCheck } from "../check-result";
import { clause, clauses } from "../clauses";
import { isDcRun } from "../design-lookup";
import { sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorRun, Site } from "../types";

/** Single conductors allowed exposed within the array: PV wire (or PV cable) and USE-2 (690.31(C)(1), from memory). */
export function isExposedArrayConductor(insulation: string | undefined): boolean {
  const kinds = (insulation ?? "").toUpperCase().replace(/\s+/g, "").split(/[/,]/);
  return kinds.some((k) => k === "PVWIRE" || k === "PV" || k === "PVCABLE" || k === "USE-2");
}

/** How a run is enclosed: a raceway (metal or not), metal-clad cable, or nothing. */
export function enclosureOf(run: ConductorRun): "metal-raceway" | "nonmetallic-raceway" | "mc-cable" | "exposed" {
  if (run.mcCable) return "mc-cable";
  if (!run.raceway) return "exposed";
  return run.raceway.type === "EMT" ? "metal-raceway" : "nonmetallic-raceway";
}

// EGCs smaller than 6 AWG need a raceway or cable armor where exposed (250.120(C)); 690.46 applies it to PV arrays.
const SMALLEST_UNPROTECTED_EGC = "6" as const;

/**
 * 690.31 wiring methods of PV DC runs: exposed single conductors must be PV wire or USE-2; DC circuits
 * inside a building run in metal raceway or Type MC cable (2017 690.31(G), 2020 on 690.31(D)); and
 * 690.46 with 250.120(C): an array EGC smaller than 6 AWG is protected by the raceway or armor.
 */
export function checkWiringMethods(site: Site, run: ConductorRun): CheckResult[] {
  if (!isDcRun(run)) return [];
  const edition = site.necEdition;
  const enclosure = enclosureOf(run);
  const results: CheckResult[] = [];
  const name = `Run "${run.label}"`;
  if (enclosure === "exposed") {
    const ok = isExposedArrayConductor(run.conductor.insulation);
    const unknown = run.conductor.insulation === undefined;
    results.push(
      makeCheck({
        id: `wiring-exposed:${run.id}`,
        title: `${name} exposed conductors`,
        status: ok ? "pass" : unknown ? "warn" : "fail",
        value: null,
        limit: null,
        unit: "",
        clause: clause("exposedWiring", edition),
        edition,
        message: ok
          ? `${name} runs exposed in ${run.conductor.insulation}, a conductor type allowed exposed within the array.`
          : unknown
            ? `${name} runs exposed, and its conductor type is not entered; exposed array wiring must be PV wire or USE-2.`
            : `${name} runs exposed in ${run.conductor.insulation}; exposed single conductors in the array must be PV wire or USE-2.`,
        fix: ok ? undefined : "Use PV wire (or USE-2), or put the conductors in a raceway.",
        field: ok ? undefined : `runs.${run.id}.insulation`,
      }),
    );
    const egc = run.egc;
    if (egc && sizeIndex(egc.size) < sizeIndex(SMALLEST_UNPROTECTED_EGC)) {
      results.push(
        makeCheck({
          id: `egc-protection:${run.id}`,
          title: `${name} grounding conductor protection`,
          status: "fail",
          value: null,
          limit: null,
          unit: "",
          clause: clauses(edition, "arrayEgc", "egcProtection"),
          edition,
          message: `${name} has an exposed ${sizeLabel(egc.size)} grounding conductor; one smaller than 6 AWG must be protected by a raceway or cable armor.`,
          fix: "Use a 6 AWG grounding conductor, or run it in the raceway.",
          field: `runs.${run.id}.egc`,
        }),
      );
    }
  }
  const inside = run.insideBuilding;
  const metal = enclosure === "metal-raceway" || enclosure === "mc-cable";
  const insideBase = {
    id: `wiring-inside:${run.id}`,
    title: `${name} inside the building`,
    value: null,
    limit: null,
    unit: "",
    clause: clause("dcInsideBuilding", edition),
    edition,
  };
  if (inside === undefined) {
    results.push(
      makeCheck({
        ...insideBase,
        status: metal ? "pass" : "warn",
        message: metal
          ? `${name} is in ${enclosure === "mc-cable" ? "Type MC cable" : "metal raceway"}, which DC circuits inside a building need, wherever it runs.`
          : `The design does not say whether ${name} passes inside the building; DC circuits inside a building must be in metal raceway or Type MC cable.`,
        fix: metal ? undefined : "Say whether the run enters the building (attic, walls, garage).",
        field: metal ? undefined : `runs.${run.id}.insideBuilding`,
      }),
    );
  } else if (inside) {
    results.push(
      makeCheck({
        ...insideBase,
        status: metal ? "pass" : "fail",
        message: metal
          ? `${name} passes inside the building in ${enclosure === "mc-cable" ? "Type MC cable" : "metal raceway"}.`
          : `${name} passes inside the building ${enclosure === "exposed" ? "without a raceway" : "in nonmetallic raceway"}; DC circuits inside a building must be in metal raceway or Type MC cable up to the first readily accessible disconnect.`,
        fix: metal ? undefined : "Run it in EMT (or another metal raceway) or in Type MC cable inside the building.",
        field: metal ? undefined : `runs.${run.id}.racewayType`,
      }),
    );
  }
  return results;
}
