// Sizes and percents as exact integers, so rate × size never meets floating point.
// kW become whole watts (thousandths of a kW); a percent becomes millionths of the whole.

/** A size in kW to whole watts, half up (sizes are read to the watt; 7.6 kW → 7600 W). */
export function kwToWatts(kw: number): number {
  return Math.round(kw * 1000);
}

/** True when a kW figure has at most three decimals, i.e. is a whole number of watts. */
export function isWholeWatts(kw: number): boolean {
  return Number.isFinite(kw) && Math.abs(kw * 1000 - Math.round(kw * 1000)) < 1e-6;
}

const GROUPED = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0, useGrouping: true });

/** Whole watts as kW with three decimals: 7600 → "7.600 kW", 12500000 → "12,500.000 kW". */
export function formatKw(watts: number, { unit = true } = {}): string {
  const rest = watts % 1000;
  return `${GROUPED.format((watts - rest) / 1000)}.${String(rest).padStart(3, "0")}${unit ? " kW" : ""}`;
}

const PERCENT = /^(\d{1,3})(?:\.(\d{1,4}))?$/;

const PERCENT_DECIMALS = 4; // 0.0001 % is a hundredth of a basis point, and one millionth of the whole
const MILLIONTHS = 1_000_000n;

/**
 * A stored percent ("1.25", "0.0725", "100") to millionths of the whole (1.25 % → 12500n);
 * null unless it is a plain decimal from 0 to 100 with at most four decimals.
 */
export function parsePercent(text: string): bigint | null {
  const match = PERCENT.exec(text);
  if (!match) return null;
  const [, whole = "0", decimals = ""] = match;
  const millionths = BigInt(whole) * 10_000n + BigInt(decimals.padEnd(PERCENT_DECIMALS, "0"));
  return millionths > MILLIONTHS ? null : millionths;
}
