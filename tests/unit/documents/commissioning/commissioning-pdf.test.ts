import { beforeAll, describe, expect, test } from "vitest";
import { checkCommissioning, commissioningComplete } from "@/lib/engineering/commissioning";
import type { CommissioningDocumentInput } from "@/lib/documents/commissioning/input";
import { renderCommissioningPdf } from "@/lib/documents/commissioning/render";
import { completionSummary } from "@/lib/documents/commissioning/facts";
import { commissioningFixture, commissioningRecord } from "@/tests/support/commissioning-fixture";
import { NO_PDFTOPPM, blankPagePng, firstPagePng, hasPdftoppm, pngSize } from "../first-page-png";
import { countWord, pageSizes, pageTexts } from "../read-pdf";

const LETTER = { width: 612, height: 792 };
const TABLE_HEAD = "# WHAT WAS CHECKED, AND THE FINDING READING EXPECTED RESULT BASIS";

async function render(input: CommissioningDocumentInput) {
  const bytes = await renderCommissioningPdf(input);
  return { bytes, pages: await pageTexts(bytes) };
}

function expectCautions(text: string) {
  expect(text).toContain("PV circuits are energized whenever light reaches the modules");
  expect(text).toContain(
    "Inverter capacitors hold a charge after shutdown. Keep clear of the inverter's terminals until the inverter reports a safe DC voltage",
  );
  expect(text).toContain("the NEC edition and local amendments the AHJ enforces, and licensed practice");
  expect(text).toContain("permission to operate (PTO)");
}

describe("commissioning report", () => {
  let open: { bytes: Uint8Array; pages: string[] };
  let complete: { bytes: Uint8Array; pages: string[] };
  beforeAll(async () => {
    open = await render(commissioningFixture({ kind: "report" }));
    complete = await render(commissioningFixture({ kind: "report", scenario: "complete" }));
  }, 30_000);

  test("letter portrait, numbered page by page in a footer with the project", async () => {
    expect(open.pages.length).toBeGreaterThanOrEqual(2);
    expect(await pageSizes(open.bytes)).toEqual(open.pages.map(() => LETTER));
    open.pages.forEach((text, i) => {
      expect(text).toContain(`Page ${i + 1} of ${open.pages.length}`);
      expect(text).toContain("Project 1042 · Imogen Halvorsen");
      // Printed at 8:05 pm in Denver: the organization's day, not the UTC one.
      expect(text).toContain("Printed 2026-12-03");
      expect(text).not.toContain("2026-12-04");
      expect(text).toContain("Commissioning report Readings and results");
      expect(text).toContain(
        "Caution: PV conductors are energized whenever light reaches the modules, and inverter capacitors hold a charge after shutdown.",
      );
    });
  });

  test("the header gives the project and the system", () => {
    const first = open.pages[0]!;
    expect(first).toContain("Commissioning report Grid-tied PV system · Project 1042");
    expect(first).toContain("120 Larkin Mill Rd, Brackenford, CO 80913");
    expect(first).toContain("City of Brackenford Building Division");
    expect(first).toContain("Brackenford Municipal Light & Power");
    expect(first).toContain("BL-4410000 · meter M72000000");
    expect(first).toContain("DC RATING (STC) 8.91 kW AC RATING 7.6 kW SERVICE 240 V nominal");
    expect(first).toContain("22 × Larkspur LK-405M-54H (405 W)");
    expect(first).toContain("1 × Quillon QS-7600 (7,600 W AC)");
    expect(first).toContain("22 × Stavemoor SR-1 Shutdown Unit");
    expect(first).toContain("NEC 2023 as adopted");
  });

  test("the completion status names the failing and missing readings, with the times", () => {
    const first = open.pages[0]!;
    expect(first).toContain("Open: 2 failing and 3 not recorded yet. 1 reading to review.");
    expect(first).toContain("Failing: Inverter serial against its activation card; String B voltage with the array shut down.");
    expect(first).toContain("Not recorded yet: Inverter activated; First power reading; Rapid shutdown test: time to reach it.");
    expect(first).toContain("To review: AC voltage at the point of connection.");
    expect(first).toContain("LAST RECORDED 2026-12-02 13:14 MST MARKED COMPLETE Not yet");
    expect(first).toContain("Dana Okafor (dana@quillmoor.example)");

    const done = complete.pages.join(" ");
    expect(done).toContain("Complete: all 15 readings recorded, none failing.");
    expect(done).toContain("MARKED COMPLETE 2026-12-02 13:20 MST");
    expect(done).not.toContain("Not recorded");
  });

  test("every reading is in the table, in the order of the work, with its value, expected range, result and basis", () => {
    const all = open.pages.join(" ");
    const input = commissioningFixture({ kind: "report" });
    for (const r of input.results) expect(all).toContain(r.title);
    // Before energizing: polarity, Voc at the module temperature (11 × 37.2 × (1 + 20 × −0.0027) = 387.1 V ± 5 %), insulation.
    expect(all).toContain("1 String A polarity Correct + to +, − to − PASS inverter input marking");
    expect(all).toContain(
      "2 String A open-circuit voltage 386.5 V at 45 °C (module) 367.7–406.5 V for 11 modules PASS module data sheet Voc, corrected as in NEC 2023 690.7(A)(1)",
    );
    expect(all).toContain(
      "3 String A insulation resistance 220 MΩ At least 1 MΩ at a 500 V test PASS IEC 62446-1 insulation resistance test",
    );
    // At the inverter: the card names another serial.
    expect(all).toContain("Unit QN0730411; card QN0730412 The same serial on the unit and its card FAIL inverter maker's activation card");
    expect(all).toContain("Not yet Done REVIEW");
    expect(all).toContain(
      "IEEE 1547-2018 category B, utility default settings IEEE 1547-2018 Category B, utility default settings or IEEE 1547-2018 Category B, volt-watt on PASS utility interconnection requirement",
    );
    // 11 devices × 1 V ± 1.1 V (common practice), NEC 690.12(B)(1) 30 V.
    expect(all).toContain("11.2 V 9.9–12.1 V for 11 devices; 30 V at most PASS NEC 2023 690.12(B)(1); 11 devices × 1 V");
    expect(all).toContain("38.6 V 9.9–12.1 V for 11 devices; 30 V at most FAIL NEC 2023 690.12(B)(1)");
    expect(all).toContain("253.1 V 228–252 V on 240 V; 220–254 V at times REVIEW ANSI C84.1 Range A and Range B");
    expect(all).toContain("Not recorded Above 0, up to 7,980 W REVIEW the system's AC rating");
    expect(all).toContain("0.8 V 30 V at most PASS NEC 2023 690.12(B)(1)");
    expect(all).toContain("Not recorded 30 s at most REVIEW NEC 2023 690.12(B)(1)");
    // No module-level monitoring: no modules-reporting row at all.
    expect(all).not.toContain("Modules reporting");
    // Results are printed as words (with a drawn mark), not by colour alone.
    expect(countWord(all, "PASS")).toBe(9);
    expect(countWord(all, "REVIEW")).toBe(4);
    expect(countWord(all, "FAIL")).toBe(2);
    expect(all).not.toMatch(/common practice|from memory/i);

    const done = complete.pages.join(" ");
    expect(done).toContain("243.6 V 228–252 V on 240 V");
    expect(done).toContain("W at 12:40"); // "5,168 W": the text layer of the mono digits is not reliable
    expect(done).toContain("Unit QN0730411; card QN0730411");
    expect(done).toContain("14 s 30 s at most PASS");
    expect(countWord(done, "PASS")).toBe(15);
  });

  test("with module-level monitoring: devices found and modules reporting, a shortfall waiting", async () => {
    const { pages } = await render(commissioningFixture({ kind: "report", monitoring: true }));
    const all = pages.join(" ");
    expect(all).toContain("Open: 3 failing, 3 not recorded yet and 1 waiting.");
    expect(all).toContain("Waiting: Module-level optimizers found.");
    expect(all).toContain("20 of 22 All 22 installed REVIEW the design's device count");
    expect(all).toContain("21 of 22 All 22 installed FAIL the design's module count");
  });

  test("anything not passing carries its finding and what to do; passing rows stay short", () => {
    const all = open.pages.join(" ");
    expect(all).toContain("String B read 38.6 V with the array shut down: above the 30 V allowed on wiring that leaves the array.");
    expect(all).toContain("To do: Do not touch the string's conductors.");
    expect(all).toContain(
      "The activation card names serial QN0730412, but this unit's label says QN0730411: the card belongs to another unit.",
    );
    expect(all).toContain("To do: Do not activate with this card.");
    expect(all).toContain("To do: Measure again under load");
    expect(all).not.toContain("String A read 11.2 V");
  });

  test("prints the cautions in full", () => {
    expectCautions(open.pages.join(" "));
  });

  test("twelve strings continue onto further pages with the table head repeated and no row cut", async () => {
    const input = commissioningFixture({ kind: "report", strings: 12 });
    const { bytes, pages } = await render(input);
    expect(pages.length).toBeGreaterThanOrEqual(2);
    expect((await pageSizes(bytes)).every((p) => p.width === LETTER.width && p.height === LETTER.height)).toBe(true);
    pages.forEach((text, i) => {
      expect(text).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(text).toContain("Project 1042");
      // Every page holds readings, and each opens its share of the table with the column heads.
      expect(text).toContain(TABLE_HEAD);
    });
    const ids = "ABCDEFGHIJKL".split("");
    for (const [i, id] of ids.entries()) {
      // Rows are numbered after three string tests per string, the inverter's two rows and the grid profile; the completion panel may name a string too.
      const title = `${ids.length * 3 + 3 + i + 1} String ${id} voltage with the array shut down`;
      const holding = pages.filter((p) => p.includes(title));
      expect(holding, title).toHaveLength(1);
      // The whole row (title, reading, expected, result, basis) sits on one page.
      const reading = input.record.strings[i]!.measuredV!;
      expect(holding[0]).toMatch(
        new RegExp(
          `${title}.*?${String(reading).replace(".", "\\.")} V 7–9 V for 8 devices; 30 V at most (PASS|FAIL) NEC 2023 690\\.12\\(B\\)\\(1\\)`,
        ),
      );
    }
    expect(pages.slice(1).every((p) => p.startsWith(TABLE_HEAD))).toBe(true);
  }, 30_000);

  test.skipIf(!hasPdftoppm)(`page 1 renders to a PNG far from blank${hasPdftoppm ? "" : ` (${NO_PDFTOPPM})`}`, async () => {
    const png = firstPagePng(open.bytes);
    expect(pngSize(png)).toEqual({ width: 340, height: 440 });
    expect(png.length).toBeGreaterThan(10 * (await blankPagePng(612, 792)).length);
  });
});

describe("certificate of completion", () => {
  let open: { bytes: Uint8Array; pages: string[] };
  let complete: { bytes: Uint8Array; pages: string[] };
  beforeAll(async () => {
    open = await render(commissioningFixture({ kind: "certificate" }));
    complete = await render(commissioningFixture({ kind: "certificate", scenario: "complete" }));
  }, 30_000);

  test("one letter page, numbered, with the project in the footer", async () => {
    expect(await pageSizes(open.bytes)).toEqual([LETTER]);
    expect(await pageSizes(complete.bytes)).toEqual([LETTER]);
    expect(open.pages[0]).toContain("Page 1 of 1");
    expect(open.pages[0]).toContain("Certificate of completion For signature and upload");
  });

  test("pre-filled with the project, site, system, jurisdiction and utility", () => {
    const text = complete.pages[0]!;
    expect(text).toContain("Project 1042 · Imogen Halvorsen");
    expect(text).toContain("SITE ADDRESS 120 Larkin Mill Rd, Brackenford, CO 80913");
    expect(text).toContain("City of Brackenford Building Division");
    expect(text).toContain("Brackenford Municipal Light & Power");
    expect(text).toContain("8.91 kW DC (STC) · 7.6 kW AC");
    expect(text).toContain("22 × Larkspur LK-405M-54H (405 W)");
    expect(text).toContain("1 × Quillon QS-7600 (7,600 W AC)");
    expect(text).toContain("RAPID SHUTDOWN EQUIPMENT 22 × Stavemoor SR-1 Shutdown Unit");
  });

  test("the installer's statement names the approved design, the NEC edition the AHJ enforces and the manufacturers' instructions", () => {
    const text = complete.pages[0]!;
    expect(text).toContain(
      "I state that the grid-tied PV system described above was installed and commissioned according to the approved design, the NEC 2023 with the local amendments enforced by City of Brackenford Building Division, and the manufacturers' installation instructions;",
    );
    expect(text).toContain("until Brackenford Municipal Light & Power grants permission to operate");
  });

  test("sums up the commissioning result", () => {
    expect(complete.pages[0]).toContain("COMPLETE Complete: all 15 readings recorded, none failing.");
    expect(complete.pages[0]).toContain("Marked complete 2026-12-02 13:20 MST");
    expect(complete.pages[0]).not.toContain("Do not sign");
    const text = open.pages[0]!;
    expect(text).toContain("OPEN Open: 2 failing and 3 not recorded yet.");
    expect(text).toContain("Failing: Inverter serial against its activation card; String B voltage with the array shut down.");
    expect(text).toContain("Not recorded yet: Inverter activated; First power reading; Rapid shutdown test: time to reach it.");
    expect(text).toContain("Do not sign until every reading is recorded and none fails");
  });

  test("names the key readings: the serial and its card, the grid profile, the string tests, modules reporting", () => {
    const text = complete.pages[0]!;
    expect(text).toContain("Inverter serial: QN0730411, card matches, activated");
    expect(text).toContain("Grid profile: IEEE 1547-2018 category B, utility default settings");
    expect(text).toContain("String tests: 2 strings: 6 of 6 results pass");
    expect(text).toContain("Modules reporting: No module-level monitoring");
    expect(open.pages[0]).toContain("QN0730411, card not checked");
  });

  test("blank lines for the installer and the customer's acknowledgement", () => {
    const text = complete.pages[0]!;
    expect(text).toContain(
      "Installer For Quillmoor Solar Electric, contractor license EC-40718 (demo) PRINTED NAME LICENSE NO. SIGNATURE DATE",
    );
    expect(text).toContain("Customer's acknowledgement");
    expect(text).toMatch(/grants permission to operate\. PRINTED NAME SIGNATURE DATE/);
    expect(text.match(/SIGNATURE DATE/g)).toHaveLength(2);
  });

  test("prints the cautions", () => {
    expectCautions(open.pages[0]!);
  });

  test.skipIf(!hasPdftoppm)(`renders to a PNG far from blank${hasPdftoppm ? "" : ` (${NO_PDFTOPPM})`}`, async () => {
    const png = firstPagePng(open.bytes);
    expect(pngSize(png)).toEqual({ width: 340, height: 440 });
    expect(png.length).toBeGreaterThan(10 * (await blankPagePng(612, 792)).length);
  });
});

describe("commissioning summary", () => {
  test("a reading both failing and not recorded counts once, as failing", () => {
    // No accepted profile on file and none read from the inverter: the result fails while its reading is missing.
    const record = { ...commissioningRecord({ scenario: "complete" }), acceptedGridProfiles: [], gridProfileSet: null };
    const results = checkCommissioning(record);
    const completion = { complete: false, failing: ["grid-profile"], missing: ["grid-profile"], waiting: [] };
    const summary = completionSummary({ ...commissioningFixture({ scenario: "complete" }), record, results, completion });
    expect(summary).toMatchObject({
      complete: false,
      status: "fail",
      word: "Open",
      failing: ["Grid profile on the inverter"],
      notRecorded: [],
    });
    expect(summary.sentence).toBe("Open: 1 failing.");
  });

  test("a required reading with no result at all is named by its kind", () => {
    const input = commissioningFixture({ scenario: "complete" });
    const results = input.results.filter((r) => r.kind !== "first-power");
    const summary = completionSummary({ ...input, results, completion: commissioningComplete(results) });
    expect(summary.notRecorded).toEqual(["First power reading"]);
  });

  test("only missing readings leave the record open for review, not failing", () => {
    const summary = completionSummary(commissioningFixture({ scenario: "complete", strings: 2 }));
    expect(summary.status).toBe("pass");
    const record = { ...commissioningRecord({ scenario: "complete" }), firstPowerW: null, firstPowerTime: null };
    const results = checkCommissioning(record);
    const open = completionSummary({
      ...commissioningFixture({ scenario: "complete" }),
      record,
      results,
      completion: commissioningComplete(results),
    });
    expect(open).toMatchObject({ status: "warn", word: "Open", notRecorded: ["First power reading"] });
    expect(open.sentence).toBe("Open: 1 not recorded yet.");
  });

  test("typed text the fonts cannot draw is spelled out", async () => {
    const input = commissioningFixture({ kind: "report", scenario: "complete" });
    input.system.shutdownSummary = "22 × Stavemoor SR-1 (≤ 1 V shut down)";
    const text = (await pageTexts(await renderCommissioningPdf(input))).join(" ");
    expect(text).toContain("22 × Stavemoor SR-1 (<= 1 V shut down)");
  });

  test("facts left empty print as such, on both documents", async () => {
    const sparse = (kind: "report" | "certificate"): CommissioningDocumentInput => {
      const input = commissioningFixture({ kind, scenario: "open" });
      return {
        ...input,
        organization: { name: "Quillmoor Solar Electric", licenseNumber: null, phone: null, timeZone: "America/Denver" },
        project: { ...input.project, jurisdictionName: null, utilityName: null, utilityAccountNumber: null, meterNumber: null },
        system: { ...input.system, shutdownSummary: null },
        installer: null,
        recordUpdatedAt: null,
      };
    };
    const report = (await render(sparse("report"))).pages.join(" ");
    expect(report).toContain("AUTHORIT Y HAVING JURISDICTION Not set UTILIT Y Not set UTILIT Y ACCOUNT AND METER Not entered");
    expect(report).toContain("RAPID SHUTDOWN EQUIPMENT None listed separately");
    expect(report).toContain("READINGS BY Not assigned LAST RECORDED Nothing recorded yet");
    const certificate = await render(sparse("certificate"));
    expect(certificate.pages).toHaveLength(1);
    expect(certificate.pages[0]).toContain("Installer For Quillmoor Solar Electric PRINTED NAME");
    expect(certificate.pages[0]).toContain("local amendments enforced by the authority having jurisdiction");
    expect(certificate.pages[0]).toContain("until the utility grants permission to operate");
  }, 30_000);
});
