// Fee schedules as stored: one row per schedule (an AHJ's or a utility's), its lines as JSON.
// Money is always integer cents; sizes are kW with at most three decimals (whole watts).

/** Who charges a fee: the AHJ (permit) or the utility (interconnection); each keeps one schedule. */
export { AUTHORITY_KINDS as FEE_AUTHORITY_KINDS } from "@/lib/domain/authorities";
import type { AuthorityKind } from "@/lib/domain/authorities";
export type FeeAuthorityKind = AuthorityKind;

/** Which size of the system a size-based fee reads: module nameplate (DC) or inverter output (AC). */
export type SizeRating = "dc" | "ac";
export const SIZE_RATINGS = ["dc", "ac"] as const satisfies readonly SizeRating[];

/**
 * One bracket of a size-tiered fee. `upToKw` is the bracket's upper edge and belongs to it:
 * "up to 10 kW" covers 10.000 kW exactly, and 10.001 kW falls in the next bracket. The last
 * bracket has no upper edge (`null`) so every larger system still has a fee.
 */
export interface BracketTier {
  upToKw: number | null;
  amountCents: number; // the whole fee when the size falls in this bracket
}

/** One tier of a marginal fee: its rate applies only to the kW between the tier below and `upToKw`. */
export interface MarginalTier {
  upToKw: number | null;
  rateCentsPerKw: number;
}

/** How a line's amount is worked out, before its minimum and maximum. */
export type FeeBasis =
  | { kind: "flat"; amountCents: number }
  | { kind: "per-kw"; size: SizeRating; rateCentsPerKw: number }
  | { kind: "bracket-tiers"; size: SizeRating; tiers: BracketTier[] }
  | { kind: "marginal-tiers"; size: SizeRating; tiers: MarginalTier[] }
  // A percent as the ordinance prints it, as a decimal string with at most four decimals
  // ("1.25" is 1.25 %, "0.0725" is 72.5 cents per $1,000); a string keeps it exact.
  | { kind: "valuation-percent"; ratePercent: string };

export type FeeBasisKind = FeeBasis["kind"];
export const FEE_BASIS_KINDS = [
  "flat",
  "per-kw",
  "bracket-tiers",
  "marginal-tiers",
  "valuation-percent",
] as const satisfies readonly FeeBasisKind[];
export const FEE_BASIS_LABELS: Record<FeeBasisKind, string> = {
  flat: "Flat fee",
  "per-kw": "Rate per kW",
  "bracket-tiers": "Size brackets (the whole fee by bracket)",
  "marginal-tiers": "Size tiers (each tier's rate on the kW within it)",
  "valuation-percent": "Percent of the project valuation",
};

/**
 * One line of a fee schedule as stored. A line is in effect on a day when
 * `effectiveFrom ≤ day` and, if it has an end, `day < effectiveUntil` (the end date is the first
 * day it no longer applies). Lines of one schedule that share a name are versions of one fee.
 */
export interface FeeLine {
  id: string;
  name: string;
  effectiveFrom: string; // YYYY-MM-DD
  effectiveUntil: string | null; // YYYY-MM-DD, exclusive
  basis: FeeBasis;
  minimumCents: number | null; // applied after the basis
  maximumCents: number | null;
}

/** A line with the authority whose schedule it comes from, when fees of several schedules are worked out together. */
export type ScheduledFeeLine = FeeLine & { authority?: string };

/** What a project declares that the fees read. */
export interface FeeFacts {
  dcKw: number | null; // module nameplate total; read to the watt; null: not known yet (the design is not complete)
  acKw: number | null; // inverter continuous output total; read to the watt; null: not known yet
  valuationCents: number | null; // null: not declared yet
  asOf: string; // YYYY-MM-DD, the day the fees are for
}

/**
 * Why a line could not be worked out yet. Until it is resolved the line counts at the least it can
 * come to: its minimum, or 0 when it has none.
 */
export interface FeeLineProblem {
  code: "valuation-missing" | "size-missing";
  message: string;
}

export interface FeeLineResult {
  lineId: string;
  name: string;
  authority?: string;
  kind: FeeBasisKind;
  /** The fee; for a line with a `problem`, the least it can come to once the missing fact is known. */
  amountCents: number;
  /** The working, one step a line, for a coordinator to check against the schedule. */
  arithmetic: string[];
  problem?: FeeLineProblem;
}

export interface FeeComputation {
  lines: FeeLineResult[];
  totalCents: number;
  /** False while any line has a problem: the total is then the least the fees can come to. */
  isComplete: boolean;
}
