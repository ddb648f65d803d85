import { DesignInputError } from "../errors";

// NEC 2020/2023 Table 310.15(C)(1) (2017: Table 310.15(B)(3)(a)), more than three current-carrying conductors (REFERENCE.md, confirmed).
const ROWS: readonly { upTo: number; factor: number }[] = [
  { upTo: 3, factor: 1.0 },
  { upTo: 6, factor: 0.8 },
  { upTo: 9, factor: 0.7 },
  { upTo: 20, factor: 0.5 },
  { upTo: 30, factor: 0.45 },
  { upTo: 40, factor: 0.4 },
  { upTo: Infinity, factor: 0.35 },
];

export function conductorCountAdjustmentFactor(currentCarryingConductors: number): number {
  if (!Number.isInteger(currentCarryingConductors) || currentCarryingConductors < 1) {
    throw new DesignInputError(
      "currentCarryingConductors",
      "The number of current-carrying conductors must be a whole number of at least 1.",
    );
  }
  return ROWS.find((r) => currentCarryingConductors <= r.upTo)!.factor;
}
