import type { ConductorMaterial } from "../types";
import type { ConductorSize } from "./conductor-sizes";

// NEC 240.4(D) small-conductor overcurrent limits (REFERENCE.md, from memory).
const LIMITS: Readonly<Record<ConductorMaterial, Partial<Record<ConductorSize, number>>>> = {
  Cu: { "14": 15, "12": 20, "10": 30 },
  Al: { "12": 15, "10": 25 },
};

/** The largest OCPD allowed on a small conductor, or null where 240.4(D) sets no limit. */
export function smallConductorMaxOcpdA(size: ConductorSize, material: ConductorMaterial): number | null {
  return LIMITS[material][size] ?? null;
}
