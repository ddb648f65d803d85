import { DesignInputError, requireFinite } from "../errors";
import type { ConductorMaterial, Stranding } from "../types";
import { type ConductorSize, isConductorSize } from "./conductor-sizes";

type Row = { cuSolid: number | null; cuStranded: number; alSolid: number | null; alStranded: number };

// NEC Chapter 9 Table 8, DC resistance at 75 °C, uncoated, Ω per 1000 ft (REFERENCE.md). Sizes 14–8 AWG
// differ between solid and stranded: the solid columns and 6 AWG and larger are confirmed; stranded 14–8 AWG
// copper and both aluminum columns for 14–8 AWG are from memory. Table 8 lists 6 AWG and larger as stranded only.
const TABLE_8: Readonly<Record<ConductorSize, Row>> = {
  "14": { cuSolid: 3.07, cuStranded: 3.14, alSolid: 5.06, alStranded: 5.17 },
  "12": { cuSolid: 1.93, cuStranded: 1.98, alSolid: 3.18, alStranded: 3.25 },
  "10": { cuSolid: 1.21, cuStranded: 1.24, alSolid: 2.0, alStranded: 2.04 },
  "8": { cuSolid: 0.764, cuStranded: 0.778, alSolid: 1.26, alStranded: 1.28 },
  "6": { cuSolid: null, cuStranded: 0.491, alSolid: null, alStranded: 0.808 },
  "4": { cuSolid: null, cuStranded: 0.308, alSolid: null, alStranded: 0.508 },
  "3": { cuSolid: null, cuStranded: 0.245, alSolid: null, alStranded: 0.403 },
  "2": { cuSolid: null, cuStranded: 0.194, alSolid: null, alStranded: 0.319 },
  "1": { cuSolid: null, cuStranded: 0.154, alSolid: null, alStranded: 0.253 },
  "1/0": { cuSolid: null, cuStranded: 0.122, alSolid: null, alStranded: 0.201 },
  "2/0": { cuSolid: null, cuStranded: 0.0967, alSolid: null, alStranded: 0.159 },
  "3/0": { cuSolid: null, cuStranded: 0.0766, alSolid: null, alStranded: 0.126 },
  "4/0": { cuSolid: null, cuStranded: 0.0608, alSolid: null, alStranded: 0.1 },
  "250": { cuSolid: null, cuStranded: 0.0515, alSolid: null, alStranded: 0.0847 },
  "300": { cuSolid: null, cuStranded: 0.0429, alSolid: null, alStranded: 0.0707 },
};

// Temperature coefficients of resistance for the 75 °C correction (REFERENCE.md).
export const RESISTANCE_TEMP_COEFF_PER_C: Readonly<Record<ConductorMaterial, number>> = { Cu: 0.00323, Al: 0.0033 };

/** Ω per 1000 ft at 75 °C, or at `conductorTempC` when given: R2 = R1 × [1 + α(T2 − 75)]. */
export function resistanceOhmPerKft(
  size: string,
  material: ConductorMaterial,
  stranding: Stranding = "stranded",
  conductorTempC?: number,
): number {
  if (!isConductorSize(size)) {
    throw new DesignInputError("conductor.size", `Conductor size "${size}" is not in Chapter 9 Table 8 (14 AWG to 300 kcmil).`);
  }
  const row = TABLE_8[size];
  const r =
    material === "Al" ? (stranding === "solid" ? row.alSolid : row.alStranded) : stranding === "solid" ? row.cuSolid : row.cuStranded;
  if (r === null) {
    throw new DesignInputError(
      "conductor.stranding",
      `Chapter 9 Table 8 lists ${size} AWG ${material === "Al" ? "aluminum" : "copper"} as stranded only.`,
    );
  }
  if (conductorTempC === undefined) return r;
  requireFinite(conductorTempC, "conductor.conductorTempC", "The conductor temperature");
  const corrected = r * (1 + RESISTANCE_TEMP_COEFF_PER_C[material] * (conductorTempC - 75));
  // The linear correction goes negative far below any outdoor temperature; refuse rather than report a gain.
  if (!(corrected > 0)) {
    throw new DesignInputError(
      "conductor.conductorTempC",
      `A conductor temperature of ${conductorTempC} °C is outside the range Table 8 can be corrected to.`,
    );
  }
  return corrected;
}
