import { beforeAll, describe, expect, test } from "vitest";
import type { PacketInput } from "@/lib/documents/packets/input";
import { renderPacketPdf } from "@/lib/documents/packets/render";
import { planInterconnectionSheets } from "@/lib/documents/packets/sheet-plan";
import { packetFixture } from "@/tests/support/packet-fixture";
import { NO_PDFTOPPM, blankPagePng, firstPagePng, hasPdftoppm, pngSize } from "../first-page-png";
import { pageSizes, pageTexts } from "../read-pdf";

describe("interconnection packet", () => {
  let input: PacketInput;
  let bytes: Uint8Array;
  let pages: string[];
  beforeAll(async () => {
    input = packetFixture({ kind: "interconnection" });
    bytes = await renderPacketPdf(input);
    pages = await pageTexts(bytes);
  }, 30_000);

  test("letter forms around an 11 × 17 single-line sheet", async () => {
    expect(planInterconnectionSheets().map((s) => s.key)).toEqual(["application", "facility", "single-line", "signatures"]);
    expect(await pageSizes(bytes)).toEqual([
      { width: 612, height: 792 },
      { width: 612, height: 792 },
      { width: 1224, height: 792 },
      { width: 612, height: 792 },
    ]);
  });

  test.skipIf(!hasPdftoppm)(
    `the application page renders to a PNG that is far from blank${hasPdftoppm ? "" : ` (${NO_PDFTOPPM})`}`,
    async () => {
      const png = firstPagePng(bytes);
      // 8.5 × 11 in at 40 dpi.
      expect(pngSize(png)).toEqual({ width: 340, height: 440 });
      expect(png.length).toBeGreaterThan(10 * (await blankPagePng(612, 792)).length);
    },
  );

  test("every page carries the title block", () => {
    pages.forEach((text, i) => {
      expect(text).toContain("Project 1042 · Imogen Halvorsen");
      expect(text).toContain(`Sheet ${i + 1} of 4`);
      expect(text).toContain("Rev 1");
      expect(text).toContain("Interconnection packet");
    });
  });

  test("the application names the customer, the utility account and meter, and the installer", () => {
    const [application] = pages;
    expect(application).toContain("Imogen Halvorsen");
    expect(application).toContain("120 Larkin Mill Rd, Brackenford, CO 80913");
    // Caps labels come back with stray spaces ("UTILIT Y") where letter spacing meets kerning; compare from the words after.
    expect(application).toContain("ACCOUNT NUMBER BL-4410000");
    expect(application).toContain("METER NUMBER M72000000");
    expect(application).toContain("Quillmoor Solar Electric");
    expect(application).toContain("EC-40718 (demo)");
  });

  test("the facility page gives equipment, ratings, certification, grid profile, disconnect, storage and export", () => {
    const facility = pages[1]!;
    expect(facility).toContain("1 Quillon QS-7600 7,600 W, 32 A at 240 V UL 1741 SB; IEEE 1547-2018 Category B");
    expect(facility).toContain("MODULE MAKER AND MODEL Larkspur LK-405M-54H MODULE COUNT 22 MODULE RATING 405 W (STC)");
    expect(facility).toContain("DC RATING (STC) 8.91 kW AC RATING 7.6 kW AC OUTPUT CURRENT 32 A");
    expect(facility).toContain("PHASE Single-phase NOMINAL AC VOLTAGE 240 V");
    expect(facility).toContain("ACCEPTS IEEE 1547-2018 Category B, the utility's default settings");
    expect(facility).toContain("PV SYSTEM DISCONNECT LOCATION Within 10 ft of the meter");
    expect(facility).toContain("ENERGY STORAGE None EXPORT Yes: surplus energy flows to the grid (net)");
  });

  test("the single-line sheet carries the diagram and the last page the signature blocks", () => {
    expect(pages[2]).toContain("SINGLE-LINE DIAGRAM");
    const signatures = pages[3]!;
    for (const who of ["Customer", "Installer"]) expect(signatures).toContain(who);
    expect(signatures.match(/SIGNATURE DATE/g)).toHaveLength(2);
    expect(signatures.match(/PRINTED NAME TITLE OR ROLE/g)).toHaveLength(2);
  });
});
