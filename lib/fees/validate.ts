// The arithmetic's guard: stored lines and project facts are checked again before any sum, since
// a JSON row can hold what the schedule form would have refused. Fails on the first problem.
import { FeeScheduleError } from "./errors";
import { parsePercent } from "./quantities";
import { type RuleProblem, dateRangeProblem, isCents, isIsoDate, minMaxProblem, tierBoundsProblem, versionClashes } from "./rules";
import { SIZE_RATINGS, type FeeFacts, type ScheduledFeeLine } from "./types";

const join = (...parts: (string | number)[]) => parts.join(".");

export function assertValidFacts(facts: FeeFacts): void {
  for (const key of ["dcKw", "acKw"] as const) {
    const kw: unknown = facts[key];
    if (kw !== null && (typeof kw !== "number" || !Number.isFinite(kw) || kw < 0)) {
      throw new FeeScheduleError(
        join("facts", key),
        `The system size (${key === "dcKw" ? "kW DC" : "kW AC"}) must be a number of kW, zero or more, or null when not known yet.`,
      );
    }
  }
  if (facts.valuationCents !== null && !isCents(facts.valuationCents)) {
    throw new FeeScheduleError(
      "facts.valuationCents",
      "The declared valuation must be whole cents, zero or more, or null when not declared.",
    );
  }
  if (!isIsoDate(facts.asOf))
    throw new FeeScheduleError("facts.asOf", `The date the fees are for must be a day written YYYY-MM-DD; got "${String(facts.asOf)}".`);
}

export function assertValidFeeLines(lines: readonly ScheduledFeeLine[]): void {
  lines.forEach(assertValidFeeLine);
  const [clash] = versionClashes(lines);
  if (clash) throw new FeeScheduleError(join("lines", ...clash.path), `Fee line ${clash.path[0]}: ${clash.message}.`);
}

function assertValidFeeLine(line: ScheduledFeeLine, index: number): void {
  const fail = (path: (string | number)[], message: string): never => {
    const what = typeof line.name === "string" && line.name.trim() ? `Fee line "${line.name.trim()}"` : `Fee line ${index}`;
    throw new FeeScheduleError(join("lines", index, ...path), `${what}: ${message}.`);
  };
  const failOn = (problem: RuleProblem | null, prefix: (string | number)[]) =>
    problem && fail([...prefix, ...problem.path], problem.message);

  if (typeof line.id !== "string" || line.id === "") fail(["id"], "it has no id");
  if (typeof line.name !== "string" || line.name.trim() === "") fail(["name"], "it has no name");
  if (line.authority !== undefined && typeof line.authority !== "string") fail(["authority"], "its authority must be a name");
  if (!isIsoDate(line.effectiveFrom)) fail(["effectiveFrom"], "the date it takes effect must be written YYYY-MM-DD");
  if (line.effectiveUntil !== null && !isIsoDate(line.effectiveUntil))
    fail(["effectiveUntil"], "the end date must be written YYYY-MM-DD, or be null");
  const dates = dateRangeProblem(line.effectiveFrom, line.effectiveUntil);
  if (dates) fail(["effectiveUntil"], dates);
  for (const key of ["minimumCents", "maximumCents"] as const) {
    if (line[key] !== null && !isCents(line[key]))
      fail([key], `the ${key === "minimumCents" ? "minimum" : "maximum"} must be whole cents, zero or more, or null`);
  }
  const limits = minMaxProblem(line.minimumCents, line.maximumCents);
  if (limits) fail(["maximumCents"], limits);

  const basis = line.basis;
  if (typeof basis !== "object" || basis === null) return fail(["basis"], "it has no basis");
  if ("size" in basis && !SIZE_RATINGS.includes(basis.size)) fail(["basis", "size"], 'the size it reads must be "dc" or "ac"');
  switch (basis.kind) {
    case "flat":
      if (!isCents(basis.amountCents)) fail(["basis", "amountCents"], "the amount must be whole cents, zero or more");
      return;
    case "per-kw":
      if (!isCents(basis.rateCentsPerKw)) fail(["basis", "rateCentsPerKw"], "the rate per kW must be whole cents, zero or more");
      return;
    case "bracket-tiers":
    case "marginal-tiers": {
      if (!Array.isArray(basis.tiers)) return fail(["basis", "tiers"], "it has no tiers");
      failOn(tierBoundsProblem(basis.tiers.map((tier) => tier?.upToKw)), ["basis", "tiers"]);
      basis.tiers.forEach((tier, t) => {
        const [key, what] =
          basis.kind === "bracket-tiers" ? (["amountCents", "amount"] as const) : (["rateCentsPerKw", "rate per kW"] as const);
        if (!isCents((tier as unknown as Record<string, unknown>)[key]))
          fail(["basis", "tiers", t, key], `each tier's ${what} must be whole cents, zero or more`);
      });
      return;
    }
    case "valuation-percent":
      if (typeof basis.ratePercent !== "string" || parsePercent(basis.ratePercent) === null) {
        fail(["basis", "ratePercent"], 'the percent must be a decimal from 0 to 100 with at most four decimals, e.g. "1.25"');
      }
      return;
    default:
      fail(["basis", "kind"], `"${String((basis as { kind: unknown }).kind)}" is not a way of working out a fee`);
  }
}
