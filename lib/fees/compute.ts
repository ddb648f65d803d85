// Fee arithmetic: which lines apply on a day, what each comes to, and the working behind it.
// Exact throughout: sizes in whole watts, money in integer cents, products in bigint, each product
// rounded once to the cent, half up (see money.ts). Floating point never holds money.
import { applicableLines } from "./effective";
import { divideRoundHalfUp, formatUsd, formatUsdExact, toCents } from "./money";
import { formatKw, kwToWatts, parsePercent } from "./quantities";
import type {
  BracketTier,
  FeeBasis,
  FeeComputation,
  FeeFacts,
  FeeLineProblem,
  FeeLineResult,
  MarginalTier,
  ScheduledFeeLine,
  SizeRating,
} from "./types";
import { assertValidFacts, assertValidFeeLines } from "./validate";

type Sizes = Record<SizeRating, number | null>; // whole watts; null while the design is not complete
type Working = { amountCents: number; arithmetic: string[]; problem?: FeeLineProblem };

/**
 * The fees that apply to a project on `facts.asOf`, each with its working, and their total.
 * Lines are checked first: data that breaks a schedule rule throws `FeeScheduleError`. A line
 * that needs a fact the project has not given yet (the valuation, or the system size) comes back
 * with a `problem` and the least it can come to, its minimum (or 0), which the total counts; the
 * computation is then marked incomplete rather than thrown.
 */
export function computeFees({ lines, facts }: { lines: readonly ScheduledFeeLine[]; facts: FeeFacts }): FeeComputation {
  assertValidFacts(facts);
  assertValidFeeLines(lines);
  const sizes: Sizes = { dc: facts.dcKw === null ? null : kwToWatts(facts.dcKw), ac: facts.acKw === null ? null : kwToWatts(facts.acKw) };
  const results = applicableLines(lines, facts.asOf).map((line) => lineResult(line, sizes, facts.valuationCents));
  const totalCents = toCents(results.reduce((sum, line) => sum + BigInt(line.amountCents), 0n));
  return { lines: results, totalCents, isComplete: results.every((line) => !line.problem) };
}

function lineResult(line: ScheduledFeeLine, sizes: Sizes, valuationCents: number | null): FeeLineResult {
  const working = basisWorking(line.basis, sizes, valuationCents);
  if (working.problem) countAtLeast(working, line.minimumCents);
  else applyLimits(working, line.minimumCents, line.maximumCents);
  return {
    lineId: line.id,
    name: line.name,
    ...(line.authority !== undefined && { authority: line.authority }),
    kind: line.basis.kind,
    amountCents: working.amountCents,
    arithmetic: working.arithmetic,
    ...(working.problem && { problem: working.problem }),
  };
}

function basisWorking(basis: FeeBasis, sizes: Sizes, valuationCents: number | null): Working {
  if (basis.kind === "flat") return { amountCents: basis.amountCents, arithmetic: [`flat fee = ${formatUsd(basis.amountCents)}`] };
  if (basis.kind === "valuation-percent") return valuationWorking(basis.ratePercent, valuationCents);
  const watts = sizes[basis.size];
  if (watts === null) return sizeMissing(basis.size);
  switch (basis.kind) {
    case "per-kw": {
      const { cents, text } = rateTimesSize(basis.rateCentsPerKw, watts, basis.size);
      return { amountCents: cents, arithmetic: [text] };
    }
    case "bracket-tiers":
      return bracketWorking(basis.tiers, watts, basis.size);
    case "marginal-tiers":
      return marginalWorking(basis.tiers, watts, basis.size);
  }
}

function sizeMissing(size: SizeRating): Working {
  return {
    amountCents: 0,
    arithmetic: [`reads the system size in kW ${RATING_LABEL[size]}: not known until the design is complete`],
    problem: { code: "size-missing", message: "Complete the design to work out this fee: it depends on the system size." },
  };
}

/**
 * A line that cannot be worked out yet still costs at least its minimum (every amount is raised to
 * it), so it counts at that much, and the working says so; without a minimum it counts at 0.
 */
function countAtLeast(working: Working, minimumCents: number | null): void {
  if (minimumCents === null || minimumCents === 0) return;
  working.amountCents = minimumCents;
  working.arithmetic.push(`at least the ${formatUsd(minimumCents)} minimum until then`);
}

/** A minimum raises the basis amount, a maximum caps it; the working says which one acted. */
function applyLimits(working: Working, minimumCents: number | null, maximumCents: number | null): void {
  if (minimumCents !== null && working.amountCents < minimumCents) {
    working.amountCents = minimumCents;
    working.arithmetic.push(`below the ${formatUsd(minimumCents)} minimum → ${formatUsd(minimumCents)}`);
  } else if (maximumCents !== null && working.amountCents > maximumCents) {
    working.amountCents = maximumCents;
    working.arithmetic.push(`above the ${formatUsd(maximumCents)} maximum → ${formatUsd(maximumCents)}`);
  }
}

const RATING_LABEL: Record<SizeRating, string> = { dc: "DC", ac: "AC" };

/** rate × size: cents per kW × watts is thousandths of a cent, rounded half up to the cent. */
function rateTimesSize(rateCentsPerKw: number, watts: number, size: SizeRating, note = ""): { cents: number; text: string } {
  const exact = BigInt(rateCentsPerKw) * BigInt(watts);
  const cents = toCents(divideRoundHalfUp(exact, 1000n));
  return {
    cents,
    text: `${formatKw(watts)} ${RATING_LABEL[size]} × ${formatUsd(rateCentsPerKw)}/kW${note} = ${exactThenRounded(exact, 3, cents)}`,
  };
}

/** "$95.025, rounded to $95.03" when rounding changed the figure; just "$95.03" when it did not. */
function exactThenRounded(exact: bigint, scale: number, cents: number): string {
  const precise = formatUsdExact(exact, scale);
  const rounded = formatUsd(cents);
  return precise === rounded ? rounded : `${precise}, rounded to ${rounded}`;
}

/** Upper edges in watts; the last tier's is Infinity. */
const edgesW = (tiers: readonly { upToKw: number | null }[]) =>
  tiers.map((tier) => (tier.upToKw === null ? Infinity : kwToWatts(tier.upToKw)));

// A size on an upper edge belongs to that tier: "up to 10 kW" includes 10.000 kW.
function bracketWorking(tiers: readonly BracketTier[], watts: number, size: SizeRating): Working {
  const edges = edgesW(tiers);
  const index = edges.findIndex((edge) => watts <= edge);
  const tier = tiers[index]!; // the last tier is open-ended, so one always matches
  const over = index > 0 ? `over ${formatKw(edges[index - 1]!)}` : "";
  const upTo = tier.upToKw !== null ? `up to ${formatKw(edges[index]!)}` : "";
  const bracket = [over, upTo].filter(Boolean).join(" ") || "of every size";
  return {
    amountCents: tier.amountCents,
    arithmetic: [`${formatKw(watts)} ${RATING_LABEL[size]} is in the bracket ${bracket} → ${formatUsd(tier.amountCents)}`],
  };
}

// Each tier's rate applies to the kW between the tier below's edge and its own; each tier's part
// is rounded to the cent on its own so the parts shown add up to the amount.
function marginalWorking(tiers: readonly MarginalTier[], watts: number, size: SizeRating): Working {
  const edges = edgesW(tiers);
  const parts = tiers.flatMap((tier, index) => {
    const fromW = index === 0 ? 0 : edges[index - 1]!;
    const inTierW = Math.max(0, Math.min(watts, edges[index]!) - fromW);
    if (inTierW === 0 && index > 0) return [];
    const range = tier.upToKw === null ? `above ${formatKw(fromW)}` : `${formatKw(fromW, { unit: false })}–${formatKw(edges[index]!)}`;
    return [rateTimesSize(tier.rateCentsPerKw, inTierW, size, ` (tier ${range})`)];
  });
  const amountCents = toCents(parts.reduce((sum, part) => sum + BigInt(part.cents), 0n));
  const arithmetic = parts.map((part) => part.text);
  if (parts.length > 1) arithmetic.push(`${parts.map((part) => formatUsd(part.cents)).join(" + ")} = ${formatUsd(amountCents)}`);
  return { amountCents, arithmetic };
}

// valuation (cents) × millionths of the whole is millionths of a cent, rounded half up to the cent.
function valuationWorking(ratePercent: string, valuationCents: number | null): Working {
  if (valuationCents === null) {
    return {
      amountCents: 0,
      arithmetic: [`${ratePercent}% of the project valuation: no valuation declared yet`],
      problem: { code: "valuation-missing", message: "Enter the project's declared valuation to work out this fee." },
    };
  }
  const exact = BigInt(valuationCents) * parsePercent(ratePercent)!;
  const cents = toCents(divideRoundHalfUp(exact, 1_000_000n));
  return {
    amountCents: cents,
    arithmetic: [`${formatUsd(valuationCents)} valuation × ${ratePercent}% = ${exactThenRounded(exact, 6, cents)}`],
  };
}
