import type { ConductorSize } from "./conductor-sizes";

// NEC Chapter 9 Table 8, conductor area in circular mils (from memory; each AWG value agrees within
// 0.5 % with the AWG definition d = 0.005 in × 92^((36 − n)/39), which the tests check).
const AREA_CMIL: Readonly<Record<ConductorSize, number>> = {
  "14": 4110,
  "12": 6530,
  "10": 10380,
  "8": 16510,
  "6": 26240,
  "4": 41740,
  "3": 52620,
  "2": 66360,
  "1": 83690,
  "1/0": 105600,
  "2/0": 133100,
  "3/0": 167800,
  "4/0": 211600,
  "250": 250000,
  "300": 300000,
};

export function areaCmil(size: ConductorSize): number {
  return AREA_CMIL[size];
}
