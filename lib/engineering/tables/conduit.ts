import type { RacewayType, TradeSize } from "../types";
import type { ConductorSize } from "./conductor-sizes";

// NEC Chapter 9 Table 1, percent of cross-section for conductors (REFERENCE.md).
export function allowedFillPercent(conductorCount: number): number {
  if (conductorCount <= 1) return 53;
  if (conductorCount === 2) return 31;
  return 40;
}

export const TRADE_SIZES: readonly TradeSize[] = ["1/2", "3/4", "1", "1-1/4", "1-1/2", "2"];

// NEC Chapter 9 Table 4, area at 40 % fill, in² (REFERENCE.md).
const AREA_AT_40_PERCENT_IN2: Readonly<Record<RacewayType, Readonly<Record<TradeSize, number>>>> = {
  EMT: { "1/2": 0.122, "3/4": 0.213, "1": 0.346, "1-1/4": 0.598, "1-1/2": 0.814, "2": 1.342 },
  "PVC-40": { "1/2": 0.114, "3/4": 0.203, "1": 0.333, "1-1/4": 0.581, "1-1/2": 0.794, "2": 1.316 },
};

/** Total internal area, back-computed from the 40 % column so one table serves all three fill limits. */
export function racewayAreaIn2(type: RacewayType, tradeSize: TradeSize): number {
  return AREA_AT_40_PERCENT_IN2[type][tradeSize] / 0.4;
}

// NEC Chapter 9 Table 5, THHN/THWN-2 approximate area, in² (REFERENCE.md; 6 and 2 AWG from memory).
const THHN_AREA_IN2: Partial<Record<ConductorSize, number>> = {
  "14": 0.0097,
  "12": 0.0133,
  "10": 0.0211,
  "8": 0.0366,
  "6": 0.0507,
  "4": 0.0824,
  "3": 0.0973,
  "2": 0.1158,
};

export function thhnAreaIn2(size: ConductorSize): number | null {
  return THHN_AREA_IN2[size] ?? null;
}
