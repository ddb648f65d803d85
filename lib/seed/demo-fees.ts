// Invented fee schedules for the demo AHJs and utilities: the kinds of lines real schedules use
// (flat, per kW, size tiers, a share of the valuation), with made-up amounts. Not any place's fees.
import type { FeeLine } from "@/lib/fees";

const line = (id: string, name: string, basis: FeeLine["basis"], extra: Partial<FeeLine> = {}): FeeLine => ({
  id,
  name,
  effectiveFrom: "2026-01-01",
  effectiveUntil: null,
  basis,
  minimumCents: null,
  maximumCents: null,
  ...extra,
});

export const DEMO_JURISDICTION_FEES: Record<string, FeeLine[]> = {
  brackenford: [
    line("bk-permit", "Electrical permit, PV", {
      kind: "bracket-tiers",
      size: "dc",
      tiers: [
        { upToKw: 10, amountCents: 185_00 },
        { upToKw: 25, amountCents: 290_00 },
        { upToKw: null, amountCents: 475_00 },
      ],
    }),
    line("bk-review", "Plan review", { kind: "valuation-percent", ratePercent: "0.65" }, { minimumCents: 75_00, maximumCents: 400_00 }),
  ],
  quillan: [
    line("qs-permit", "Solar permit", { kind: "per-kw", size: "dc", rateCentsPerKw: 22_00 }, { minimumCents: 150_00 }),
    line("qs-tech", "Records and technology surcharge", { kind: "flat", amountCents: 18_50 }),
  ],
  wendle: [
    line(
      "wc-permit",
      "Building and electrical permit",
      {
        kind: "marginal-tiers",
        size: "ac",
        tiers: [
          { upToKw: 10, rateCentsPerKw: 25_00 },
          { upToKw: null, rateCentsPerKw: 12_00 },
        ],
      },
      { minimumCents: 120_00 },
    ),
  ],
};

export const DEMO_UTILITY_FEES: Record<string, FeeLine[]> = {
  bmlp: [
    line(
      "bmlp-app",
      "Interconnection application",
      { kind: "flat", amountCents: 100_00 },
      { effectiveFrom: "2025-01-01", effectiveUntil: "2026-07-01" },
    ),
    line("bmlp-app-2026", "Interconnection application", { kind: "flat", amountCents: 125_00 }, { effectiveFrom: "2026-07-01" }),
  ],
  highmesa: [
    line(
      "hm-study",
      "Interconnection review",
      { kind: "per-kw", size: "ac", rateCentsPerKw: 15_00 },
      { minimumCents: 50_00, maximumCents: 500_00 },
    ),
  ],
};
