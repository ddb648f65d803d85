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

/** The insulation families Chapter 9 Table 5 lists that PV work uses; anything else needs the wire's area from its data sheet. */
export type Table5Insulation = "THHN/THWN-2" | "XHHW-2" | "RHW-2";

// NEC Chapter 9 Table 5, approximate area of insulated conductors, in². THHN/THWN-2 14–4 AWG and 3 AWG
// per REFERENCE.md (6 and 2 AWG from memory); 1 AWG and larger, and the XHHW/XHHW-2 and RHH/RHW/RHW-2
// (with outer covering) columns, from memory. USE-2 and PV wire are not in the table.
const TABLE_5_AREA_IN2: Readonly<Record<Table5Insulation, Readonly<Record<ConductorSize, number>>>> = {
  "THHN/THWN-2": {
    "14": 0.0097,
    "12": 0.0133,
    "10": 0.0211,
    "8": 0.0366,
    "6": 0.0507,
    "4": 0.0824,
    "3": 0.0973,
    "2": 0.1158,
    "1": 0.1562,
    "1/0": 0.1855,
    "2/0": 0.2223,
    "3/0": 0.2679,
    "4/0": 0.3237,
    "250": 0.397,
    "300": 0.4608,
  },
  "XHHW-2": {
    "14": 0.0139,
    "12": 0.0181,
    "10": 0.0243,
    "8": 0.0437,
    "6": 0.059,
    "4": 0.0814,
    "3": 0.0962,
    "2": 0.1146,
    "1": 0.1534,
    "1/0": 0.1825,
    "2/0": 0.219,
    "3/0": 0.2642,
    "4/0": 0.3197,
    "250": 0.3904,
    "300": 0.4536,
  },
  "RHW-2": {
    "14": 0.0293,
    "12": 0.0353,
    "10": 0.0437,
    "8": 0.0835,
    "6": 0.1041,
    "4": 0.1333,
    "3": 0.1521,
    "2": 0.175,
    "1": 0.266,
    "1/0": 0.3039,
    "2/0": 0.3505,
    "3/0": 0.4072,
    "4/0": 0.4754,
    "250": 0.6291,
    "300": 0.7088,
  },
};

/**
 * The Table 5 family an insulation name belongs to, or null when Table 5 does not list it. Dual ratings
 * such as "THHN/THWN-2" or "RHW-2/USE-2" are read by their first listed type.
 */
export function table5Insulation(insulation: string | undefined): Table5Insulation | null {
  const first = (insulation ?? "").toUpperCase().replace(/\s+/g, "").split(/[/,]/)[0] ?? "";
  if (["THHN", "THWN", "THWN-2", "THHW"].includes(first)) return "THHN/THWN-2";
  if (["XHHW", "XHHW-2", "XHH"].includes(first)) return "XHHW-2";
  if (["RHW", "RHW-2", "RHH"].includes(first)) return "RHW-2";
  return null;
}

/** Table 5 area of one wire, or null where the table does not list the insulation. */
export function table5AreaIn2(insulation: string | undefined, size: ConductorSize): number | null {
  const family = table5Insulation(insulation);
  return family === null ? null : TABLE_5_AREA_IN2[family][size];
}
