// The storage part of a field record: the state of charge the system shows, the backup test (grid
// opened, the backup panel carried, the seconds the transfer took, against the inverter's stated
// transfer time), and the power control setting and export limit read from the inverter against the design.
import { atMost, fmt } from "../check-result";
import { DESIGN_CONSISTENCY, INVERTER_DATA_SHEET, clause, clauseInEdition } from "../clauses";
import type { NecEdition } from "../types";
import { UTILITY_PROFILE_BASIS } from "./grid-profile";
import { build, readingState, unrecorded, type CheckBase, type Reading } from "./reading";
import type { CommissioningCheck, StorageCommissioningReading } from "./types";

/** The ESS maker's instructions: what the system's own display is read against. */
export const ESS_MAKER_BASIS = "energy storage maker's instructions";

// A backup transfer is timed by eye and stopwatch: a data sheet's tens of milliseconds read as "0" or "1" s.
// One second of allowance covers the reading, no more (common practice).
export const TRANSFER_TIMING_ALLOWANCE_S = 1;
// A battery nearly empty proves little in a backup test (common practice: charge it first).
export const LOW_CHARGE_PCT = 20;
// Settings are read off the inverter's screen, which rounds to a tenth (common practice).
export const SETTING_READ_TOLERANCE = 0.1;

function chargeCheck(r: StorageCommissioningReading, edition: NecEdition): CommissioningCheck {
  const base: CheckBase = { id: "storage-charge", title: "Battery state of charge", unit: "%", clause: ESS_MAKER_BASIS, edition };
  const value = r.stateOfChargePct;
  const state = readingState(value);
  if (state !== "recorded" || (value as number) > 100) {
    return unrecorded("storage-charge", state === "recorded" ? "invalid" : state, base, {
      missing: "Not recorded yet: the state of charge the system shows.",
      invalid: "The state of charge is a percentage from 0 to 100.",
      fix: "Read the state of charge on the system's display or app and enter it in percent.",
      limit: 100,
    });
  }
  const pct = value as number;
  const low = pct < LOW_CHARGE_PCT;
  return build("storage-charge", "recorded", {
    ...base,
    status: low ? "warn" : "pass",
    value: pct,
    limit: 100,
    message: low
      ? `The system shows ${fmt(pct)} %: too little charge for the backup test to show much.`
      : `The system shows the batteries at ${fmt(pct)} %.`,
    fix: low ? "Let the batteries charge, then run the backup test." : undefined,
  });
}

/** Grid opened and the backup panel carried: both seen, or the test is not done. */
function backupCheck(r: StorageCommissioningReading, edition: NecEdition): CommissioningCheck {
  const base = {
    id: "storage-backup",
    title: "Backup test: grid opened, backup panel carried",
    unit: "",
    clause: clause("standAloneSupply", edition),
    edition,
  };
  const t = r.backupTest;
  const answers = [t?.gridOpened, t?.panelCarried];
  if (answers.some((a) => a === null || a === undefined)) {
    return unrecorded("storage-backup", "missing", base, {
      missing: "Not recorded yet: open the grid supply and see whether the backup loads panel stays on.",
      invalid: "",
    });
  }
  const ok = t!.gridOpened === true && t!.panelCarried === true;
  return build("storage-backup", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    value: null,
    limit: null,
    message: ok
      ? "With the grid supply opened the inverter carried the backup loads panel."
      : t!.gridOpened
        ? "With the grid supply opened the backup loads panel went dark."
        : "The grid supply was not opened, so the backup was not tested.",
    fix: ok
      ? undefined
      : "Check the inverter's backup settings and the backup panel's feed against the maker's instructions, then test again.",
  });
}

function transferCheck(r: StorageCommissioningReading, edition: NecEdition): CommissioningCheck {
  const known = r.transferTimeS !== undefined && r.transferTimeS !== null;
  const limit = known ? r.transferTimeS! + TRANSFER_TIMING_ALLOWANCE_S : null;
  const base = { id: "storage-transfer-time", title: "Backup test: time to transfer", unit: "s", clause: INVERTER_DATA_SHEET, edition };
  const value = r.backupTest?.transferSeconds;
  const state = readingState(value);
  if (state !== "recorded") {
    return unrecorded("storage-transfer-time", state, base, {
      missing: "Not recorded yet: the seconds from opening the grid supply to the backup panel running.",
      invalid: "The transfer time must be a number of zero or more.",
      fix: "Enter the seconds the transfer took.",
      limit: limit ?? undefined,
    });
  }
  const s = value as number;
  if (limit === null) {
    return build("storage-transfer-time", "recorded", {
      ...base,
      status: "warn",
      value: s,
      limit: null,
      message: `The transfer took ${fmt(s)} s; the inverter's transfer time is not in the design to compare with.`,
      fix: "Compare it with the transfer time on the inverter's data sheet.",
    });
  }
  const ok = atMost(s, limit);
  return build("storage-transfer-time", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    value: s,
    limit,
    message: `The transfer took ${fmt(s)} s: ${ok ? "within" : "longer than"} the inverter's ${fmt(r.transferTimeS!)} s, with ${TRANSFER_TIMING_ALLOWANCE_S} s for timing by hand.`,
    fix: ok ? undefined : "Check the inverter's backup mode and transfer settings against the maker's instructions, then test again.",
  });
}

/** A setting read off the inverter against the design: higher fails (the busbar or the utility was promised the design's), lower warns. */
function settingCheck(
  kind: "storage-power-control" | "storage-export-limit",
  designed: number,
  read: Reading,
  base: CheckBase,
  words: { what: string; unit: string; higher: string },
): CommissioningCheck {
  const state = readingState(read);
  if (state !== "recorded") {
    return unrecorded(kind, state, base, {
      missing: `Not recorded yet: the ${words.what} as the inverter shows it.`,
      invalid: `The ${words.what} must be a number of zero or more.`,
      fix: `Enter the ${words.what} in ${words.unit}.`,
      limit: designed,
    });
  }
  const v = read as number;
  const status = v > designed + SETTING_READ_TOLERANCE ? "fail" : v < designed - SETTING_READ_TOLERANCE ? "warn" : "pass";
  return build(kind, "recorded", {
    ...base,
    status,
    value: v,
    limit: designed,
    message:
      status === "pass"
        ? `The inverter shows ${fmt(v)} ${words.unit}, as designed.`
        : status === "warn"
          ? `The inverter shows ${fmt(v)} ${words.unit}, below the ${fmt(designed)} ${words.unit} designed: safe, but the system delivers less than planned.`
          : `The inverter shows ${fmt(v)} ${words.unit}, above the ${fmt(designed)} ${words.unit} designed: ${words.higher}`,
    fix: status === "fail" ? `Set the ${words.what} to ${fmt(designed)} ${words.unit} and read it back.` : undefined,
  });
}

/** The storage part of the record, in the order the crew works: charge, backup test, settings. */
export function checkStorageCommissioning(r: StorageCommissioningReading, edition: NecEdition): CommissioningCheck[] {
  const results = [chargeCheck(r, edition)];
  if (r.hasBackupPanel) results.push(backupCheck(r, edition), transferCheck(r, edition));
  if (r.pcsSettingA !== null && r.pcsSettingA !== undefined) {
    const pcsClause = clauseInEdition("powerControl", edition);
    results.push(
      settingCheck(
        "storage-power-control",
        r.pcsSettingA,
        r.pcsSettingReadA,
        {
          id: "storage-power-control",
          title: "Power control setting read from the inverter",
          unit: "A",
          clause: pcsClause ?? DESIGN_CONSISTENCY,
          edition,
        },
        { what: "power control current setting", unit: "A", higher: "the busbar was checked for the designed setting only." },
      ),
    );
  }
  if (r.exportLimitKw !== null && r.exportLimitKw !== undefined) {
    results.push(
      settingCheck(
        "storage-export-limit",
        r.exportLimitKw,
        r.exportLimitReadKw,
        { id: "storage-export-limit", title: "Export limit read from the inverter", unit: "kW", clause: UTILITY_PROFILE_BASIS, edition },
        { what: "export limit", unit: "kW", higher: "the utility was asked for the designed limit." },
      ),
    );
  }
  return results;
}
