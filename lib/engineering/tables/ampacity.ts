import { DesignInputError } from "../errors";
import type { ConductorMaterial, NecEdition, TerminalTempC } from "../types";
import { type ConductorSize, isConductorSize } from "./conductor-sizes";

type Row = readonly [cu60: number, cu75: number, cu90: number, al60: number, al75: number, al90: number];

// NEC 2023 Table 310.16, 30 °C ambient, not more than three current-carrying conductors (REFERENCE.md, confirmed). 0 = not listed.
const TABLE_310_16_2023: Readonly<Record<ConductorSize, Row>> = {
  "14": [15, 20, 25, 0, 0, 0],
  "12": [20, 25, 30, 15, 20, 25],
  "10": [30, 35, 40, 25, 30, 35],
  "8": [40, 50, 55, 35, 40, 45],
  "6": [55, 65, 75, 40, 50, 55],
  "4": [70, 85, 95, 55, 65, 75],
  "3": [85, 100, 115, 65, 75, 85],
  "2": [95, 115, 130, 75, 90, 100],
  "1": [110, 130, 145, 85, 100, 115],
  "1/0": [125, 150, 170, 100, 120, 135],
  "2/0": [145, 175, 195, 115, 135, 150],
  "3/0": [165, 200, 225, 130, 155, 175],
  "4/0": [195, 230, 260, 150, 180, 205],
  "250": [215, 255, 290, 170, 205, 230],
  "300": [240, 285, 320, 195, 230, 260],
};

// NEC 2017 Table 310.15(B)(16) and 2020 Table 310.16: REFERENCE.md warns small aluminum sizes
// differ in older editions but gives no values, so the 2023 rows stand in until confirmed.
const TABLE_BY_EDITION: Readonly<Record<NecEdition, Readonly<Record<ConductorSize, Row>>>> = {
  2017: TABLE_310_16_2023,
  2020: TABLE_310_16_2023,
  2023: TABLE_310_16_2023,
};

const COLUMN: Record<ConductorMaterial, Record<TerminalTempC, number>> = {
  Cu: { 60: 0, 75: 1, 90: 2 },
  Al: { 60: 3, 75: 4, 90: 5 },
};

/** Allowable ampacity before conditions of use, from the column of the given temperature. */
export function tableAmpacityA(size: string, material: ConductorMaterial, columnC: TerminalTempC, edition: NecEdition = 2023): number {
  if (!isConductorSize(size)) {
    throw new DesignInputError("conductor.size", `Conductor size "${size}" is not in the ampacity table (14 AWG to 300 kcmil).`);
  }
  const value = TABLE_BY_EDITION[edition][size][COLUMN[material][columnC]]!;
  if (value === 0) {
    throw new DesignInputError(
      "conductor.size",
      `${size} AWG ${material === "Al" ? "aluminum" : "copper"} is not listed in the ampacity table.`,
    );
  }
  return value;
}
