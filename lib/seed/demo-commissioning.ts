// Commissioning readings for demo projects already past commissioning: plausible values that
// pass every check, worked out from each project's own design. Invented; for the demo only.
import type { CommissioningFacts } from "@/lib/field/commissioning-facts";
import type { CommissioningReadings } from "@/lib/schemas/commissioning";

/** Readings a careful crew would have taken on a sunny late morning; `seed` varies them a little per project. */
export function passingDemoReadings(facts: CommissioningFacts, seed: number): CommissioningReadings {
  const jitter = (seed % 5) / 10; // 0.0 … 0.4
  return {
    gridProfileSet: facts.requiredGridProfile,
    acVoltageV: Math.round((facts.nominalServiceV * 1.004 + jitter) * 10) / 10,
    strings: facts.strings.map((s) => ({ id: s.id, measuredV: Math.round((s.devicesInSeries * (s.perDeviceV ?? 1) + jitter) * 10) / 10 })),
    modulesReporting: facts.modulesInstalled,
    firstPowerW: Math.round(facts.acRatingW * (0.58 + jitter / 10)),
    firstPowerTime: `11:${String(10 + seed * 7 % 45).padStart(2, "0")}`,
    rapidShutdown: { boundary: "outside", measuredV: 11 + (seed % 7), seconds: 8 + (seed % 9) },
  };
}
