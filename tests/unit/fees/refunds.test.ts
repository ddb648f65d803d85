import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { planLineRefund, refundableCents, returnedFeeKeys, type PaidPayment, type StandingRefund } from "@/lib/fees";

// Invented payment (demo): a $150.00 permit, a $75.00 plan review and a $125.00 interconnection fee paid together.
const LINES = [
  { feeKey: "permit", name: "Solar permit", amountCents: 150_00 },
  { feeKey: "review", name: "Plan review", amountCents: 75_00 },
  { feeKey: "utility", name: "Interconnection application", amountCents: 125_00 },
];
const paid = (...refunds: StandingRefund[]): PaidPayment => ({ amountCents: 350_00, lines: LINES, refunds });
const money = (amountCents: number): StandingRefund => ({ amountCents, feeKeys: [] });
const lines = (...feeKeys: string[]): StandingRefund => ({
  amountCents: LINES.filter((l) => feeKeys.includes(l.feeKey)).reduce((s, l) => s + l.amountCents, 0),
  feeKeys,
});

describe("which fees a payment's refunds give back", () => {
  test.each<[string, StandingRefund[], string[], number]>([
    ["no refund", [], [], 350_00],
    ["a refund naming the plan review returns that line only", [lines("review")], ["review"], 275_00],
    ["a refund naming two lines returns both", [lines("permit", "utility")], ["permit", "utility"], 75_00],
    // An amount equal to one line's is still money, not a fee: which fee it was for is not known.
    ["$75.00 of money, not tied to a line, returns no fee", [money(75_00)], [], 275_00],
    ["money and a named line: only the named line", [money(10_00), lines("review")], ["review"], 265_00],
    ["refunds that add up to the whole payment return every line", [money(200_00), money(150_00)], ["permit", "review", "utility"], 0],
    ["a named line and money for the rest: every line", [lines("utility"), money(225_00)], ["permit", "review", "utility"], 0],
  ])("%s", (_, refunds, returned, left) => {
    const payment = paid(...refunds);
    expect([...returnedFeeKeys(payment)].sort()).toEqual([...returned].sort());
    expect(refundableCents(payment)).toBe(left);
  });
});

describe("planning a refund of whole lines", () => {
  test.each<[string, StandingRefund[], string[], { amountCents: number } | { message: string }]>([
    ["one line: its amount", [], ["review"], { amountCents: 75_00 }],
    ["two lines: their sum, exactly", [], ["permit", "review"], { amountCents: 225_00 }],
    ["the same key twice counts once", [], ["review", "review"], { amountCents: 75_00 }],
    ["a line already refunded", [lines("review")], ["review"], { message: "Plan review was already refunded." }],
    ["a line of another payment", [], ["elsewhere"], { message: "A chosen fee is not part of this payment." }],
    ["nothing chosen", [], [], { message: "Choose at least one fee to refund." }],
    [
      "more than is left after money was returned",
      [money(300_00)],
      ["permit"],
      { message: "The chosen fees come to $150.00, but only $50.00 of this payment is left to refund." },
    ],
  ])("%s", (_, refunds, feeKeys, expected) => {
    const plan = planLineRefund(paid(...refunds), feeKeys);
    if ("amountCents" in expected) expect(plan).toMatchObject({ ok: true, amountCents: expected.amountCents });
    else expect(plan).toEqual({ ok: false, message: expected.message });
  });

  test("any order of line refunds and money never returns more than was paid, and a line comes back once", () => {
    const step = fc.oneof(
      fc
        .subarray(
          LINES.map((l) => l.feeKey),
          { minLength: 1 },
        )
        .map((keys) => ({ keys })),
      fc.integer({ min: 1, max: 400_00 }).map((cents) => ({ cents })),
    );
    fc.assert(
      fc.property(fc.array(step, { maxLength: 8 }), (steps) => {
        let payment = paid();
        for (const s of steps) {
          if ("keys" in s) {
            const plan = planLineRefund(payment, s.keys);
            if (plan.ok) payment = { ...payment, refunds: [...payment.refunds, { amountCents: plan.amountCents, feeKeys: s.keys }] };
          } else if (s.cents <= refundableCents(payment)) {
            payment = { ...payment, refunds: [...payment.refunds, money(s.cents)] };
          }
          const returnedTotal = payment.refunds.reduce((sum, r) => sum + r.amountCents, 0);
          expect(returnedTotal).toBeLessThanOrEqual(payment.amountCents);
          expect(refundableCents(payment)).toBe(payment.amountCents - returnedTotal);
          const named = payment.refunds.flatMap((r) => r.feeKeys);
          expect(new Set(named).size).toBe(named.length);
        }
      }),
      { numRuns: 200 },
    );
  });
});
