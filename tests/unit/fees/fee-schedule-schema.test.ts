// The schedule form's schema (lib/schemas/fee-schedule.ts), kept beside the arithmetic it feeds.
import { describe, expect, expectTypeOf, it } from "vitest";
import { computeFees, type FeeLine } from "@/lib/fees";
import { FeeLineInput, FeeScheduleInput, feeLineToFormValues, type FeeLineValues } from "@/lib/schemas/fee-schedule";
import { ashcombeBrackets, brindleMarginal, facts } from "./fixtures";

type Parsed = { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } };
const messages = (result: Parsed) => Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

// An invented schedule line (demo) as the form sends it: every field a string.
const form = {
  id: "line-1",
  name: " Building permit ",
  effectiveFrom: "2026-07-01",
  effectiveUntil: "",
  basis: { kind: "per-kw", size: "dc", rateUsdPerKw: "15.00" },
  minimumUsd: "150",
  maximumUsd: "",
};
const withBasis = (basis: Record<string, unknown>, patch: Record<string, unknown> = {}) => ({ ...form, basis, ...patch });

describe("FeeLineInput turns a form's dollars into the stored line", () => {
  it("parses to a FeeLine with cents and nulls", () => {
    expect(FeeLineInput.parse(form)).toEqual({
      id: "line-1",
      name: "Building permit",
      effectiveFrom: "2026-07-01",
      effectiveUntil: null,
      basis: { kind: "per-kw", size: "dc", rateCentsPerKw: 1_500 },
      minimumCents: 15_000,
      maximumCents: null,
    } satisfies FeeLine);
    expectTypeOf<FeeLineValues>().toEqualTypeOf<FeeLine>();
  });

  it.each([
    [
      { kind: "flat", amountUsd: "$1,234.50" },
      { kind: "flat", amountCents: 123_450 },
    ],
    [
      { kind: "flat", amountUsd: 12.5 },
      { kind: "flat", amountCents: 1_250 },
    ], // the API may send a number of dollars
    [
      { kind: "per-kw", size: "ac", rateUsdPerKw: ".75" },
      { kind: "per-kw", size: "ac", rateCentsPerKw: 75 },
    ],
    [
      {
        kind: "bracket-tiers",
        size: "dc",
        tiers: [
          { upToKw: "10", amountUsd: "100" },
          { upToKw: "25", amountUsd: "200.00" },
          { upToKw: "", amountUsd: "300" },
        ],
      },
      ashcombeBrackets,
    ],
    [
      {
        kind: "marginal-tiers",
        size: "ac",
        tiers: [
          { upToKw: 10, rateUsdPerKw: "20" },
          { upToKw: "25.000", rateUsdPerKw: "10" },
          { upToKw: null, rateUsdPerKw: "5" },
        ],
      },
      brindleMarginal,
    ],
    [
      { kind: "valuation-percent", ratePercent: "1.25" },
      { kind: "valuation-percent", ratePercent: "1.25" },
    ],
    [
      { kind: "valuation-percent", ratePercent: " 01.50 %" },
      { kind: "valuation-percent", ratePercent: "1.5" },
    ],
    [
      { kind: "valuation-percent", ratePercent: ".0725" },
      { kind: "valuation-percent", ratePercent: "0.0725" },
    ],
    [
      { kind: "valuation-percent", ratePercent: "1.25000" },
      { kind: "valuation-percent", ratePercent: "1.25" },
    ],
  ])("basis %j", (basis, stored) => {
    expect(FeeLineInput.parse(withBasis(basis)).basis).toEqual(stored);
  });

  it("reads an end date, a maximum, and blanks, nulls or absent fields as none", () => {
    expect(FeeLineInput.parse({ ...form, effectiveUntil: "2027-01-01", maximumUsd: "500" })).toMatchObject({
      effectiveUntil: "2027-01-01",
      maximumCents: 50_000,
    });
    const { minimumUsd: _min, maximumUsd: _max, effectiveUntil: _until, ...bare } = form;
    expect(FeeLineInput.parse(bare)).toMatchObject({ effectiveUntil: null, minimumCents: null, maximumCents: null });
    expect(FeeLineInput.parse({ ...form, minimumUsd: null, effectiveUntil: null })).toMatchObject({
      effectiveUntil: null,
      minimumCents: null,
    });
  });
});

describe("FeeLineInput refuses nonsense with messages beside the field", () => {
  const chooseBasis =
    "Choose how the fee is worked out: a flat fee, a rate per kW, size brackets, size tiers, or a percent of the valuation";
  const brackets = (...tiers: [string, string][]) => ({
    kind: "bracket-tiers",
    size: "dc",
    tiers: tiers.map(([upToKw, amountUsd]) => ({ upToKw, amountUsd })),
  });

  it.each<[string, Record<string, unknown>, string, string]>([
    ["no name", { name: "  " }, "name", "Enter the fee's name"],
    ["no start date", { effectiveFrom: "" }, "effectiveFrom", "Enter the date the fee takes effect"],
    [
      "a US-style date",
      { effectiveFrom: "07/01/2026" },
      "effectiveFrom",
      "Enter the date the fee takes effect as YYYY-MM-DD, e.g. 2026-07-01",
    ],
    [
      "a day that does not exist",
      { effectiveFrom: "2026-02-29" },
      "effectiveFrom",
      "Enter the date the fee takes effect as YYYY-MM-DD, e.g. 2026-07-01",
    ],
    ["an end on the start", { effectiveUntil: "2026-07-01" }, "effectiveUntil", "The end date must be after the date the fee takes effect"],
    [
      "a bad end date",
      { effectiveUntil: "next year" },
      "effectiveUntil",
      "Enter the end date as YYYY-MM-DD, e.g. 2027-01-01, or leave it blank",
    ],
    [
      "a minimum above the maximum",
      { minimumUsd: "500", maximumUsd: "150.00" },
      "maximumUsd",
      "The minimum ($500.00) cannot be above the maximum ($150.00)",
    ],
    ["a negative minimum", { minimumUsd: "-5" }, "minimumUsd", "The minimum cannot be negative"],
    ["an unknown basis", { basis: { kind: "hourly" } }, "basis.kind", chooseBasis],
    ["no basis", { basis: undefined }, "basis", chooseBasis],
    [
      "a negative rate",
      { basis: { kind: "per-kw", size: "dc", rateUsdPerKw: "-15" } },
      "basis.rateUsdPerKw",
      "The rate per kW cannot be negative",
    ],
    [
      "a third decimal",
      { basis: { kind: "flat", amountUsd: "12.345" } },
      "basis.amountUsd",
      "Enter the amount in dollars and cents, e.g. 150.00",
    ],
    ["a blank amount", { basis: { kind: "flat", amountUsd: "" } }, "basis.amountUsd", "Enter the amount"],
    ["a missing amount", { basis: { kind: "flat" } }, "basis.amountUsd", "Enter the amount"],
    [
      "an amount too large",
      { basis: { kind: "flat", amountUsd: "20000000" } },
      "basis.amountUsd",
      "The amount must be at most $10,000,000.00",
    ],
    [
      "no size",
      { basis: { kind: "per-kw", rateUsdPerKw: "15" } },
      "basis.size",
      "Choose the size the fee reads: DC (module nameplate) or AC (inverter output)",
    ],
    [
      "tiers not ascending",
      { basis: brackets(["10", "100"], ["5", "200"], ["", "300"]) },
      "basis.tiers.1.upToKw",
      "Tiers must ascend: this tier must end above 10.000 kW",
    ],
    [
      "equal tier edges",
      { basis: brackets(["10", "100"], ["10", "200"], ["", "300"]) },
      "basis.tiers.1.upToKw",
      "Tiers must ascend: this tier must end above 10.000 kW",
    ],
    [
      "a closed last tier",
      { basis: brackets(["10", "100"], ["25", "200"]) },
      "basis.tiers.1.upToKw",
      "Leave the last tier's upper size blank so it covers every larger system",
    ],
    [
      "an open middle tier",
      { basis: brackets(["", "100"], ["", "200"]) },
      "basis.tiers.0.upToKw",
      "Only the last tier is open-ended; enter the size this tier ends at",
    ],
    [
      "a first tier ending at 0 kW",
      { basis: brackets(["0", "100"], ["", "200"]) },
      "basis.tiers.0.upToKw",
      "The first tier must end above 0 kW",
    ],
    [
      "a negative tier edge",
      { basis: brackets(["-10", "100"], ["", "200"]) },
      "basis.tiers.0.upToKw",
      "A tier's upper size cannot be negative",
    ],
    [
      "a tier edge finer than a watt",
      { basis: brackets(["10.0005", "100"], ["", "200"]) },
      "basis.tiers.0.upToKw",
      "Enter the tier's upper size with at most three decimals (whole watts)",
    ],
    [
      "a tier edge in words",
      { basis: brackets(["ten", "100"], ["", "200"]) },
      "basis.tiers.0.upToKw",
      "Enter the tier's upper size in kW, e.g. 10 or 25.5",
    ],
    [
      "a negative tier amount",
      { basis: brackets(["10", "-100"], ["", "200"]) },
      "basis.tiers.0.amountUsd",
      "The bracket's amount cannot be negative",
    ],
    ["no tiers", { basis: { kind: "marginal-tiers", size: "ac", tiers: [] } }, "basis.tiers", "Add at least one tier"],
    [
      "a percent above 100",
      { basis: { kind: "valuation-percent", ratePercent: "150" } },
      "basis.ratePercent",
      "The percent must be at most 100",
    ],
    [
      "a negative percent",
      { basis: { kind: "valuation-percent", ratePercent: "-1" } },
      "basis.ratePercent",
      "The percent cannot be negative",
    ],
    [
      "five decimals of a percent",
      { basis: { kind: "valuation-percent", ratePercent: "1.23456" } },
      "basis.ratePercent",
      "Enter the percent with at most four decimals",
    ],
    [
      "a percent in words",
      { basis: { kind: "valuation-percent", ratePercent: "one" } },
      "basis.ratePercent",
      "Enter the percent as a number, e.g. 1.25",
    ],
  ])("%s", (_what, patch, path, message) => {
    expect(messages(FeeLineInput.safeParse({ ...form, ...patch }))[path]).toBe(message);
  });

  it("reports a cross-field rule beside unrelated errors", () => {
    const found = messages(FeeLineInput.safeParse({ ...form, name: "", minimumUsd: "500", maximumUsd: "150" }));
    expect(found).toEqual({ name: "Enter the fee's name", maximumUsd: "The minimum ($500.00) cannot be above the maximum ($150.00)" });
  });
});

describe("FeeScheduleInput", () => {
  const line = (id: string, name: string, effectiveFrom: string) => ({ ...form, id, name, effectiveFrom });

  it("takes versions of one fee with different start dates, and the arithmetic picks the newer", () => {
    const lines = FeeScheduleInput.parse([
      line("a", "Building permit", "2025-01-01"),
      { ...line("b", "Building permit", "2026-07-01"), basis: { kind: "flat", amountUsd: "250" }, minimumUsd: "" },
    ]);
    // On 2026-07-01 the flat $250.00 version supersedes $15.00/kW.
    expect(computeFees({ lines, facts: facts({ asOf: "2026-07-01" }) }).lines).toMatchObject([{ lineId: "b", amountCents: 25_000 }]);
  });

  it.each<[string, unknown, string, string]>([
    [
      "two versions starting the same day",
      [line("a", "Building permit", "2026-07-01"), line("b", "building permit", "2026-07-01")],
      "1.effectiveFrom",
      'Another version of "building permit" already takes effect on 2026-07-01',
    ],
    [
      "two lines with one id",
      [line("a", "Building permit", "2026-07-01"), line("a", "Plan review", "2026-07-01")],
      "1.id",
      "Two lines share this id",
    ],
    ["a bad line", [line("a", "", "2026-07-01")], "0.name", "Enter the fee's name"],
    ["not a list", { lines: [] }, "", "Send the schedule's lines as a list"],
    [
      "too many lines",
      Array.from({ length: 101 }, (_, i) => line(`l${i}`, `Fee ${i}`, "2026-07-01")),
      "",
      "At most 100 lines in one schedule",
    ],
  ])("refuses %s", (_what, input, path, message) => {
    expect(messages(FeeScheduleInput.safeParse(input))[path]).toBe(message);
  });

  it("takes an empty schedule", () => {
    expect(FeeScheduleInput.parse([])).toEqual([]);
  });
});

describe("feeLineToFormValues", () => {
  const stored: FeeLine[] = [
    {
      id: "a",
      name: "Building permit",
      effectiveFrom: "2026-07-01",
      effectiveUntil: "2027-07-01",
      basis: { kind: "flat", amountCents: 123_456 },
      minimumCents: null,
      maximumCents: 500_000,
    },
    {
      id: "b",
      name: "Electrical permit",
      effectiveFrom: "2026-07-01",
      effectiveUntil: null,
      basis: { kind: "per-kw", size: "ac", rateCentsPerKw: 5 },
      minimumCents: 0,
      maximumCents: null,
    },
    {
      id: "c",
      name: "Plan review",
      effectiveFrom: "2026-07-01",
      effectiveUntil: null,
      basis: {
        kind: "bracket-tiers",
        size: "dc",
        tiers: [
          { upToKw: 10.5, amountCents: 1 },
          { upToKw: null, amountCents: 2 },
        ],
      },
      minimumCents: null,
      maximumCents: null,
    },
    {
      id: "d",
      name: "Interconnection application fee",
      effectiveFrom: "2026-07-01",
      effectiveUntil: null,
      basis: brindleMarginal,
      minimumCents: null,
      maximumCents: null,
    },
    {
      id: "e",
      name: "Building permit",
      effectiveFrom: "2026-07-01",
      effectiveUntil: null,
      basis: { kind: "valuation-percent", ratePercent: "0.0725" },
      minimumCents: 7_500,
      maximumCents: null,
    },
  ];
  it.each(stored)("a stored line edited without change parses back to itself (%#)", (line) => {
    expect(FeeLineInput.parse(feeLineToFormValues(line))).toEqual(line);
  });

  it("shows dollars as the admin types them", () => {
    const values = feeLineToFormValues({
      id: "a",
      name: "Building permit",
      effectiveFrom: "2026-07-01",
      effectiveUntil: null,
      basis: { kind: "flat", amountCents: 123_450 },
      minimumCents: 5,
      maximumCents: null,
    });
    expect(values).toMatchObject({ basis: { kind: "flat", amountUsd: "1234.50" }, minimumUsd: "0.05", maximumUsd: "", effectiveUntil: "" });
  });
});
