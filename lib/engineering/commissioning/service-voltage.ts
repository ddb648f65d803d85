import { DesignInputError } from "../errors";

// ANSI C84.1 service voltage ranges, from memory (REFERENCE.md, not yet confirmed):
// on a 120 V base Range A is 114–126 V (−5 %/+5 %) and Range B is 110–127 V.
// Other nominal voltages scale from the 120 V base: 240 V → A 228–252 V, B 220–254 V.
export const RANGE_A_120V = { lowV: 114, highV: 126 } as const;
export const RANGE_B_120V = { lowV: 110, highV: 127 } as const;

export const NOMINAL_SERVICE_VOLTAGES = [120, 208, 240, 277, 480] as const;
export type NominalServiceV = (typeof NOMINAL_SERVICE_VOLTAGES)[number];

export interface VoltageRange {
  lowV: number;
  highV: number;
}

export interface ServiceVoltageRanges {
  nominalV: NominalServiceV;
  rangeA: VoltageRange;
  rangeB: VoltageRange;
}

export function isNominalServiceV(value: number): value is NominalServiceV {
  return (NOMINAL_SERVICE_VOLTAGES as readonly number[]).includes(value);
}

/** Range A and Range B for a nominal service voltage (ANSI C84.1, from memory). */
export function serviceVoltageRanges(nominalV: number): ServiceVoltageRanges {
  if (!isNominalServiceV(nominalV)) {
    throw new DesignInputError("nominalServiceV", `The nominal service voltage must be one of ${NOMINAL_SERVICE_VOLTAGES.join(", ")} V.`);
  }
  const scale = nominalV / 120;
  return {
    nominalV,
    rangeA: { lowV: RANGE_A_120V.lowV * scale, highV: RANGE_A_120V.highV * scale },
    rangeB: { lowV: RANGE_B_120V.lowV * scale, highV: RANGE_B_120V.highV * scale },
  };
}
