// Money is integer cents. A rate times a size or a valuation is worked exactly in bigint and
// rounded once to the cent, half up: a product ending in exactly half a cent goes up (95.025 → 95.03).
// Every amount here is zero or more, so half up and half away from zero agree.

const GROUPED = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0, useGrouping: true });

/** "$1,234.50" (en-US); negative amounts as "-$5.00". Throws on anything but whole cents. */
export function formatUsd(cents: number): string {
  if (!Number.isSafeInteger(cents)) throw new RangeError(`Money is kept in whole cents; got ${cents}.`);
  const abs = Math.abs(cents);
  const rest = abs % 100;
  return `${cents < 0 ? "-" : ""}$${GROUPED.format((abs - rest) / 100)}.${String(rest).padStart(2, "0")}`;
}

/**
 * An exact amount of `numerator / 10^scale` cents in dollars, with as many decimals as it needs
 * and at least two: 11641850n at scale 3 → "$116.4185". Shows a product before it is rounded.
 */
export function formatUsdExact(numerator: bigint, scale: number): string {
  const digits = scale + 2; // decimals of the dollar figure
  const text = numerator.toString().padStart(digits + 1, "0");
  const whole = BigInt(text.slice(0, text.length - digits));
  const fraction = text
    .slice(text.length - digits)
    .replace(/0+$/, "")
    .padEnd(2, "0");
  return `$${GROUPED.format(whole)}.${fraction}`;
}

/** `n / d` rounded to a whole number, half up; both zero or more, `d` above zero. */
export function divideRoundHalfUp(n: bigint, d: bigint): bigint {
  const quotient = n / d;
  return 2n * (n % d) >= d ? quotient + 1n : quotient;
}

/** A bigint amount of cents back to a number, refusing one too large to hold exactly. */
export function toCents(value: bigint): number {
  if (value > BigInt(Number.MAX_SAFE_INTEGER)) throw new RangeError("The amount is too large to hold in whole cents.");
  return Number(value);
}

const DOLLARS = /^\$?(\d{1,3}(?:,\d{3})+|\d*)(?:\.(\d{0,2}))?$/;

/**
 * Dollars as typed ("150", "150.5", "$1,234.50", ".75") to integer cents, without floating
 * point; null for anything else (a third decimal, a minus sign, letters).
 */
export function parseUsd(text: string): number | null {
  const match = DOLLARS.exec(text.trim());
  if (!match) return null;
  const [, whole = "", cents = ""] = match;
  if (whole === "" && cents === "") return null;
  const value = BigInt(whole.replaceAll(",", "") || "0") * 100n + BigInt(cents.padEnd(2, "0"));
  return value > BigInt(Number.MAX_SAFE_INTEGER) ? null : Number(value);
}

/** Cents as an admin form shows them to be edited: "1234.50", no sign or grouping. */
export function centsToDollarsText(cents: number): string {
  return formatUsd(cents).replace(/[$,]/g, "");
}
