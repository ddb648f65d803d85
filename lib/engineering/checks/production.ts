import { DesignInputError, requireNonNegative, requirePositive } from "../errors";

// PVWatts v5 default losses in percent: A. P. Dobos, "PVWatts Version 5 Manual", NREL/TP-6A20-62641 (2014), via REFERENCE.md.
export const PVWATTS_V5_DEFAULT_LOSSES_PERCENT = {
  soiling: 2,
  shading: 3,
  snow: 0,
  mismatch: 2,
  wiring: 2,
  connections: 0.5,
  lightInducedDegradation: 1.5,
  nameplateRating: 1,
  age: 0,
  availability: 3,
} as const;

/** Losses combine multiplicatively: L = 1 − Π(1 − Li). */
export function combinedLossFraction(lossesPercent: Readonly<Record<string, number>>): number {
  const kept = Object.values(lossesPercent).reduce((product, pct) => product * (1 - pct / 100), 1);
  return 1 - kept;
}

/** 0.1408 (14.08 %) with the defaults above. */
export const DEFAULT_LOSS_FRACTION = combinedLossFraction(PVWATTS_V5_DEFAULT_LOSSES_PERCENT);

/** Annual kWh ≈ kW DC × peak sun hours × 365 × (1 − L): a first estimate, not a substitute for an hourly model. */
export function annualProductionKwh(dcKw: number, peakSunHours: number, lossFraction = DEFAULT_LOSS_FRACTION): number {
  requireNonNegative(dcKw, "dcKw", "The DC rating");
  requirePositive(peakSunHours, "site.peakSunHours", "Peak sun hours");
  if (!(lossFraction >= 0 && lossFraction < 1)) {
    throw new DesignInputError("lossFraction", "The loss fraction must be at least 0 and below 1.");
  }
  return dcKw * peakSunHours * 365 * (1 - lossFraction);
}
