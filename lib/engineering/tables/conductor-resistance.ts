import { DesignInputError, requireFinite } from "../errors";
import type { ConductorMaterial, Stranding } from "../types";
import { type ConductorSize, isConductorSize } from "./conductor-sizes";

type Row = { cuSolid: number | null; cuStranded: number; alStranded: number };

// NEC Chapter 9 Table 8, DC resistance at 75 °C, uncoated, Ω per 1000 ft (REFERENCE.md: solid and 6 AWG+ confirmed; stranded Cu 14–8 AWG from memory).
const TABLE_8: Readonly<Record<ConductorSize, Row>> = {
  "14": { cuSolid: 3.07, cuStranded: 3.14, alStranded: 5.06 },
  "12": { cuSolid: 1.93, cuStranded: 1.98, alStranded: 3.18 },
  "10": { cuSolid: 1.21, cuStranded: 1.24, alStranded: 2.0 },
  "8": { cuSolid: 0.764, cuStranded: 0.778, alStranded: 1.26 },
  "6": { cuSolid: null, cuStranded: 0.491, alStranded: 0.808 },
  "4": { cuSolid: null, cuStranded: 0.308, alStranded: 0.508 },
  "3": { cuSolid: null, cuStranded: 0.245, alStranded: 0.403 },
  "2": { cuSolid: null, cuStranded: 0.194, alStranded: 0.319 },
  "1": { cuSolid: null, cuStranded: 0.154, alStranded: 0.253 },
  "1/0": { cuSolid: null, cuStranded: 0.122, alStranded: 0.201 },
  "2/0": { cuSolid: null, cuStranded: 0.0967, alStranded: 0.159 },
  "3/0": { cuSolid: null, cuStranded: 0.0766, alStranded: 0.126 },
  "4/0": { cuSolid: null, cuStranded: 0.0608, alStranded: 0.1 },
  "250": { cuSolid: null, cuStranded: 0.0515, alStranded: 0.0847 },
  "300": { cuSolid: null, cuStranded: 0.0429, alStranded: 0.0707 },
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
  let r: number | null;
  if (material === "Al") {
    if (stranding === "solid") {
      throw new DesignInputError("conductor.stranding", "Solid aluminum resistance is not in our copy of Chapter 9 Table 8; enter stranded.");
    }
    r = row.alStranded;
  } else {
    r = stranding === "solid" ? row.cuSolid : row.cuStranded;
  }
  if (r === null) {
    throw new DesignInputError("conductor.stranding", `Chapter 9 Table 8 lists ${size} AWG copper as stranded only.`);
  }
  if (conductorTempC === undefined) return r;
  requireFinite(conductorTempC, "conductor.conductorTempC", "The conductor temperature");
  const corrected = r * (1 + RESISTANCE_TEMP_COEFF_PER_C[material] * (conductorTempC - 75));
  // The linear correction goes negative far below any outdoor temperature; refuse rather than report a gain.
  if (!(corrected > 0)) {
    throw new DesignInputError("conductor.conductorTempC", `A conductor temperature of ${conductorTempC} °C is outside the range Table 8 can be corrected to.`);
  }
  return corrected;
}
