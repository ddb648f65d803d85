import type { ConductorMaterial } from "../types";
import { type ConductorSize, sizeIndex } from "./conductor-sizes";

// NEC Table 250.66, grounding electrode conductor by the largest ungrounded service-entrance conductor
// (REFERENCE.md): each row covers service conductors up to and including its own copper or aluminum size.
const TABLE_250_66: readonly { cuUpTo: ConductorSize; alUpTo: ConductorSize; Cu: ConductorSize; Al: ConductorSize }[] = [
  { cuUpTo: "2", alUpTo: "1/0", Cu: "8", Al: "6" },
  { cuUpTo: "1/0", alUpTo: "3/0", Cu: "6", Al: "4" },
  { cuUpTo: "3/0", alUpTo: "250", Cu: "4", Al: "2" },
  // Over 3/0 through 350 kcmil Cu (over 250 through 500 kcmil Al): our size list stops at 300 kcmil.
  { cuUpTo: "300", alUpTo: "300", Cu: "2", Al: "1/0" },
];

/** Table 250.66 size for a GEC of `gecMaterial`, given the largest service-entrance conductor. */
export function table250_66GecSize(
  service: { size: ConductorSize; material: ConductorMaterial },
  gecMaterial: ConductorMaterial,
): ConductorSize {
  const row = TABLE_250_66.find((r) => sizeIndex(service.size) <= sizeIndex(service.material === "Cu" ? r.cuUpTo : r.alUpTo))!;
  return row[gecMaterial];
}

// 250.66(A): the part of a GEC that is the sole connection to rod, pipe or plate electrodes need not be
// larger than 6 AWG copper or 4 AWG aluminum (REFERENCE.md gives the copper size; aluminum from memory).
export const ROD_ELECTRODE_GEC_CAP: Readonly<Record<ConductorMaterial, ConductorSize>> = { Cu: "6", Al: "4" };
