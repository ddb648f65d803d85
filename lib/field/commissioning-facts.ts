import { shutdownReadingsFromDesign, type CommissioningRecord, type ShutdownStringReading } from "@/lib/engineering/commissioning";
import type { Design, NecEdition } from "@/lib/engineering";
import type { CommissioningReadings } from "@/lib/schemas/commissioning";

/** What a commissioning record is checked against: taken from the approved design, the AHJ and the utility. */
export type CommissioningFacts = {
  edition: NecEdition;
  requiredGridProfile: string | null;
  nominalServiceV: number;
  strings: Omit<ShutdownStringReading, "measuredV">[];
  modulesInstalled: number;
  acRatingW: number;
};

export function commissioningFacts({ design, edition, requiredGridProfile, moduleCount, acKw }: { design: Design; edition: NecEdition; requiredGridProfile: string | null; moduleCount: number; acKw: number }): CommissioningFacts {
  // A shut-down reading is only expected where module-level devices hold the string at a known voltage.
  const strings = design.moduleLevelDevice ? shutdownReadingsFromDesign(design).map(({ measuredV: _omit, ...s }) => s) : [];
  return {
    edition,
    requiredGridProfile: requiredGridProfile?.trim() || null,
    nominalServiceV: design.service.voltageV,
    strings,
    modulesInstalled: moduleCount,
    acRatingW: Math.round(acKw * 1000),
  };
}

/** An empty set of readings with one line per string of the design. */
export function emptyReadings(facts: CommissioningFacts): CommissioningReadings {
  return {
    gridProfileSet: null,
    acVoltageV: null,
    strings: facts.strings.map((s) => ({ id: s.id, measuredV: null })),
    modulesReporting: null,
    firstPowerW: null,
    firstPowerTime: null,
    rapidShutdown: { boundary: "outside", measuredV: null, seconds: null },
  };
}

/**
 * The readings laid over the facts. String readings are matched by id, so a design changed after
 * a visit keeps the readings of strings that still exist and asks for the new ones.
 */
export function toCommissioningRecord(facts: CommissioningFacts, readings: CommissioningReadings): CommissioningRecord {
  const measured = new Map(readings.strings.map((s) => [s.id, s.measuredV]));
  return {
    edition: facts.edition,
    requiredGridProfile: facts.requiredGridProfile,
    gridProfileSet: readings.gridProfileSet,
    nominalServiceV: facts.nominalServiceV,
    acVoltageV: readings.acVoltageV,
    strings: facts.strings.map((s) => ({ ...s, measuredV: measured.get(s.id) ?? null })),
    modulesInstalled: facts.modulesInstalled,
    modulesReporting: readings.modulesReporting,
    acRatingW: facts.acRatingW,
    firstPowerW: readings.firstPowerW,
    firstPowerTime: readings.firstPowerTime,
    rapidShutdownTest: { boundary: readings.rapidShutdown.boundary, measuredV: readings.rapidShutdown.measuredV, seconds: readings.rapidShutdown.seconds },
  };
}
