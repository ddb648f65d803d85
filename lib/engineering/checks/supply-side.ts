import { atLeast, atMost, fmt, makeCheck, withArticle } from "../check-result";
import { clause, clauses } from "../clauses";
import { totalInverterOutputA } from "../design-lookup";
import { tableAmpacityA } from "../tables/ampacity";
import { sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorMaterial, ConductorSize, Design, Site } from "../types";
import { CONTINUOUS_MULTIPLIER } from "./conductor-ampacity";

// 705.11 (2020 on): supply-side source conductors from the tap to their overcurrent device are sized for
// 125 % of the inverter output, not smaller than 6 AWG copper or 4 AWG aluminum, and the device sits
// within 10 ft of the connection to the service (from memory). 2017's 705.12(A) sets neither.
export const SUPPLY_SIDE_MIN_SIZE: Readonly<Record<ConductorMaterial, ConductorSize>> = { Cu: "6", Al: "4" };
export const SUPPLY_SIDE_MAX_TAP_FT = 10;
// Service equipment terminals are taken at 75 °C (from memory; supply-side connectors and disconnects are so marked).
const SUPPLY_SIDE_TERMINAL_C = 75 as const;

export function checkSupplySideConductors(design: Design, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const c = design.service.supplySideConductors;
  const ref = clauses(edition, "supplySide", "supplySideAllowed");
  if (!c) {
    return [
      makeCheck({
        id: "supply-side-conductors",
        title: "Supply-side conductors",
        status: "warn",
        value: null,
        limit: null,
        unit: "",
        clause: ref,
        edition,
        field: "service.supplySideConductors",
        message:
          "The conductors from the service tap to the PV overcurrent device are not entered, so their size and length are not checked.",
        fix: "Enter their size, material and length to the overcurrent device.",
      }),
    ];
  }
  const results: CheckResult[] = [];
  const ocpdA = design.service.pvBreakerA;
  const neededA = Math.max(CONTINUOUS_MULTIPLIER * totalInverterOutputA(design), ocpdA);
  const ampacityA = tableAmpacityA(c.size, c.material, SUPPLY_SIDE_TERMINAL_C, edition);
  const minimum = edition === 2017 ? null : SUPPLY_SIDE_MIN_SIZE[c.material];
  const bigEnough = minimum === null || sizeIndex(c.size) >= sizeIndex(minimum);
  const ampOk = atLeast(ampacityA, neededA);
  const metal = c.material === "Cu" ? "copper" : "aluminum";
  results.push(
    makeCheck({
      id: "supply-side-conductors",
      title: "Supply-side conductors",
      status: bigEnough && ampOk ? "pass" : "fail",
      value: ampacityA,
      limit: neededA,
      unit: "A",
      clause: `${ref}, 240.4`,
      edition,
      message: `The ${sizeLabel(c.size)} ${metal} supply-side conductors carry ${ampacityA} A at 75 °C; they need at least ${fmt(neededA)} A (125 % of the inverter output, and the ${ocpdA} A device that protects them)${minimum ? ` and at least ${sizeLabel(minimum)} ${metal}` : ""}.`,
      fix:
        bigEnough && ampOk
          ? undefined
          : `Use larger conductors: at least ${minimum && !bigEnough ? withArticle(sizeLabel(minimum)) : `${fmt(neededA)} A of ampacity`}.`,
    }),
  );
  if (edition !== 2017) {
    const len = c.lengthToOcpdFt;
    const ok = len !== undefined && atMost(len, SUPPLY_SIDE_MAX_TAP_FT);
    results.push(
      makeCheck({
        id: "supply-side-ocpd-location",
        title: "Supply-side overcurrent device location",
        status: len === undefined ? "warn" : ok ? "pass" : "fail",
        value: len ?? null,
        limit: SUPPLY_SIDE_MAX_TAP_FT,
        unit: "ft",
        clause: clause("supplySide", edition),
        edition,
        message:
          len === undefined
            ? "The length from the service tap to the PV overcurrent device is not entered; the device must be within 10 ft of the connection."
            : `The PV overcurrent device is ${fmt(len)} ft from the service tap, ${ok ? "within" : "beyond"} the 10 ft allowed.`,
        fix: ok ? undefined : "Place the PV overcurrent device within 10 ft of the connection to the service conductors.",
        field: ok ? undefined : "service.supplySideConductors.lengthToOcpdFt",
      }),
    );
  }
  return results;
}
