import { beforeAll, describe, expect, test } from "vitest";
import type { PacketInput } from "@/lib/documents/packets/input";
import { formatQuantity } from "@/lib/documents/text";
import { countPages } from "@/lib/documents/packets/merge-datasheets";
import { renderPacketPdf } from "@/lib/documents/packets/render";
import { planPermitSheets } from "@/lib/documents/packets/sheet-plan";
import { packetFixture } from "@/tests/support/packet-fixture";
import { NO_PDFTOPPM, blankPagePng, firstPagePng, hasPdftoppm, pngSize } from "../first-page-png";
import { countWord, pageSizes, pageTexts } from "../read-pdf";

type Rendered = { input: PacketInput; bytes: Uint8Array; pages: string[] };

async function render(input: PacketInput): Promise<Rendered> {
  const bytes = await renderPacketPdf(input);
  return { input, bytes, pages: await pageTexts(bytes) };
}

/** Page texts of the sheets of one kind, by the plan the packet was drawn from. */
function sheetTexts(r: Rendered, key: string): { text: string; checks: PacketInput["review"]["checks"] }[] {
  return planPermitSheets(r.input)
    .filter((s) => s.key === key)
    .map((s) => ({ text: r.pages[s.number - 1]!, checks: s.checks }));
}

function expectTitleBlockOnEveryPage(r: Rendered) {
  const total = r.pages.length;
  r.pages.forEach((text, i) => {
    expect(text, `page ${i + 1}`).toContain(`Project ${r.input.project.number} · ${r.input.project.customerName}`);
    expect(text, `page ${i + 1}`).toContain(`Sheet ${i + 1} of ${total}`);
    expect(text, `page ${i + 1}`).toContain(`Rev ${r.input.revision}`);
    expect(text, `page ${i + 1}`).toContain("Issued 2026-11-20");
    // Source marks belong in tests and code comments, never on a sheet.
    expect(text, `page ${i + 1}`).not.toMatch(/common practice|from memory|\[object Object\]|undefined|NaN/i);
    expect(text, `page ${i + 1}`).toContain(r.input.preparedBy.organizationName);
    expect(text, `page ${i + 1}`).toContain(r.input.jurisdiction.name);
    expect(text, `page ${i + 1}`).toContain("local amendments the AHJ enforces");
  });
}

/** Each check's result and limit, side by side as its row prints them, on the sheet planned for it. */
function expectCalculationsMatchReview(r: Rendered) {
  const sheets = sheetTexts(r, "calculations");
  expect(sheets.flatMap((s) => s.checks)).toEqual(r.input.review.checks);
  for (const sheet of sheets) {
    for (const c of sheet.checks) {
      expect(sheet.text, c.id).toContain(`${formatQuantity(c.value, c.unit)} ${formatQuantity(c.limit, c.unit)}`);
      expect(sheet.text, c.id).toContain(c.clause);
    }
  }
  const all = sheets.map((s) => s.text).join(" ");
  expect(countWord(all, "PASS")).toBe(r.input.review.summary.pass);
}

function expectLabelsMatchReview(r: Rendered) {
  const [labels] = sheetTexts(r, "labels");
  // Every label shows our explanation beside its words, and says whether the words are the code's own.
  expect(labels!.text.split("What it means:").length - 1).toBe(r.input.review.labels.length);
  r.input.review.labels.forEach((label, i) => {
    expect(labels!.text).toContain(`L${i + 1}. ${label.title}`);
    expect(labels!.text, label.id).toContain(
      label.prescribed ? `Wording prescribed by ${label.clause}.` : `${label.clause} asks for this content`,
    );
    for (const [key, value] of Object.entries(label.values)) {
      const unit = key.endsWith("V") ? "V" : "A";
      expect(labels!.text, `${label.id}.${key}`).toContain(formatQuantity(value, unit));
    }
  });
}

describe("permit packet, string inverter with shutdown devices, Rev 1", () => {
  let r: Rendered;
  beforeAll(async () => {
    r = await render(packetFixture());
  }, 30_000);

  test("one 11 × 17 landscape page per planned sheet", async () => {
    const plan = planPermitSheets(r.input);
    expect(plan.map((s) => s.key)).toEqual([
      "cover",
      "system-summary",
      "single-line",
      "calculations",
      "calculations",
      "calculations",
      "labels",
      "structural",
    ]);
    expect(r.pages).toHaveLength(plan.length);
    expect(await countPages(r.bytes)).toBe(plan.length);
    for (const size of await pageSizes(r.bytes)) expect(size).toEqual({ width: 1224, height: 792 });
  });

  test("every page carries the title block", () => expectTitleBlockOnEveryPage(r));

  test.skipIf(!hasPdftoppm)(`the cover renders to a PNG that is far from blank${hasPdftoppm ? "" : ` (${NO_PDFTOPPM})`}`, async () => {
    const png = firstPagePng(r.bytes);
    // 17 × 11 in at 40 dpi.
    expect(pngSize(png)).toEqual({ width: 680, height: 440 });
    expect(png.length).toBeGreaterThan(10 * (await blankPagePng(1224, 792)).length);
  });

  test("the cover states the scope of work, indexes every sheet and marks the first issue", () => {
    const cover = r.pages[0]!;
    expect(cover).toContain("Install an 8.91 kW DC / 7.6 kW AC grid-tied PV system at 120 Larkin Mill Rd");
    expect(cover).toContain("22 Larkspur LK-405M-54H modules (405 W each)");
    for (const s of planPermitSheets(r.input)) expect(cover).toContain(`${s.number} ${s.title}`);
    expect(cover).toContain("First issue.");
    expect(cover).not.toContain("GENERATED WITH FAILING CHECKS");
  });

  test("the calculation sheets print every check's result and limit as the review computed them", () => {
    expectCalculationsMatchReview(r);
    const calc = sheetTexts(r, "calculations")
      .map((s) => s.text)
      .join(" ");
    // 11 × 37.2 V × (1 + (−24 − 25) × −0.27 / 100) = 463.34 V, against the 600 V dwelling limit.
    expect(r.input.review.summary.maxDcVoltageV).toBe(463.34);
    expect(calc).toContain("463.34 V 600 V");
    // 1.25 × 32 A = 40 A minimum PV breaker; the 40 A breaker is at that limit.
    expect(calc).toContain("40 A 40 A");
    // 120 % rule: 1.25 × 32 A + 200 A main = 240 A, within 1.2 × 200 A.
    expect(calc).toContain("240 A 240 A");
    expect(calc).toContain("N × Voc × [1 + (Tmin − 25) × αVoc / 100]");
  });

  test("the summary sheet shows the ratings and the largest PV breaker the busbar allows", () => {
    const [summary] = sheetTexts(r, "system-summary");
    expect(summary!.text).toContain("DC rating (STC) 8.91 kW");
    expect(summary!.text).toContain("Largest PV breaker the busbar allows 40 A");
    expect(summary!.text).toContain("UL 1741 SB; IEEE 1547-2018 Category B");
    expect(summary!.text).toContain("SR-1 Shutdown Unit");
    // A reader's tools must find the unit: "240 V, single phase", never "240 , single phase".
    expect(summary!.text).toContain("Service 240 V, single phase, 200 A busbar, 200 A main");
    expect(summary!.text).toContain("Point of connection Load side, 40 A PV breaker");
  });

  test("the single-line sheet carries the drawn diagram", () => {
    const [sld] = sheetTexts(r, "single-line");
    expect(sld!.text).toContain("SINGLE-LINE DIAGRAM");
    expect(sld!.text).toContain("QS-7600");
  });

  test("the conductor schedule numbers every run as the diagram tags it", () => {
    const [summary] = sheetTexts(r, "system-summary");
    const [sld] = sheetTexts(r, "single-line");
    r.input.designInput.runs.forEach((run, i) => {
      expect(summary!.text).toContain(`${i + 1} ${run.label}`);
      // On the drawing the tag's number comes before the run's title.
      expect(sld!.text).toMatch(new RegExp(`${i + 1}\\s+${run.label}, \\d+ ft`));
    });
  });

  test("the label sheet prints each label's computed values", () => {
    expectLabelsMatchReview(r);
    const [labels] = sheetTexts(r, "labels");
    expect(labels!.text).toContain("Highest DC voltage 463.34 V");
    expect(labels!.text).toContain("Rated AC output current 32 A Nominal AC voltage 240 V PV breaker 40 A");
  });

  test("the structural sheet lists each plane with its loads, a line for spacing and the caution", () => {
    const [structural] = sheetTexts(r, "structural");
    expect(structural!.text).toContain("South roof 22 23° 185°");
    expect(structural!.text).toContain("2.55 lb/ft²");
    expect(structural!.text).toContain("42.09 lb");
    expect(structural!.text).toContain("Attachment spacing, entered by the installer");
    expect(structural!.text).toContain("STRUCTURAL ADEQUACY IS NOT ASSESSED HERE");
  });
});

describe("permit packet, optimizer strings, Rev 2 with an override", () => {
  let r: Rendered;
  beforeAll(async () => {
    const input = packetFixture({ variant: 1, revision: 2 });
    // Make one check fail, as a review that needed the coordinator's override would.
    input.review = {
      ...input.review,
      checks: input.review.checks.map((c) =>
        c.id === "point-of-connection" ? { ...c, status: "fail" as const, fix: "Move the PV breaker to the far end of the bus." } : c,
      ),
      summary: { ...input.review.summary, pass: input.review.summary.pass - 1, fail: 1, status: "fail" },
    };
    input.override = { reason: "The AHJ accepted the panel maker's busbar letter for this panel.", byName: "Dana Okafor" };
    r = await render(input);
  }, 30_000);

  test("the page count follows the plan and every page says Rev 2", async () => {
    expect(r.pages).toHaveLength(planPermitSheets(r.input).length);
    expectTitleBlockOnEveryPage(r);
  });

  test("the cover prints the override reason in its notice", () => {
    const cover = r.pages[0]!;
    expect(cover).toContain("GENERATED WITH FAILING CHECKS");
    expect(cover).toContain("The design review had 1 failing check when this packet was generated. Dana Okafor chose to issue it anyway");
    expect(cover).toContain("“The AHJ accepted the panel maker's busbar letter for this panel.”");
  });

  test("the cover lists what changed since Rev 1, with arrows spelled out for the PDF fonts", () => {
    const cover = r.pages[0]!;
    expect(cover).toContain("Changes since Rev 1:");
    expect(cover).toContain("1. PV breaker: 35 A to 40 A");
    expect(cover).toContain("2. Run “Inverter to service panel”: 8 AWG to 6 AWG");
  });

  test("calculations and labels still equal the review, the failing check with its fix", () => {
    expectCalculationsMatchReview(r);
    expectLabelsMatchReview(r);
    const calc = sheetTexts(r, "calculations")
      .map((s) => s.text)
      .join(" ");
    expect(countWord(calc, "FAIL")).toBe(1);
    expect(calc).toContain("Suggested: Move the PV breaker to the far end of the bus.");
    expect(calc).toContain("String S1 is held by its optimizers at 380 V");
  });
});

describe("permit packet, microinverters", () => {
  test("sheets follow the plan; calculations and labels equal the review; no DC voltage label", async () => {
    const r = await render(packetFixture({ busbarA: 150, mainBreakerA: 150 }));
    expect(r.pages).toHaveLength(planPermitSheets(r.input).length);
    expectTitleBlockOnEveryPage(r);
    expectCalculationsMatchReview(r);
    expectLabelsMatchReview(r);
    expect(r.input.review.labels.map((l) => l.id)).not.toContain("dc-max-voltage");
    // Two branch circuits of 8 units each: one model, counted once.
    expect(r.pages[0]).toContain("feeding 16 × Pellinore PM-320 Micro microinverters.");
    expect(r.pages[0]).toContain("Rapid shutdown (NEC 690.12) by the microinverters");
  }, 30_000);
});
