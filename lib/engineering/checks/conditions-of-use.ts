import { requireFinite, requireNonNegative } from "../errors";
import { conductorCountAdjustmentFactor } from "../tables/adjustment-factors";
import { temperatureCorrectionFactor } from "../tables/temperature-correction";
import type { ConductorRun, NecEdition, Site } from "../types";

interface RooftopRule {
  belowIn: number;
  adderC: number;
  exemptInsulation: readonly string[];
}

// Rooftop sunlight adder: NEC 2017 310.15(B)(3)(c), 2020/2023 310.15(B)(2): +33 °C under 7/8 in above the roof (REFERENCE.md; XHHW-2 exemption from memory).
export const ROOFTOP_ADDER: Readonly<Record<NecEdition, RooftopRule>> = {
  2017: { belowIn: 7 / 8, adderC: 33, exemptInsulation: ["XHHW-2"] },
  2020: { belowIn: 7 / 8, adderC: 33, exemptInsulation: ["XHHW-2"] },
  2023: { belowIn: 7 / 8, adderC: 33, exemptInsulation: ["XHHW-2"] },
};

/** Degrees added to the ambient for raceway or cable in sunlight close to a roof; 0 off the roof. */
export function rooftopAdderC(edition: NecEdition, roofClearanceIn?: number, insulation?: string): number {
  if (roofClearanceIn === undefined) return 0;
  requireNonNegative(roofClearanceIn, "roofClearanceIn", "The height above the roof");
  const rule = ROOFTOP_ADDER[edition];
  const kind = insulation?.toUpperCase().replace(/\s+/g, "");
  if (kind !== undefined && rule.exemptInsulation.includes(kind)) return 0;
  return roofClearanceIn < rule.belowIn ? rule.adderC : 0;
}

export interface ConditionsOfUse {
  ambientC: number;
  rooftopAdderC: number;
  effectiveAmbientC: number;
  correctionFactor: number; // 0 where the insulation may not be used at that temperature
  currentCarryingConductors: number;
  adjustmentFactor: number;
}

/**
 * Ambient correction and conductor-count adjustment of a run. `circuitConductors` is what the run's
 * own circuits put in the raceway: the count used is that, or the entered count when it is higher
 * (other circuits share the raceway); an entered count below it is reported by checkCurrentCarryingCount.
 */
export function conditionsOfUse(run: ConductorRun, site: Site, circuitConductors: number): ConditionsOfUse {
  const ambientC = requireFinite(run.ambientTempC ?? site.highDesignTempC, `runs.${run.id}.ambientTempC`, "The ambient temperature");
  const adderC = rooftopAdderC(site.necEdition, run.roofClearanceIn, run.conductor.insulation);
  const effectiveAmbientC = ambientC + adderC;
  const ccc = Math.max(run.currentCarryingConductors ?? circuitConductors, circuitConductors);
  return {
    ambientC,
    rooftopAdderC: adderC,
    effectiveAmbientC,
    correctionFactor: temperatureCorrectionFactor(effectiveAmbientC, run.conductor.insulationTempC),
    currentCarryingConductors: ccc,
    adjustmentFactor: conductorCountAdjustmentFactor(ccc),
  };
}
