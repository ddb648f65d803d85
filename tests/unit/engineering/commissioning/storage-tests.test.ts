import { describe, expect, test } from "vitest";
import {
  LOW_CHARGE_PCT,
  TRANSFER_TIMING_ALLOWANCE_S,
  checkCommissioning,
  checkStorageCommissioning,
  commissioningComplete,
  type StorageCommissioningReading,
} from "@/lib/engineering";
import { completeRecord } from "./fixtures";

// The storage part of the field record (issue 17). Sources beside each row:
// - NEC 710.15(A) (stand-alone supply carries the backup loads) and 705.13 (power control systems, 2020 on: none in 2017);
//   the clause numbers are those of lib/engineering/clauses.ts, from memory as noted there.
// - The inverter's transfer time is the maker's data sheet figure; the 1 s allowance for timing by hand, the 20 % charge
//   below which a backup test shows little, and the 0.1 read-back tolerance of a rounded display are common practice.

const full: StorageCommissioningReading = {
  hasBackupPanel: true,
  transferTimeS: 0.02,
  pcsSettingA: 40,
  exportLimitKw: 0,
  stateOfChargePct: 80,
  backupTest: { gridOpened: true, panelCarried: true, transferSeconds: 0 },
  pcsSettingReadA: 40,
  exportLimitReadKw: 0,
};
const byKind = (r: StorageCommissioningReading, edition: 2017 | 2020 | 2023 = 2023) =>
  Object.fromEntries(checkStorageCommissioning(r, edition).map((c) => [c.kind, c]));

describe("state of charge shown by the system", () => {
  test.each([
    [80, "pass", "recorded"], // maker's display, any charge 0–100 % is a reading
    [LOW_CHARGE_PCT, "pass", "recorded"], // at the common-practice floor
    [LOW_CHARGE_PCT - 1, "warn", "recorded"], // too low for a meaningful backup test (common practice): recorded, does not hold the record
    [0, "warn", "recorded"],
    [100, "pass", "recorded"],
    [101, "fail", "invalid"], // a percentage cannot exceed 100
    [-5, "fail", "invalid"],
    [null, "warn", "missing"],
  ] as const)("%s %% → %s (%s)", (pct, status, reading) => {
    expect(byKind({ ...full, stateOfChargePct: pct })["storage-charge"]).toMatchObject({ status, reading, unit: "%" });
  });
});

describe("backup test: grid opened, backup panel carried (NEC 710.15(A))", () => {
  test.each([
    [true, true, "pass", "recorded"],
    [true, false, "fail", "recorded"], // the panel went dark
    [false, true, "fail", "recorded"], // the grid was never opened: nothing was tested
    [null, true, "warn", "missing"],
    [true, null, "warn", "missing"],
  ] as const)("grid opened %s, panel carried %s → %s", (gridOpened, panelCarried, status, reading) => {
    const c = byKind({ ...full, backupTest: { ...full.backupTest, gridOpened, panelCarried } })["storage-backup"];
    expect(c).toMatchObject({ status, reading, clause: "NEC 2023 710.15(A)" });
  });

  test.each([
    // [stated s, read s, status]: the data sheet time plus the 1 s allowance for a hand-timed transfer (common practice)
    [0.02, 0, "pass"],
    [0.02, 1, "pass"],
    [0.02, 1.02, "pass"], // exactly at the allowance
    [0.02, 1.5, "fail"],
    [5, 6, "pass"], // a slow-transfer unit states its own time
    [5, 6.5, "fail"],
  ] as const)("stated %s s, read %s s → %s", (stated, read, status) => {
    const c = byKind({ ...full, transferTimeS: stated, backupTest: { ...full.backupTest, transferSeconds: read } })[
      "storage-transfer-time"
    ];
    expect(c).toMatchObject({ status, value: read, limit: stated + TRANSFER_TIMING_ALLOWANCE_S, clause: "inverter data sheet" });
  });

  test("no stated transfer time: the reading is kept and flagged for comparison, never passed", () => {
    const c = byKind({ ...full, transferTimeS: null })["storage-transfer-time"];
    expect(c).toMatchObject({ status: "warn", reading: "recorded", limit: null });
  });

  test("without a backup loads panel there is no backup test", () => {
    const kinds = checkStorageCommissioning({ ...full, hasBackupPanel: false, backupTest: undefined }, 2023).map((c) => c.kind);
    expect(kinds).not.toContain("storage-backup");
    expect(kinds).not.toContain("storage-transfer-time");
  });
});

describe("settings read from the inverter against the design", () => {
  test.each([
    // [designed, read, status]: higher than designed fails, lower warns, equal (within the display's 0.1) passes
    [40, 40, "pass"],
    [40, 40.1, "pass"],
    [40, 40.2, "fail"], // the busbar was checked for 40 A only (705.13)
    [40, 32, "warn"],
  ] as const)("power control setting designed %s A, read %s A → %s", (designed, read, status) => {
    const c = byKind({ ...full, pcsSettingA: designed, pcsSettingReadA: read })["storage-power-control"];
    expect(c).toMatchObject({ status, value: read, limit: designed, unit: "A" });
  });

  test.each([
    [0, 0, "pass"], // non-export
    [0, 0.5, "fail"],
    [5, 5, "pass"],
    [5, 3, "warn"],
    [5, 7.6, "fail"],
  ] as const)("export limit designed %s kW, read %s kW → %s", (designed, read, status) => {
    const c = byKind({ ...full, exportLimitKw: designed, exportLimitReadKw: read })["storage-export-limit"];
    expect(c).toMatchObject({ status, value: read, limit: designed, unit: "kW", clause: "utility interconnection requirement" });
  });

  test.each([
    [2017, "design consistency"], // NEC 2017 has no 705.13: the setting is held to the design alone
    [2020, "NEC 2020 705.13"],
    [2023, "NEC 2023 705.13"],
  ] as const)("NEC %d: the power control reading cites %s", (edition, cite) => {
    expect(byKind(full, edition)["storage-power-control"]!.clause).toBe(cite);
  });

  test("no designed setting or limit: nothing to read back", () => {
    const kinds = checkStorageCommissioning({ ...full, pcsSettingA: null, exportLimitKw: null }, 2023).map((c) => c.kind);
    expect(kinds).toEqual(["storage-charge", "storage-backup", "storage-transfer-time"]);
  });
});

describe("a record with storage completes only when its storage part does", () => {
  test("every storage reading passing: complete", () => {
    const results = checkCommissioning({ ...completeRecord, storage: full });
    expect(commissioningComplete(results)).toEqual({ complete: true, failing: [], missing: [], waiting: [] });
  });

  test("storage readings not taken: open, each named", () => {
    const empty: StorageCommissioningReading = { hasBackupPanel: true, transferTimeS: 0.02, pcsSettingA: 40, exportLimitKw: 0 };
    expect(commissioningComplete(checkCommissioning({ ...completeRecord, storage: empty }))).toEqual({
      complete: false,
      failing: [],
      missing: ["storage-charge", "storage-backup", "storage-transfer-time", "storage-power-control", "storage-export-limit"],
      waiting: [],
    });
  });

  test("a backup panel that went dark blocks completion", () => {
    const results = checkCommissioning({
      ...completeRecord,
      storage: { ...full, backupTest: { ...full.backupTest, panelCarried: false } },
    });
    expect(commissioningComplete(results).failing).toEqual(["storage-backup"]);
  });

  test("a record without storage has no storage checks", () => {
    expect(checkCommissioning(completeRecord).some((c) => c.kind.startsWith("storage-"))).toBe(false);
  });
});
