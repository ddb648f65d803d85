import { describe, expect, test } from "vitest";
import { RefundInput } from "@/lib/schemas/payment";

const PAYMENT = "5b0f7c52-1f0e-4c8e-9f6e-0d1f2a3b4c5d";

describe("a refund request names whole fees or an amount, exactly one", () => {
  test.each<[string, Record<string, unknown>, Record<string, unknown> | string]>([
    ["fees by key", { feeKeys: ["utility:u1:interconnection application"] }, { feeKeys: ["utility:u1:interconnection application"] }],
    ["an amount in dollars, as typed", { amount: "125.00" }, { amount: 125_00 }],
    ["an amount with grouping", { amount: "$1,250.5" }, { amount: 1_250_50 }],
    ["a blank amount beside fees", { feeKeys: ["k"], amount: "" }, { feeKeys: ["k"], amount: null }],
    ["both", { feeKeys: ["k"], amount: "5" }, "Choose the fees to refund, or enter an amount, not both"],
    ["neither", {}, "Choose the fees to refund, or enter an amount, not both"],
    ["an empty list and a blank amount", { feeKeys: [], amount: " " }, "Choose the fees to refund, or enter an amount, not both"],
    ["a third decimal", { amount: "1.005" }, "Enter the refund amount in dollars, e.g. 25,000 or 1250.50"],
  ])("%s", (_, fields, expected) => {
    const parsed = RefundInput.safeParse({ paymentId: PAYMENT, reason: "Fee waived by the AHJ", ...fields });
    if (typeof expected === "string") {
      expect(parsed.success).toBe(false);
      expect(parsed.error!.issues.map((i) => i.message)).toContain(expected);
    } else {
      expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
      expect(parsed.data).toMatchObject(expected);
    }
  });
});
