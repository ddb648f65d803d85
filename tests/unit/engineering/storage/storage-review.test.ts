import { describe, expect, test } from "vitest";
import { NEC_EDITIONS, reviewDesign } from "@/lib/engineering";
import { coldSite } from "../fixtures";
import { acStorage, dcStorage, storedDesign } from "./fixtures";

const site = (edition: (typeof NEC_EDITIONS)[number]) => ({ ...coldSite, necEdition: edition });

describe("the storage summary", () => {
  test("DC-coupled: two 12.6 kWh units; discharge limited by the 7.6 kW hybrid inverter; the hybrid's 32 A counted", () => {
    const r = reviewDesign(storedDesign(dcStorage()), coldSite);
    expect(r.storage).toEqual({
      coupling: "dc",
      operatingMode: "self-consumption",
      units: 2,
      totalUsableKwh: 25.2,
      totalNameplateKwh: 27,
      maxDischargeKw: 7.6, // 2 × 6 kW = 12 kW, above the inverter's 7.6 kW
      pointOfConnectionA: 32,
      countedBy: "inverter-outputs",
      powerControlSettingA: null,
      exportLimitKw: null,
      importLimitKw: null,
      backupPanel: true,
    });
  });

  test("AC-coupled: one unit's 6 kW limited by the 5.76 kW battery inverter; 32 A + 24 A counted", () => {
    const r = reviewDesign(storedDesign(acStorage({ exportLimitKw: 5 })), coldSite);
    expect(r.storage).toMatchObject({ coupling: "ac", maxDischargeKw: 5.76, pointOfConnectionA: 56, exportLimitKw: 5, backupPanel: false });
  });

  test("figures carry the circuits, the locations with their limits, and the backup panel's rule", () => {
    const f = reviewDesign(storedDesign(dcStorage()), coldSite).figures.storage!;
    expect(f.circuits).toEqual([
      { id: "c1", continuousA: 100, requiredAmpacityA: 125, minOcpdA: 125, terminalC: 75, ampacityA: 150, status: "pass" },
    ]);
    expect(f.locations).toEqual([{ location: "garage", nameplateKwh: 27, limitKwh: 80, status: "pass" }]);
    expect(f.backupPanel).toEqual({ rule: "120%", sourceA: 32, status: "pass" });
  });

  test("a forbidden location's limit figure is 0, a location with no limit null", () => {
    const bank = dcStorage().banks[0]!;
    const f = reviewDesign(
      storedDesign(
        dcStorage({
          banks: [
            { ...bank, location: "sleeping-room" },
            { ...bank, id: "b2", location: "other" },
          ],
        }),
      ),
      coldSite,
    ).figures.storage!;
    expect(f.locations.map((l) => [l.location, l.limitKwh, l.status])).toEqual([
      ["sleeping-room", 0, "fail"],
      ["other", null, "warn"],
    ]);
  });

  test.each(NEC_EDITIONS)("%d: a sound DC-coupled design with a backup panel passes every storage check", (edition) => {
    const r = reviewDesign(storedDesign(dcStorage()), site(edition));
    const storageChecks = r.checks.filter((c) => /^(ess-|backup-|battery-|input:storage)/.test(c.id));
    expect(storageChecks.length).toBeGreaterThanOrEqual(7);
    expect(storageChecks.filter((c) => c.status !== "pass")).toEqual([]);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity|undefined/);
  });

  test.each([
    [2017, false],
    [2020, true],
    [2023, true],
  ] as const)("%d: the checks cite Article 706, and 705.13 where a power control setting counts: %s", (edition, cites705_13) => {
    const r = reviewDesign(
      storedDesign(acStorage({ operatingMode: "non-export", pcs: { listed: true, currentSettingA: 32 } })),
      site(edition),
    );
    expect(r.checks.some((c) => / 706\.\d+/.test(c.clause))).toBe(true);
    expect(r.checks.some((c) => c.clause.includes("705.13"))).toBe(cites705_13);
  });
});

describe("the storage labels", () => {
  const labels = (edition: (typeof NEC_EDITIONS)[number], storage = dcStorage()) =>
    reviewDesign(storedDesign(storage), site(edition)).labels;

  // 706.15(C) (2017 706.7(D)): the ESS disconnect marked with the nominal ESS voltage, and the available fault current
  // outside dwellings (2020 706.15(C) and its dwelling exception from memory; 2023 per a trade summary).
  test.each([
    [2017, "NEC 2017 706.7(D)"],
    [2020, "NEC 2020 706.15(C)"],
    [2023, "NEC 2023 706.15(C)"],
  ] as const)("%d: the ESS disconnect label cites %s and prints the nominal voltage", (edition, citation) => {
    const l = labels(edition).find((x) => x.id === "ess-disconnect")!;
    expect(l).toMatchObject({ clause: citation, values: { essVoltageV: 400 } });
    expect(l.text).toBe("ENERGY STORAGE SYSTEM DISCONNECT\nNOMINAL ESS VOLTAGE: 400 V DC");
  });

  test("the fault current prints where it is entered", () => {
    const l = labels(2023, dcStorage({ availableFaultCurrentA: 250 })).find((x) => x.id === "ess-disconnect")!;
    expect(l.text).toContain("AVAILABLE FAULT CURRENT: 250 A");
  });

  test("a disconnect out of sight of the batteries is named at the batteries", () => {
    const out = labels(
      2020,
      dcStorage({ disconnect: { kind: "separate", withinSight: false, lockable: true, location: "north wall by the meter" } }),
    );
    expect(out.find((x) => x.id === "ess-disconnect-location")!.text).toBe(
      "ENERGY STORAGE SYSTEM DISCONNECT LOCATED: NORTH WALL BY THE METER",
    );
    expect(labels(2020).some((x) => x.id === "ess-disconnect-location")).toBe(false);
  });

  test.each([
    [2017, false],
    [2020, true],
    [2023, true],
  ] as const)("%d: the power control setting is labelled where it counts: %s (705.13)", (edition, present) => {
    const l = labels(edition, acStorage({ pcs: { listed: true, currentSettingA: 32 } })).find((x) => x.id === "power-control-setting");
    expect(l !== undefined).toBe(present);
    if (l) expect(l).toMatchObject({ clause: `NEC ${edition} 705.13`, values: { powerControlSettingA: 32 } });
  });

  test("the backup panel names both its sources, and the directory names the ESS disconnect", () => {
    const all = labels(2020, dcStorage({ disconnect: { kind: "integral", location: "garage" } }));
    expect(all.find((x) => x.id === "backup-panel-sources")!.values).toEqual({ sourceA: 32, inverterBreakerA: 40 });
    expect(all.find((x) => x.id === "power-source-directory")!.text).toContain("ENERGY STORAGE SYSTEM DISCONNECT: GARAGE");
  });

  test("an AC-coupled battery inverter is named on the main panel as a third source; DC-coupled storage adds none", () => {
    const ac = labels(2020, acStorage()).find((x) => x.id === "multiple-sources")!;
    expect(ac.text).toContain("THREE SOURCES");
    expect(ac.text).toContain("ENERGY STORAGE SYSTEM (24 A THROUGH THE 30 A BREAKER)");
    expect(labels(2020).find((x) => x.id === "multiple-sources")!.text).toContain("TWO SOURCES");
  });

  test("storage entries that fail review print no storage labels", () => {
    const broken = dcStorage({ banks: [] });
    expect(labels(2020, broken).some((x) => x.id.startsWith("ess-"))).toBe(false);
  });
});
