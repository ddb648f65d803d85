import type { InsulationTempC } from "../types";

// NEC 2020/2023 Table 310.15(B)(1) (2017: Table 310.15(B)(2)(a)), 30 °C base (REFERENCE.md, confirmed via IRC Table E3705.2). 0 = not permitted.
const ROWS: readonly { upToC: number; f75: number; f90: number }[] = [
  { upToC: 10, f75: 1.2, f90: 1.15 },
  { upToC: 15, f75: 1.15, f90: 1.12 },
  { upToC: 20, f75: 1.11, f90: 1.08 },
  { upToC: 25, f75: 1.05, f90: 1.04 },
  { upToC: 30, f75: 1.0, f90: 1.0 },
  { upToC: 35, f75: 0.94, f90: 0.96 },
  { upToC: 40, f75: 0.88, f90: 0.91 },
  { upToC: 45, f75: 0.82, f90: 0.87 },
  { upToC: 50, f75: 0.75, f90: 0.82 },
  { upToC: 55, f75: 0.67, f90: 0.76 },
  { upToC: 60, f75: 0.58, f90: 0.71 },
  { upToC: 65, f75: 0.47, f90: 0.65 },
  { upToC: 70, f75: 0.33, f90: 0.58 },
  { upToC: 75, f75: 0, f90: 0.5 },
  { upToC: 80, f75: 0, f90: 0.41 },
  { upToC: 85, f75: 0, f90: 0.29 },
];

/**
 * Correction factor for an ambient temperature. The table's rows are whole degrees; a
 * fractional temperature falls into the hotter row so the result errs on the safe side.
 * Returns 0 where the insulation may not be used at that ambient at all.
 */
export function temperatureCorrectionFactor(ambientC: number, insulationTempC: InsulationTempC): number {
  const row = ROWS.find((r) => ambientC <= r.upToC);
  if (row === undefined) return 0;
  return insulationTempC === 75 ? row.f75 : row.f90;
}
