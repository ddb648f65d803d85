import { DesignInputError } from "../errors";

// NEC 2017/2020/2023 Table 690.7(A), crystalline and multicrystalline modules (REFERENCE.md, corroborated by two sources).
// Each row covers its lowest ambient down to and including `downToC`.
const ROWS: readonly { downToC: number; factor: number }[] = [
  { downToC: 20, factor: 1.02 },
  { downToC: 15, factor: 1.04 },
  { downToC: 10, factor: 1.06 },
  { downToC: 5, factor: 1.08 },
  { downToC: 0, factor: 1.1 },
  { downToC: -5, factor: 1.12 },
  { downToC: -10, factor: 1.14 },
  { downToC: -15, factor: 1.16 },
  { downToC: -20, factor: 1.18 },
  { downToC: -25, factor: 1.2 },
  { downToC: -30, factor: 1.21 },
  { downToC: -35, factor: 1.23 },
  { downToC: -40, factor: 1.25 },
];

/**
 * Voc correction factor for the lowest expected ambient. The table lists whole degrees;
 * a fractional temperature between rows takes the colder row (the larger factor).
 * At 25 °C and above there is nothing to correct.
 */
export function vocCorrectionFactor(lowestAmbientC: number): number {
  if (!Number.isFinite(lowestAmbientC)) {
    throw new DesignInputError("site.recordLowTempC", "The record low temperature must be a number.");
  }
  if (lowestAmbientC >= 25) return 1;
  const row = ROWS.find((r) => lowestAmbientC >= r.downToC);
  if (row === undefined) {
    throw new DesignInputError(
      "site.recordLowTempC",
      "Table 690.7(A) stops at −40 °C; enter the module's Voc temperature coefficient to compute colder sites.",
    );
  }
  return row.factor;
}
