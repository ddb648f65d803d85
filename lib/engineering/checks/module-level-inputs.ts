import { atMost, fmt, makeCheck } from "../check-result";
import { clause, clauses } from "../clauses";
import { microInverters } from "../design-lookup";
import type { ArrayDesign, CheckResult, Site } from "../types";
import { coldModuleVoc } from "./string-voltage";

interface DeviceInput {
  key: string;
  model: string;
  maxInputV: number;
  maxInputIscA?: number;
}

/**
 * Each module feeds one device input (an optimizer, a shutdown device or a micro-inverter),
 * so each module's own cold Voc and Isc must stay within that input's ratings.
 */
export function checkModuleLevelInputs(design: ArrayDesign, site: Site): CheckResult[] {
  const devices: DeviceInput[] = microInverters(design).map((i) => ({
    key: i.id,
    model: i.model,
    maxInputV: i.maxDcInputV,
    maxInputIscA: i.maxInputIscA,
  }));
  const mld = design.moduleLevelDevice;
  if (mld) devices.push({ key: "module-level-device", model: mld.model, maxInputV: mld.maxInputV, maxInputIscA: mld.maxInputIscA });

  const cold = coldModuleVoc(design.module, site.recordLowTempC);
  const edition = site.necEdition;
  const results: CheckResult[] = [];
  for (const d of devices) {
    const vOk = atMost(cold.vocV, d.maxInputV);
    results.push(
      makeCheck({
        id: `device-input-voltage:${d.key}`,
        title: `Module voltage into each ${d.model}`,
        status: vOk ? "pass" : "fail",
        value: cold.vocV,
        limit: d.maxInputV,
        unit: "V",
        clause: clauses(edition, "maxVoltage", "listing"),
        edition,
        message: `Each module reaches ${fmt(cold.vocV)} V at ${site.recordLowTempC} °C, ${vOk ? "within" : "above"} the ${d.model}'s ${d.maxInputV} V input limit.`,
        fix: vOk ? undefined : `Choose a device rated for at least ${Math.ceil(cold.vocV)} V input, or a module with a lower Voc.`,
      }),
    );
    if (d.maxInputIscA === undefined) continue;
    const iOk = atMost(design.module.iscA, d.maxInputIscA);
    results.push(
      makeCheck({
        id: `device-input-current:${d.key}`,
        title: `Module current into each ${d.model}`,
        status: iOk ? "pass" : "fail",
        value: design.module.iscA,
        limit: d.maxInputIscA,
        unit: "A",
        clause: clause("listing", edition),
        edition,
        message: `The module's ${design.module.iscA} A short-circuit current is ${iOk ? "within" : "above"} the ${d.model}'s ${d.maxInputIscA} A input limit.`,
        fix: iOk ? undefined : "Choose a device whose input accepts this module's short-circuit current.",
      }),
    );
  }
  return results;
}
