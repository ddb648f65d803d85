import { beforeAll, describe, expect, test } from "vitest";
import type { PacketInput } from "@/lib/documents/packets/input";
import { renderPacketPdf } from "@/lib/documents/packets/render";
import { LABELS_PER_SHEET, planPermitSheets } from "@/lib/documents/packets/sheet-plan";
import { packetFixture } from "@/tests/support/packet-fixture";
import { acExportStorage, dcBackupStorage, storagePacketFixture } from "@/tests/support/storage-packet-fixture";
import { pageTexts } from "../read-pdf";

// Packets for a design with batteries print the storage a plan reviewer and a utility ask for (issue 17;
// NEC 706, 705.12/705.13, 710.15); a PV-only design's packets print none of it.

const all = (pages: string[]) => pages.join(" ");

describe("permit packet with DC-coupled storage and a backup loads panel", () => {
  let input: PacketInput;
  let pages: string[];
  beforeAll(async () => {
    input = storagePacketFixture("permit", dcBackupStorage);
    pages = await pageTexts(await renderPacketPdf(input));
  }, 60_000);

  test("as many pages as the plan has sheets: labels split across sheets, the energy storage data sheet last", () => {
    const plan = planPermitSheets(input);
    expect(pages).toHaveLength(plan.length);
    expect(input.review.labels.length).toBeGreaterThan(LABELS_PER_SHEET);
    expect(plan.filter((s) => s.key === "labels").map((s) => s.title)).toEqual(["Warning labels (1 of 2)", "Warning labels (2 of 2)"]);
    expect(plan.at(-1)!.key).toBe("storage-data");
    pages.forEach((text, i) => expect(text).toContain(`Sheet ${i + 1} of ${plan.length}`));
  });

  test("the summary sheet: usable kWh, discharge kW, coupling, mode, location, backup panel, export control", () => {
    const summary = pages[1]!;
    for (const fact of [
      "2 × Brindle BX-13",
      "25.2 kWh", // 2 × 12.6 kWh usable
      "27 kWh", // 2 × 13.5 kWh nameplate
      "7.6 kW", // 2 × 6 kW, limited by the 7.6 kW hybrid inverter
      "DC-coupled through the hybrid (multimode) inverter",
      "Self-consumption",
      "garage: 2 × 13.5 kWh",
      "125 A busbar, fed by the 32 A stand-alone output",
      "Limited to 5 kW",
      "Listed power control system, current setting 24 A, counted under NEC 705.13",
      "24 A, the power control system's setting (705.13)",
      "Batteries to inverter",
      "1/0 AWG Cu THWN-2",
    ])
      expect(summary).toContain(fact);
  });

  test("the scope of work and the equipment schedule name the batteries", () => {
    expect(pages[0]).toContain("Add 2 battery units (25.2 kWh usable, 7.6 kW discharge) in the garage");
    expect(pages[0]).not.toContain("No energy storage");
    expect(pages[1]).toContain("13.5 kWh (12.6 usable), 6 kW, 400 V DC");
  });

  test("the calculation sheets carry each storage check with its clause from the review", () => {
    const text = all(pages);
    const storageChecks = input.review.checks.filter((c) => /^(ess-|backup-|battery-)/.test(c.id));
    expect(storageChecks.length).toBeGreaterThanOrEqual(6);
    for (const c of storageChecks) {
      expect(text).toContain(c.title);
      expect(text).toContain(c.clause);
    }
    expect(text).toContain("Conductor ampacity at least 1.25 × the maximum continuous current");
    expect(text).toContain("power control setting 24 A (705.13) in place of 32 A of outputs");
  });

  test("the label sheets carry the ESS, power control and backup panel labels with their values", () => {
    const text = all(pages);
    expect(text).toContain("ENERGY STORAGE SYSTEM DISCONNECT");
    expect(text).toContain("NOMINAL ESS VOLTAGE: 400 V DC");
    expect(text).toContain("OUTPUT CURRENT LIMITED TO 24 A");
    expect(text).toContain("UTILITY SERVICE AND THE MULTIMODE INVERTER");
    for (const label of input.review.labels) expect(text).toContain(label.title);
  });

  test("the energy storage data sheet prints the battery's data and the stored-energy caution", () => {
    const data = pages.at(-1)!;
    for (const fact of ["Battery: Brindle BX-13", "12.6 kWh", "400 V DC", "40 A, 5 kW", "50 A, 6 kW", "UL 9540, UL 9540A", "0.02 s"])
      expect(data).toContain(fact);
    expect(data).toContain("A battery stays energized when the array and the grid are off");
  });
});

describe("interconnection packet with storage", () => {
  test(
    "the application and facility pages give kWh, kW, coupling, operating mode, export limit and its control",
    { timeout: 60_000 },
    async () => {
      const pages = await pageTexts(await renderPacketPdf(storagePacketFixture("interconnection", dcBackupStorage)));
      expect(pages).toHaveLength(4);
      expect(pages[0]).toContain("Photovoltaic with energy storage, inverter-based");
      expect(pages[0]).toContain("25.2 kWh, 7.6 kW, DC-coupled");
      const facility = pages[1]!;
      for (const fact of [
        "25.2 kWh",
        "7.6 kW",
        "DC-coupled",
        "Self-consumption",
        "Limited to 5 kW",
        "Listed PCS, 24 A (705.13)",
        "Yes, 125 A panel",
      ])
        expect(facility).toContain(fact);
    },
  );

  test("AC-coupled and exporting: the battery inverter is listed and export is not limited", { timeout: 60_000 }, async () => {
    const input = storagePacketFixture("interconnection", acExportStorage);
    const pages = await pageTexts(await renderPacketPdf(input));
    expect(pages[1]).toContain("AC-coupled");
    expect(pages[1]).toContain("Yes, net of on-site use");
    expect(pages[1]).toContain("1 Brindle BI-5 5,760 W, 24 A at 240 V"); // beside the PV inverters
    expect(pages[2]).toContain("BATTERY INVERTER");
  });
});

describe("the fullest storage entry still fits each sheet", () => {
  // AC-coupled with every optional storage field: import limit, PCS, backup panel with its output.
  const fullest = (inverterId: string) => ({
    ...dcBackupStorage(inverterId),
    ...acExportStorage(),
    operatingMode: "non-export" as const,
    exportLimitKw: 0,
    importLimitKw: 7.2,
    pcs: { listed: true, currentSettingA: 24 },
    backupOutput: dcBackupStorage(inverterId).backupOutput,
    backupPanel: dcBackupStorage(inverterId).backupPanel,
    multimodeInverterId: undefined,
  });

  test.each(["permit", "interconnection"] as const)("%s packet: one page per planned sheet", { timeout: 60_000 }, async (kind) => {
    const input = storagePacketFixture(kind, fullest);
    const pages = await pageTexts(await renderPacketPdf(input));
    const total = kind === "permit" ? planPermitSheets(input).length : 4;
    expect(pages).toHaveLength(total);
    pages.forEach((text, i) => expect(text).toContain(`Sheet ${i + 1} of ${total}`));
    if (kind === "interconnection") {
      expect(pages[1]).toContain("7.2 kW"); // the import limit
      expect(pages[1]).toContain("No: non-export");
    }
  });
});

describe("PV-only packets print no storage", () => {
  test.each(["permit", "interconnection"] as const)("%s packet", { timeout: 60_000 }, async (kind) => {
    const input = packetFixture({ kind });
    const text = all(await pageTexts(await renderPacketPdf(input)));
    for (const word of ["ENERGY STORAGE SYSTEM", "Battery", "battery", "kWh usable", "705.13", "Energy storage data", "BACKUP"])
      expect(text).not.toContain(word);
    if (kind === "permit") expect(text).toContain("No energy storage.");
  });
});
