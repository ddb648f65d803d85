import { z } from "zod";
import {
  SIZE_RATINGS,
  centsToDollarsText,
  dateRangeProblem,
  formatUsd,
  isIsoDate,
  isWholeWatts,
  minMaxProblem,
  parsePercent,
  parseUsd,
  tierBoundsProblem,
  versionClashes,
  type FeeBasis,
  type FeeLine,
} from "@/lib/fees";
import { requiredText, safeString, whenValid } from "./fields";

// Money is typed in dollars, as a schedule prints it ("150.00", "$1,250", "0.5"): that is what an
// admin copies, and asking for cents invites slips by a factor of 100. The schema turns the text
// into integer cents, the unit of every stored line and of the arithmetic, digit by digit, so no
// floating-point number ever holds money. The API sends the same strings; a plain number of
// dollars is read through its text. Field names say the unit: `…Usd` typed, `…Cents` stored.

export const MAX_FEE_CENTS = 1_000_000_000; // $10,000,000.00; anything larger is a typing slip
export const MAX_TIER_KW = 100_000;
export const MAX_TIERS = 20;
export const MAX_SCHEDULE_LINES = 100;

const isBlank = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");
const asText = (v: string | number) => (typeof v === "number" ? String(v) : v).trim();

/** Dollars (text or number) to whole cents, with messages that name the field. */
function dollarsToCents(label: string, value: string | number, ctx: z.RefinementCtx): number {
  const text = asText(value);
  const cents = parseUsd(text);
  const message =
    text === ""
      ? `Enter the ${label}`
      : text.startsWith("-")
        ? `The ${label} cannot be negative`
        : cents === null
          ? `Enter the ${label} in dollars and cents, e.g. 150.00`
          : cents > MAX_FEE_CENTS
            ? `The ${label} must be at most ${formatUsd(MAX_FEE_CENTS)}`
            : null;
  if (message === null) return cents!;
  ctx.addIssue({ code: "custom", message });
  return z.NEVER;
}

const money = (label: string) =>
  z.union([safeString(), z.number()], { error: `Enter the ${label}` }).transform((value, ctx) => dollarsToCents(label, value, ctx));

/** Blank means "none": no minimum, no maximum. */
const optionalMoney = (label: string) =>
  z
    .union([safeString(), z.number(), z.null()], { error: `Enter the ${label} in dollars and cents, or leave it blank` })
    .optional()
    .transform((value, ctx) => (isBlank(value) ? null : dollarsToCents(label, value!, ctx)));

const date = (label: string) =>
  safeString({ error: `Enter the ${label}` })
    .trim()
    .min(1, { error: `Enter the ${label}`, abort: true })
    .refine(isIsoDate, `Enter the ${label} as YYYY-MM-DD, e.g. 2026-07-01`);

const optionalDate = (label: string) =>
  z
    .union([safeString(), z.null()], { error: `Enter the ${label} as YYYY-MM-DD, or leave it blank` })
    .optional()
    .transform((value, ctx) => {
      if (isBlank(value)) return null;
      const text = value!.trim();
      if (isIsoDate(text)) return text;
      ctx.addIssue({ code: "custom", message: `Enter the ${label} as YYYY-MM-DD, e.g. 2027-01-01, or leave it blank` });
      return z.NEVER;
    });

/** A tier's upper edge in kW; blank for the open-ended last tier. */
const upToKw = z
  .union([safeString(), z.number(), z.null()], { error: "Enter the tier's upper size in kW, or leave the last one blank" })
  .optional()
  .transform((value, ctx) => {
    if (isBlank(value)) return null;
    const text = asText(value!).replaceAll(",", "");
    const kw = /^\d*\.?\d+$/.test(text) ? Number(text) : NaN;
    const message = text.startsWith("-")
      ? "A tier's upper size cannot be negative"
      : Number.isNaN(kw)
        ? "Enter the tier's upper size in kW, e.g. 10 or 25.5"
        : !isWholeWatts(kw)
          ? "Enter the tier's upper size with at most three decimals (whole watts)"
          : kw > MAX_TIER_KW
            ? `A tier's upper size must be at most ${MAX_TIER_KW.toLocaleString("en-US")} kW`
            : null;
    if (message === null) return kw;
    ctx.addIssue({ code: "custom", message });
    return z.NEVER;
  });

/** The stored percent: no spaces or % sign, no needless zeros ("01.50 %" → "1.5"). */
const ratePercent = z.union([safeString(), z.number()], { error: "Enter the percent, e.g. 1.25" }).transform((value, ctx) => {
  const text = asText(value).replace(/\s*%$/, "");
  const [whole = "", decimals = ""] = text.split(".");
  const significant = decimals.replace(/0+$/, "");
  const canonical = [String(Number(whole || "0")), significant].filter(Boolean).join(".");
  const message = text.startsWith("-")
    ? "The percent cannot be negative"
    : !/^\d*\.?\d+$/.test(text)
      ? "Enter the percent as a number, e.g. 1.25"
      : significant.length > 4
        ? "Enter the percent with at most four decimals"
        : parsePercent(canonical) === null
          ? "The percent must be at most 100"
          : null;
  if (message === null) return canonical;
  ctx.addIssue({ code: "custom", message });
  return z.NEVER;
});

const size = z.enum(SIZE_RATINGS, { error: "Choose the size the fee reads: DC (module nameplate) or AC (inverter output)" });

const tiers = <T extends z.ZodType<{ upToKw: number | null }>>(tier: T) =>
  z
    .array(tier, { error: "Add the tiers" })
    .min(1, "Add at least one tier")
    .max(MAX_TIERS, `At most ${MAX_TIERS} tiers`)
    .superRefine((list, ctx) => {
      const problem = tierBoundsProblem(list.map((t) => t.upToKw));
      if (problem) ctx.addIssue({ code: "custom", path: problem.path, message: problem.message });
    });

const BasisInput = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("flat"), amountUsd: money("amount") }),
    z.object({ kind: z.literal("per-kw"), size, rateUsdPerKw: money("rate per kW") }),
    z.object({ kind: z.literal("bracket-tiers"), size, tiers: tiers(z.object({ upToKw, amountUsd: money("bracket's amount") })) }),
    z.object({ kind: z.literal("marginal-tiers"), size, tiers: tiers(z.object({ upToKw, rateUsdPerKw: money("tier's rate per kW") })) }),
    z.object({ kind: z.literal("valuation-percent"), ratePercent }),
  ],
  { error: "Choose how the fee is worked out: a flat fee, a rate per kW, size brackets, size tiers, or a percent of the valuation" },
);

function toStoredBasis(basis: z.output<typeof BasisInput>): FeeBasis {
  switch (basis.kind) {
    case "flat":
      return { kind: "flat", amountCents: basis.amountUsd };
    case "per-kw":
      return { kind: "per-kw", size: basis.size, rateCentsPerKw: basis.rateUsdPerKw };
    case "bracket-tiers":
      return { kind: "bracket-tiers", size: basis.size, tiers: basis.tiers.map((t) => ({ upToKw: t.upToKw, amountCents: t.amountUsd })) };
    case "marginal-tiers":
      return {
        kind: "marginal-tiers",
        size: basis.size,
        tiers: basis.tiers.map((t) => ({ upToKw: t.upToKw, rateCentsPerKw: t.rateUsdPerKw })),
      };
    case "valuation-percent":
      return { kind: "valuation-percent", ratePercent: basis.ratePercent };
  }
}

/** One fee line as the schedule form submits it; parses to the line as stored (`FeeLine`). */
export const FeeLineInput = z
  .object({
    id: safeString({ error: "The line needs an id" }).trim().min(1, "The line needs an id").max(64, "A line id is at most 64 characters"),
    name: requiredText("fee's name", 120),
    effectiveFrom: date("date the fee takes effect"),
    effectiveUntil: optionalDate("end date"),
    basis: BasisInput,
    minimumUsd: optionalMoney("minimum"),
    maximumUsd: optionalMoney("maximum"),
  })
  .superRefine(
    (line, ctx) => {
      const message = dateRangeProblem(line.effectiveFrom, line.effectiveUntil);
      if (message) ctx.addIssue({ code: "custom", path: ["effectiveUntil"], message });
    },
    { when: whenValid("effectiveFrom", "effectiveUntil") },
  )
  .superRefine(
    (line, ctx) => {
      const message = minMaxProblem(line.minimumUsd, line.maximumUsd);
      if (message) ctx.addIssue({ code: "custom", path: ["maximumUsd"], message });
    },
    { when: whenValid("minimumUsd", "maximumUsd") },
  )
  .transform((line): FeeLine => ({
    id: line.id,
    name: line.name,
    effectiveFrom: line.effectiveFrom,
    effectiveUntil: line.effectiveUntil,
    basis: toStoredBasis(line.basis),
    minimumCents: line.minimumUsd,
    maximumCents: line.maximumUsd,
  }));
export type FeeLineInput = z.input<typeof FeeLineInput>;
export type FeeLineValues = z.output<typeof FeeLineInput>;

/** A schedule's lines; versions of one fee (same name) need different start dates. */
export const FeeScheduleInput = z
  .array(FeeLineInput, { error: "Send the schedule's lines as a list" })
  .max(MAX_SCHEDULE_LINES, `At most ${MAX_SCHEDULE_LINES} lines in one schedule`)
  .superRefine((lines, ctx) => {
    const ids = new Set<string>();
    lines.forEach((line, index) => {
      if (ids.has(line.id)) ctx.addIssue({ code: "custom", path: [index, "id"], message: "Two lines share this id" });
      ids.add(line.id);
    });
    for (const clash of versionClashes(lines)) ctx.addIssue({ code: "custom", path: clash.path, message: clash.message });
  });
export type FeeScheduleInput = z.input<typeof FeeScheduleInput>;
export type FeeScheduleValues = z.output<typeof FeeScheduleInput>;

/** A stored line as the form edits it: cents back to dollars text, nulls to blanks. */
export function feeLineToFormValues(line: FeeLine): FeeLineInput {
  const usd = (cents: number | null) => (cents === null ? "" : centsToDollarsText(cents));
  const kw = (value: number | null) => (value === null ? "" : String(value));
  const basis = line.basis;
  return {
    id: line.id,
    name: line.name,
    effectiveFrom: line.effectiveFrom,
    effectiveUntil: line.effectiveUntil ?? "",
    minimumUsd: usd(line.minimumCents),
    maximumUsd: usd(line.maximumCents),
    basis:
      basis.kind === "flat"
        ? { kind: "flat", amountUsd: usd(basis.amountCents) }
        : basis.kind === "per-kw"
          ? { kind: "per-kw", size: basis.size, rateUsdPerKw: usd(basis.rateCentsPerKw) }
          : basis.kind === "bracket-tiers"
            ? {
                kind: "bracket-tiers",
                size: basis.size,
                tiers: basis.tiers.map((t) => ({ upToKw: kw(t.upToKw), amountUsd: usd(t.amountCents) })),
              }
            : basis.kind === "marginal-tiers"
              ? {
                  kind: "marginal-tiers",
                  size: basis.size,
                  tiers: basis.tiers.map((t) => ({ upToKw: kw(t.upToKw), rateUsdPerKw: usd(t.rateCentsPerKw) })),
                }
              : { kind: "valuation-percent", ratePercent: basis.ratePercent },
  };
}
