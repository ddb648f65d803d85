import { beforeAll, describe, expect, test } from "vitest";
import type { ReceiptInput } from "@/lib/documents/receipt/input";
import { renderReceiptPdf } from "@/lib/documents/receipt/render";
import { methodText, refundReason } from "@/lib/documents/receipt/facts";
import { RECEIPT_LINES, receiptFixture } from "@/tests/support/receipt-fixture";
import { NO_PDFTOPPM, blankPagePng, firstPagePng, hasPdftoppm, pngSize } from "../first-page-png";
import { pageSizes, pageTexts } from "../read-pdf";

const LETTER = { width: 612, height: 792 };

async function render(input: ReceiptInput) {
  const bytes = await renderReceiptPdf(input);
  return { bytes, pages: await pageTexts(bytes) };
}

describe("payment receipt", () => {
  let paid: { bytes: Uint8Array; pages: string[] };
  let partial: { bytes: Uint8Array; pages: string[] };
  let full: { bytes: Uint8Array; pages: string[] };
  beforeAll(async () => {
    paid = await render(receiptFixture());
    partial = await render(receiptFixture({ refunds: "partial" }));
    full = await render(receiptFixture({ refunds: "full" }));
  }, 30_000);

  test("one letter page with the receipt and project in its footer", async () => {
    for (const r of [paid, partial, full]) expect(await pageSizes(r.bytes)).toEqual([LETTER]);
    expect(paid.pages[0]).toContain("Receipt R-2026-1042-3F9A2C · Project 1042 · Quillmoor Solar Electric Page 1 of 1");
  });

  test("names the receipt, date, organization, project and payer", () => {
    const text = paid.pages[0]!;
    expect(text).toContain("Payment receipt Receipt R-2026-1042-3F9A2C · December 3, 2026");
    expect(text).toContain("RECEIPT NUMBER R-2026-1042-3F9A2C DATE PAID December 3, 2026");
    expect(text).toContain("Quillmoor Solar Electric (555) 014-2210");
    expect(text).toContain("PAID BY Dana Okafor dana@quillmoor.example");
    expect(text).toContain("PROJECT 1042 Imogen Halvorsen, 120 Larkin Mill Rd, Brackenford, CO 80913");
  });

  test("each fee with its authority, working and amount, then the total", () => {
    const text = paid.pages[0]!;
    expect(text).toContain(
      "Residential PV building permit City of Brackenford Building Division 8.91 kW DC × $18.00/kW = $160.38 below the $175.00 minimum, so $175.00 $175.00",
    );
    expect(text).toContain(
      "Electrical plan review City of Brackenford Building Division 8.91 kW DC is in the bracket over 5 kW up to 10 kW, so $95.00 $95.00",
    );
    expect(text).toContain(
      "Interconnection application, inverter-based up to 25 kW Brackenford Municipal Light & Power flat fee = $100.00 $100.00",
    );
    expect(text).toContain("Total paid $370.00");
    expect(text).toContain("AMOUNT PAID $370.00 Paid");
  });

  test("the payment method and the processor's reference", () => {
    const text = paid.pages[0]!;
    expect(text).toContain("METHOD Corvel •••• 4417");
    expect(text).toContain("PAID AT December 3, 2026, 11:05 MST");
    expect(text).toContain("PROCESSOR REFERENCE pay_0000demo7Q2k9LmX4v");
  });

  test("no refunds: no refund section and no net line", () => {
    expect(paid.pages[0]).not.toContain("Refunds DATE REASON AMOUNT");
    expect(paid.pages[0]).not.toContain("Refunded");
    expect(paid.pages[0]).not.toContain("Net amount paid");
  });

  test("a partial refund shows the refund and the net amount", () => {
    const text = partial.pages[0]!;
    expect(text).toContain("AMOUNT PAID $370.00 Partly refunded Refunded −$95.00 Net amount paid $275.00");
    expect(text).toContain("Refunds DATE REASON AMOUNT December 9, 2026 Plan review waived by the building division −$95.00");
    expect(text).toContain("Total paid $370.00 Refunded −$95.00 Net amount paid $275.00");
  });

  test("refunds adding up to the total leave nothing paid", () => {
    const text = full.pages[0]!;
    expect(text).toContain("Refunded in full");
    expect(text).toContain("December 9, 2026 Requested by customer −$95.00 December 10, 2026 No reason given −$275.00");
    expect(text).toContain("Total paid $370.00 Refunded −$370.00 Net amount paid $0.00");
  });

  test("amounts are en-US dollars from integer cents", async () => {
    const lines = [
      {
        name: "Commercial PV building permit",
        authority: "Township of Orrin Vale",
        arithmetic: ["flat fee = $1,234.56"],
        amountCents: 123456,
      },
    ];
    const text = (await render(receiptFixture({ lines }))).pages[0]!;
    expect(text).toContain("flat fee = $1,234.56 $1,234.56");
    expect(text).toContain("Total paid $1,234.56");
  });

  test("a payer, phone or card the records lack prints as such", async () => {
    const input = {
      ...receiptFixture(),
      organization: { name: "Quillmoor Solar Electric", phone: null, timeZone: "America/Denver" },
      paidBy: { name: "", email: "" },
      method: { brand: null, last4: null },
    };
    const text = (await render(input)).pages[0]!;
    expect(text).toContain("ORGANIZATION Quillmoor Solar Electric PAID BY Not recorded PROJECT 1042");
    expect(text).toContain("METHOD Card (details not reported by the processor)");
  });

  test("a long list of fees continues onto numbered pages without splitting a fee", async () => {
    const lines = Array.from({ length: 24 }, (_, i) => ({ ...RECEIPT_LINES[i % 3]!, name: `${RECEIPT_LINES[i % 3]!.name} (${i + 1})` }));
    const { bytes, pages } = await render(receiptFixture({ lines, refunds: "partial" }));
    expect(pages.length).toBeGreaterThan(1);
    expect((await pageSizes(bytes)).every((p) => p.width === LETTER.width && p.height === LETTER.height)).toBe(true);
    pages.forEach((text, i) =>
      expect(text).toContain(`Receipt R-2026-1042-3F9A2C · Project 1042 · Quillmoor Solar Electric Page ${i + 1} of ${pages.length}`),
    );
    for (const line of lines) {
      const holding = pages.filter((p) => p.includes(`${line.name} ${line.authority}`));
      expect(holding, line.name).toHaveLength(1);
      expect(holding[0]).toContain(`${line.name} ${line.authority} ${line.arithmetic.map((a) => a.replace(" → ", ", so ")).join(" ")}`);
    }
    const all = pages.join(" ");
    expect(all).toContain("Total paid $2,960.00");
    // The refunds and the sums under them stay together.
    expect(
      pages.filter((p) =>
        p.includes(
          "Refunds DATE REASON AMOUNT December 9, 2026 Plan review waived by the building division −$95.00 Total paid $2,960.00 Refunded −$95.00 Net amount paid $2,865.00",
        ),
      ),
    ).toHaveLength(1);
  }, 30_000);

  test.skipIf(!hasPdftoppm)(`page 1 renders to a PNG far from blank${hasPdftoppm ? "" : ` (${NO_PDFTOPPM})`}`, async () => {
    const png = firstPagePng(partial.bytes);
    expect(pngSize(png)).toEqual({ width: 340, height: 440 });
    expect(png.length).toBeGreaterThan(10 * (await blankPagePng(612, 792)).length);
  });
});

describe("receipt wording", () => {
  test("the payment method as far as the processor reported it", () => {
    expect(methodText({ brand: "corvel", last4: "4417" })).toBe("Corvel •••• 4417");
    expect(methodText({ brand: null, last4: "0091" })).toBe("Card •••• 0091");
    expect(methodText({ brand: "corvel", last4: null })).toBe("Corvel card");
    expect(methodText({ brand: null, last4: null })).toBe("Card (details not reported by the processor)");
  });

  test("refund reasons read as words", () => {
    expect(refundReason("requested_by_customer")).toBe("Requested by customer");
    expect(refundReason("Duplicate charge for the plan review")).toBe("Duplicate charge for the plan review");
    expect(refundReason(null)).toBe("No reason given");
    expect(refundReason("  ")).toBe("No reason given");
  });
});
