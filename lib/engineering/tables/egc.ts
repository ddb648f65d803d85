import { DesignInputError } from "../errors";
import type { ConductorMaterial } from "../types";
import type { ConductorSize } from "./conductor-sizes";

// NEC Table 250.122, minimum equipment grounding conductor by OCPD rating (REFERENCE.md, confirmed).
const TABLE_250_122: readonly { upToA: number; Cu: ConductorSize; Al: ConductorSize }[] = [
  { upToA: 15, Cu: "14", Al: "12" },
  { upToA: 20, Cu: "12", Al: "10" },
  { upToA: 60, Cu: "10", Al: "8" },
  { upToA: 100, Cu: "8", Al: "6" },
  { upToA: 200, Cu: "6", Al: "4" },
  { upToA: 300, Cu: "4", Al: "2" },
  { upToA: 400, Cu: "3", Al: "1" },
  { upToA: 500, Cu: "2", Al: "1/0" },
  { upToA: 600, Cu: "1", Al: "2/0" },
  { upToA: 800, Cu: "1/0", Al: "3/0" },
  { upToA: 1000, Cu: "2/0", Al: "4/0" },
];

/** Smallest EGC for an OCPD rating (a row covers ratings up to and including its own). */
export function minimumEgcSize(ocpdA: number, material: ConductorMaterial): ConductorSize {
  if (!Number.isFinite(ocpdA) || ocpdA <= 0) {
    throw new DesignInputError("ocpdA", "An overcurrent device rating must be greater than zero to size the grounding conductor.");
  }
  const row = TABLE_250_122.find((r) => ocpdA <= r.upToA);
  if (row === undefined) {
    throw new DesignInputError("ocpdA", `Our copy of Table 250.122 stops at 1000 A; ${ocpdA} A needs an engineer's sizing.`);
  }
  return row[material];
}
