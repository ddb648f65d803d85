import { beforeAll, describe, expect, test } from "vitest";
import { checkCommissioning, commissioningComplete, type StorageCommissioningReading } from "@/lib/engineering/commissioning";
import type { CommissioningDocumentInput } from "@/lib/documents/commissioning/input";
import { renderCommissioningPdf } from "@/lib/documents/commissioning/render";
import { commissioningFixture } from "@/tests/support/commissioning-fixture";
import { pageTexts } from "../read-pdf";

// The commissioning report and certificate of a system with batteries print the storage readings and
// the cautions of stored energy (issue 17); a record without storage prints neither.

const storage: StorageCommissioningReading = {
  hasBackupPanel: true,
  transferTimeS: 0.02,
  pcsSettingA: 40,
  exportLimitKw: 0,
  stateOfChargePct: 76,
  backupTest: { gridOpened: true, panelCarried: true, transferSeconds: 0 },
  pcsSettingReadA: 40,
  exportLimitReadKw: 0.5, // above the non-export design: fails
};

function withStorage(kind: "report" | "certificate"): CommissioningDocumentInput {
  const base = commissioningFixture({ kind, scenario: "complete" });
  const record = { ...base.record, storage };
  const results = checkCommissioning(record);
  return { ...base, record, results, completion: commissioningComplete(results) };
}

describe("commissioning documents with storage", () => {
  let report: string;
  let certificate: string;
  beforeAll(async () => {
    report = (await pageTexts(await renderCommissioningPdf(withStorage("report")))).join(" ");
    certificate = (await pageTexts(await renderCommissioningPdf(withStorage("certificate")))).join(" ");
  }, 60_000);

  test("the report prints each storage reading against what was expected", () => {
    for (const fact of [
      "Battery state of charge",
      "76 %",
      "Backup test: grid opened, backup panel carried",
      "Grid opened; backup panel carried",
      "Backup test: time to transfer",
      "0.02 s stated, read by hand: 1.02 s at most",
      "Power control setting read from the inverter",
      "40 A as designed",
      "Export limit read from the inverter",
      "0 kW as designed",
    ])
      expect(report).toContain(fact);
  });

  test("an export limit read above the design holds the record open and says what to do", () => {
    expect(report).toContain("Open: 1 failing");
    expect(report).toContain("Set the export limit to 0 kW and read it back.");
  });

  test("both documents carry the cautions of stored energy; the certificate names the storage result", () => {
    for (const text of [report, certificate]) {
      expect(text).toContain("A battery stays energized when the array and the grid are off");
      expect(text).toContain("energy storage system manufacturer's instructions");
    }
    expect(certificate).toContain("76 % charged, backup panel carried with the grid open");
  });

  test("a record without storage prints no storage", async () => {
    const text = (await pageTexts(await renderCommissioningPdf(commissioningFixture({ kind: "report", scenario: "complete" })))).join(" ");
    expect(text).not.toContain("battery");
    expect(text).not.toContain("Backup test");
  });
});
