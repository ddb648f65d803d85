import { describe, expect, test } from "vitest";
import type { CheckResult } from "@/lib/engineering";
import type { PacketInput } from "@/lib/documents/packets/input";
import { renderPacketPdf } from "@/lib/documents/packets/render";
import { planPermitSheets } from "@/lib/documents/packets/sheet-plan";
import { paginateChecks } from "@/lib/documents/packets/calculation-layout";
import { packetFixture } from "@/tests/support/packet-fixture";
import { pageTexts } from "../read-pdf";

/** The fixture's review with its checks repeated (ids kept unique) and every third one failing with a fix. */
function withManyChecks(times: number): PacketInput {
  const input = packetFixture();
  const checks: CheckResult[] = Array.from({ length: times }, (_, k) =>
    input.review.checks.map((c, i) =>
      (i + k) % 3 === 0
        ? {
            ...c,
            id: `${c.id}#${k}`,
            status: "fail" as const,
            fix: "Use a larger conductor or a shorter run, and check the terminal ratings of both ends.",
          }
        : { ...c, id: `${c.id}#${k}` },
    ),
  ).flat();
  return { ...input, review: { ...input.review, checks } };
}

describe("calculation sheets", () => {
  test("every check lands on exactly one sheet, in the review's order", () => {
    const input = packetFixture();
    const pages = paginateChecks(input.review.checks, input.design, input.site, input.review.figures);
    expect(pages.flat()).toEqual(input.review.checks);
    expect(pages.every((p) => p.length > 0)).toBe(true);
  });

  test("a long review gets more sheets, numbered on from the cover", () => {
    const plan = planPermitSheets(withManyChecks(4));
    const calc = plan.filter((s) => s.key === "calculations");
    expect(calc.length).toBeGreaterThan(6);
    expect(calc[0]!.title).toBe(`Calculations (1 of ${calc.length})`);
    expect(plan.map((s) => s.number)).toEqual(plan.map((_, i) => i + 1));
  });

  test("the row estimate never lets a calculation sheet overflow onto an unplanned page", async () => {
    const input = withManyChecks(4);
    const plan = planPermitSheets(input);
    const pages = await pageTexts(await renderPacketPdf(input));
    expect(pages).toHaveLength(plan.length);
    plan.forEach((sheet, i) => expect(pages[i]).toContain(`Sheet ${sheet.number} of ${plan.length}`));
  }, 30_000);
});
