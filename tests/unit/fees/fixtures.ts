// Invented schedules (demo): the Town of Ashcombe building division and Brindle Valley Power are
// made up, as are every fee, rate and date here; no real ordinance or tariff is copied.
import type { FeeBasis, FeeFacts, ScheduledFeeLine } from "@/lib/fees";

export const ASHCOMBE = "Town of Ashcombe";
export const BRINDLE = "Brindle Valley Power";

let nextId = 1;

/** A stored line in effect from 2025-01-01 with no end, minimum or maximum unless given. */
export function feeLine(basis: FeeBasis, overrides: Partial<ScheduledFeeLine> = {}): ScheduledFeeLine {
  return {
    id: `line-${nextId++}`,
    name: "Building permit",
    effectiveFrom: "2025-01-01",
    effectiveUntil: null,
    basis,
    minimumCents: null,
    maximumCents: null,
    ...overrides,
  };
}

/** A 7.600 kW DC / 6.000 kW AC rooftop system declared at $40,000.00, fees as of 2026-03-15. */
export function facts(overrides: Partial<FeeFacts> = {}): FeeFacts {
  return { dcKw: 7.6, acKw: 6, valuationCents: 4_000_000, asOf: "2026-03-15", ...overrides };
}

// Size brackets, invented schedule (demo): up to 10 kW $100, over 10 up to 25 kW $200, over 25 kW $300.
export const ashcombeBrackets: FeeBasis = {
  kind: "bracket-tiers",
  size: "dc",
  tiers: [
    { upToKw: 10, amountCents: 10_000 },
    { upToKw: 25, amountCents: 20_000 },
    { upToKw: null, amountCents: 30_000 },
  ],
};

// Marginal tiers, invented schedule (demo): $20/kW on the first 10 kW, $10/kW on 10–25 kW, $5/kW above.
export const brindleMarginal: FeeBasis = {
  kind: "marginal-tiers",
  size: "ac",
  tiers: [
    { upToKw: 10, rateCentsPerKw: 2_000 },
    { upToKw: 25, rateCentsPerKw: 1_000 },
    { upToKw: null, rateCentsPerKw: 500 },
  ],
};
