import { describe, expect, test } from "vitest";
import { STEP_TEXT_MAX, planGenerationSteps } from "@/lib/documents/packets/generation-steps";
import { countPages } from "@/lib/documents/packets/merge-datasheets";
import { packetSheetTitles, renderPacketPdf } from "@/lib/documents/packets/render";
import { packetFixture } from "@/tests/support/packet-fixture";

const titles = (n: number, prefix = "Sheet") => Array.from({ length: n }, (_, i) => `${prefix} ${i + 1}`);

describe("the steps of a packet generation", () => {
  test.each([
    ["permit packet with two data sheets", 8, 2],
    ["permit packet without data sheets", 7, 0],
    ["interconnection packet", 4, 0],
    ["one sheet, many data sheets", 1, 12],
  ])("%s: sheets, then data sheets, then assemble, store, verify, with progress that only grows", (_, sheets, datasheets) => {
    const steps = planGenerationSteps({ sheetTitles: titles(sheets), datasheetTitles: titles(datasheets, "Data sheet") });
    expect(steps.map((s) => s.kind)).toEqual([
      ...Array(sheets).fill("sheet"),
      ...Array(datasheets).fill("datasheet"),
      "assemble",
      "store",
      "verify",
    ]);
    expect(steps[0]!.progress).toBe(0);
    for (let i = 1; i < steps.length; i++) expect(steps[i]!.progress).toBeGreaterThanOrEqual(steps[i - 1]!.progress);
    expect(steps.at(-1)!.progress).toBeLessThan(100);
    expect(steps.at(-1)!.progress).toBeGreaterThan(50); // drawing is most of the work: it is done before the last step
  });

  test("each step says which sheet of how many, in our words", () => {
    const steps = planGenerationSteps({ sheetTitles: ["Cover sheet", "Single-line diagram"], datasheetTitles: ["NM-380B module"] });
    expect(steps.map((s) => s.text)).toEqual([
      "Drawing sheet 1 of 2: Cover sheet",
      "Drawing sheet 2 of 2: Single-line diagram",
      "Reading data sheet 1 of 1: NM-380B module",
      "Putting 2 sheets and 1 data sheet together",
      "Storing the PDF",
      "Checking the stored copy against its checksum",
    ]);
  });

  test("shares follow the measured cost: a sheet weighs five times a data sheet or a finishing step", () => {
    // 2 sheets × 5 + 1 data sheet + 3 finishing steps = 14 parts
    const steps = planGenerationSteps({ sheetTitles: ["A", "B"], datasheetTitles: ["C"] });
    expect(steps.map((s) => s.progress)).toEqual([
      0,
      Math.floor(500 / 14),
      Math.floor(1000 / 14),
      Math.floor(1100 / 14),
      Math.floor(1200 / 14),
      Math.floor(1300 / 14),
    ]);
  });

  test("a long data sheet title is cut to fit the step column", () => {
    const [step] = planGenerationSteps({ sheetTitles: [], datasheetTitles: ["x".repeat(200)] });
    expect(step!.text).toHaveLength(STEP_TEXT_MAX);
    expect(step!.text.endsWith("…")).toBe(true);
  });
});

describe("drawing a packet sheet by sheet", () => {
  test("reports each sheet before drawing it, in order, one page per sheet", async () => {
    const input = packetFixture();
    const seen: number[] = [];
    const bytes = await renderPacketPdf(input, { onSheet: (i) => void seen.push(i) });
    const planned = packetSheetTitles(input);
    expect(seen).toEqual(planned.map((_, i) => i));
    expect(await countPages(bytes)).toBe(planned.length);
  }, 60_000); // drawing a whole packet sheet by sheet takes seconds on a busy machine
});
