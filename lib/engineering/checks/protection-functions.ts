import { fmt, makeCheck } from "../check-result";
import { clause } from "../clauses";
import type { ArrayDesign, CheckResult, Inverter, Site } from "../types";
import { stringMaxVoltageV } from "./system-voltage";

// 690.11: DC circuits of 80 V or more on or in buildings need listed arc-fault protection; 690.41(B):
// DC circuits above 30 V or 8 A need ground-fault protection. Both usually come from the inverter's
// listing (from memory, each edition).
export const ARC_FAULT_FROM_V = 80;
export const GROUND_FAULT_ABOVE_V = 30;
export const GROUND_FAULT_ABOVE_A = 8;

/** The highest DC voltage into an inverter: its strings' maximum, or one module's cold Voc for a micro-inverter. */
function dcVoltageIntoV(design: ArrayDesign, site: Site, inverter: Inverter, moduleColdVocV: number): number | null {
  if (inverter.kind === "micro") return moduleColdVocV;
  const vs = design.strings
    .filter((s) => s.inverterId === inverter.id)
    .map((s) => stringMaxVoltageV(design, site, s))
    .filter((v): v is number => v !== null);
  return vs.length ? Math.max(...vs) : null;
}

export function checkProtectionFunctions(design: ArrayDesign, site: Site, moduleColdVocV: number): CheckResult[] {
  const edition = site.necEdition;
  const results: CheckResult[] = [];
  for (const inv of design.inverters) {
    const dcV = dcVoltageIntoV(design, site, inv, moduleColdVocV);
    if (dcV === null) continue;
    const who = `The ${inv.model}`;
    // Ground-mounted arrays are not on or in a building; 690.11 then does not ask for arc-fault protection (from memory).
    if (design.mount !== "ground" && dcV >= ARC_FAULT_FROM_V) {
      const known = inv.dcArcFaultProtection;
      results.push(
        makeCheck({
          id: `arc-fault:${inv.id}`,
          title: `DC arc-fault protection (${inv.model})`,
          status: known === true ? "pass" : known === false ? "fail" : "warn",
          // The voltage is why the protection is needed, not a figure to stay under: no limit is shown beside it.
          value: dcV,
          limit: null,
          unit: "V",
          clause: clause("arcFault", edition),
          edition,
          message:
            known === true
              ? `${who} is listed with DC arc-fault protection, which its ${fmt(dcV, 1)} V DC circuits on the building need.`
              : known === false
                ? `${who}'s DC circuits reach ${fmt(dcV, 1)} V on a building, and its data sheet entry says it has no DC arc-fault protection.`
                : `${who}'s DC circuits reach ${fmt(dcV, 1)} V on a building, so they need listed DC arc-fault protection; the catalog does not say whether the inverter provides it.`,
          fix:
            known === true
              ? undefined
              : known === false
                ? "Add a listed DC arc-fault circuit interrupter, or choose an inverter that has one."
                : "Enter the inverter's DC arc-fault protection from its data sheet.",
          field: known === undefined ? `inverters.${inv.id}.dcArcFaultProtection` : undefined,
        }),
      );
    }
    const iscA = design.module.iscA;
    if (dcV > GROUND_FAULT_ABOVE_V || iscA > GROUND_FAULT_ABOVE_A) {
      const known = inv.dcGroundFaultProtection;
      results.push(
        makeCheck({
          id: `ground-fault:${inv.id}`,
          title: `DC ground-fault protection (${inv.model})`,
          status: known === true ? "pass" : known === false ? "fail" : "warn",
          value: dcV,
          limit: null,
          unit: "V",
          clause: clause("groundFault", edition),
          edition,
          message:
            known === true
              ? `${who} provides the DC ground-fault protection its circuits need (above 30 V or 8 A).`
              : known === false
                ? `${who}'s DC circuits (${fmt(dcV, 1)} V) need ground-fault protection, and its data sheet entry says it has none.`
                : `${who}'s DC circuits (${fmt(dcV, 1)} V) need ground-fault protection; the catalog does not say whether the inverter provides it.`,
          fix:
            known === true
              ? undefined
              : known === false
                ? "Choose an inverter listed with DC ground-fault protection, or add a listed device."
                : "Enter the inverter's DC ground-fault protection from its data sheet.",
          field: known === undefined ? `inverters.${inv.id}.dcGroundFaultProtection` : undefined,
        }),
      );
    }
  }
  return results;
}
