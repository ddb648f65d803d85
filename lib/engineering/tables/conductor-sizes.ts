// Conductor sizes in the order of NEC Table 310.16 rows (AWG, then kcmil), smallest first.
export const CONDUCTOR_SIZES = ["14", "12", "10", "8", "6", "4", "3", "2", "1", "1/0", "2/0", "3/0", "4/0", "250", "300"] as const;

export type ConductorSize = (typeof CONDUCTOR_SIZES)[number];

export function isConductorSize(value: unknown): value is ConductorSize {
  return typeof value === "string" && (CONDUCTOR_SIZES as readonly string[]).includes(value);
}

/** Position in the size order; larger index = larger conductor. */
export function sizeIndex(size: ConductorSize): number {
  return CONDUCTOR_SIZES.indexOf(size);
}

/** "10" → "10 AWG", "250" → "250 kcmil", as a permit coordinator reads them. */
export function sizeLabel(size: ConductorSize): string {
  return size === "250" || size === "300" ? `${size} kcmil` : `${size} AWG`;
}
