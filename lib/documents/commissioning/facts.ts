import {
  DEFAULT_SHUTDOWN_V_PER_DEVICE,
  FIRST_POWER_MAX_FRACTION,
  INSIDE_BOUNDARY_MAX_V,
  OUTSIDE_BOUNDARY_MAX_V,
  insulationRequirement,
  normalizeSerial,
  serviceVoltageRanges,
  shutdownWindow,
  stringVocWindow,
  type CheckStatus,
  type CommissioningCheck,
  type CommissioningKind,
  type CommissioningRecord,
} from "@/lib/engineering";
import type { CommissioningDocumentInput, CommissioningDocumentKind } from "./input";
import { openCountsInWords } from "@/lib/field/completion-words";
import { documentDate, documentTime, formatNumber, formatQuantity } from "../text";

// The words and figures the certificate of completion and the commissioning report print,
// computed from the document input so the templates only lay them out and the tests can
// check the same strings.

export const COMMISSIONING_TITLES: Record<CommissioningDocumentKind, string> = {
  certificate: "Certificate of completion",
  report: "Commissioning report",
};

/** The safety cautions both documents print in full. */
export const COMMISSIONING_CAUTIONS: readonly string[] = [
  "PV circuits are energized whenever light reaches the modules, even with the inverter, the AC disconnect and the PV breaker off. Rapid shutdown (NEC 690.12) lowers the voltage on the conductors it controls; it does not make the modules or their leads safe to touch.",
  "Inverter capacitors hold a charge after shutdown. Keep clear of the inverter's terminals until the inverter reports a safe DC voltage, then confirm it with a meter before touching anything.",
  "Follow each manufacturer's installation instructions, the NEC edition and local amendments the AHJ enforces, and licensed practice. Work on equipment that may be energized is for qualified persons with the protective equipment the task calls for.",
  "Do not operate the system in parallel with the grid until the AHJ's final inspection has passed and the utility has granted permission to operate (PTO), apart from tests the utility allows.",
];

/** The short caution the title band repeats on every page. */
export const COMMISSIONING_BAND_CAUTION =
  "Caution: PV conductors are energized whenever light reaches the modules, and inverter capacitors hold a charge after shutdown. Qualified persons only; follow the manufacturers' instructions " +
  "and the NEC edition and local amendments the AHJ enforces.";

export function commissioningProjectLabel(input: CommissioningDocumentInput): string {
  return `Project ${input.project.number} · ${input.project.customerName}`;
}

// Titles for required readings that have no result at all (the completion lists their kind).
const KIND_TITLES: Record<CommissioningKind, string> = {
  "string-polarity": "String polarity",
  "string-voc": "String open-circuit voltage",
  "string-insulation": "String insulation resistance",
  "inverter-serial": "Inverter serial against its activation card",
  "inverter-activation": "Inverter activated",
  "device-pairing": "Module-level devices found",
  "grid-profile": "Grid profile on the inverter",
  "ac-voltage": "AC voltage at the point of connection",
  "string-shutdown": "String voltage with the array shut down",
  "modules-reporting": "Modules reporting",
  "first-power": "First power reading",
  "rapid-shutdown-voltage": "Rapid shutdown test: voltage reached",
  "rapid-shutdown-time": "Rapid shutdown test: time to reach it",
  "storage-charge": "Battery state of charge",
  "storage-backup": "Backup test: grid opened, backup panel carried",
  "storage-transfer-time": "Backup test: time to transfer",
  "storage-power-control": "Power control setting read from the inverter",
  "storage-export-limit": "Export limit read from the inverter",
};

/** The cautions of stored energy, printed for a record with batteries. */
export const STORAGE_CAUTIONS: readonly string[] = [
  "A battery stays energized when the array and the grid are off: opening the PV disconnect, the PV breaker or the grid supply does not de-energize the battery, its circuits or the backup loads panel. Open the energy storage system disconnect (NEC Article 706) before working on them.",
  "Follow the energy storage system manufacturer's instructions for commissioning, the backup test and any service, and licensed practice; battery faults can deliver large currents.",
];

function titleOf(input: CommissioningDocumentInput, id: string): string {
  return input.results.find((r) => r.id === id)?.title ?? KIND_TITLES[id as CommissioningKind] ?? id;
}

export type CompletionSummary = {
  complete: boolean;
  /** The mark the summary carries: pass when complete, fail when a reading fails, review when only readings are missing. */
  status: CheckStatus;
  word: "Complete" | "Open";
  /** One sentence, e.g. "Open: 2 failing and 1 not recorded yet." */
  sentence: string;
  failing: string[]; // titles
  notRecorded: string[]; // titles of readings not recorded that are not already failing
  waiting: string[]; // titles of readings recorded but not through yet (devices still being found)
  toReview: string[]; // titles of recorded readings that warn and do not hold the record open
};

const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/**
 * The commissioning result in words. A reading that is both failing and missing (the grid
 * profile fails while it is not recorded) is counted once, as failing.
 */
export function completionSummary(input: CommissioningDocumentInput): CompletionSummary {
  const { completion } = input;
  const failingIds = [...new Set(completion.failing)];
  const missingIds = [...new Set(completion.missing)].filter((id) => !failingIds.includes(id));
  const failing = failingIds.map((id) => titleOf(input, id));
  const notRecorded = missingIds.map((id) => titleOf(input, id));
  const waiting = [...new Set(completion.waiting)].map((id) => titleOf(input, id));
  const toReview = input.results.filter((r) => r.status === "warn" && r.reading === "recorded" && !r.waiting).map((r) => r.title);
  const reviewNote = toReview.length ? ` ${count(toReview.length, "reading")} to review.` : "";
  if (completion.complete) {
    return {
      complete: true,
      status: "pass",
      word: "Complete",
      sentence: `Complete: all ${count(input.results.length, "reading")} recorded, none failing.${reviewNote}`,
      failing,
      notRecorded,
      waiting,
      toReview,
    };
  }
  const joined = openCountsInWords({ failing: failing.length, notRecorded: notRecorded.length, waiting: waiting.length });
  return {
    complete: false,
    status: failing.length ? "fail" : "warn",
    word: "Open",
    sentence: `Open: ${joined || "not marked complete"}.${reviewNote}`,
    failing,
    notRecorded,
    waiting,
    toReview,
  };
}

/** One row of the readings table. */
export type ReadingRow = {
  check: CommissioningCheck;
  reading: string;
  expected: string;
  /** The finding and what to do, printed for anything not passing. */
  finding: string | null;
  fix: string | null;
};

const NOT_RECORDED = "Not recorded";

function notValid(raw: unknown, unit: string): string {
  return typeof raw === "number" && Number.isFinite(raw) ? `Not valid (${formatNumber(raw)}${unit ? ` ${unit}` : ""})` : "Not valid";
}

/** The part of an id after the kind: "S1" of "string-voc:S1", "inv-1" of "inverter-serial:inv-1". */
const subjectOf = (check: CommissioningCheck) => check.id.slice(check.id.indexOf(":") + 1);

function stringOf(record: CommissioningRecord, check: CommissioningCheck) {
  return record.strings.find((s) => s.id === subjectOf(check));
}
const stringTestOf = (record: CommissioningRecord, check: CommissioningCheck) => record.stringTests?.find((s) => s.id === subjectOf(check));
const unitOf = (record: CommissioningRecord, check: CommissioningCheck) => record.inverters?.find((u) => u.id === subjectOf(check));

function pairingOf(record: CommissioningRecord, check: CommissioningCheck): { installed: number; found?: number | null } | undefined {
  const p = record.pairing;
  if (!p) return undefined;
  return check.id === "device-pairing" ? p : p.strings.find((s) => s.id === subjectOf(check));
}

function temperatureText(record: CommissioningRecord): string {
  const t = record.vocTemperature;
  if (t?.tempC === null || t?.tempC === undefined || !Number.isFinite(t.tempC)) return "";
  return ` at ${formatNumber(t.tempC)} °C (${t.source === "ambient" ? "air" : "module"})`;
}

function readingText(check: CommissioningCheck, record: CommissioningRecord): string {
  const unit = check.unit === "modules" ? "" : check.unit;
  switch (check.kind) {
    case "grid-profile":
      return check.reading === "recorded" ? (record.gridProfileSet ?? "").trim() : NOT_RECORDED;
    case "string-polarity": {
      const p = stringTestOf(record, check)?.polarity;
      return p === "correct" ? "Correct" : p === "reversed" ? "Reversed" : NOT_RECORDED;
    }
    case "inverter-serial": {
      const u = unitOf(record, check);
      const serial = normalizeSerial(u?.serial) || "not recorded";
      const card = normalizeSerial(u?.cardSerial) || "not recorded";
      return `Unit ${serial}; card ${card}`;
    }
    case "inverter-activation":
      return check.status === "pass" ? "Done" : "Not yet";
    case "device-pairing": {
      const p = pairingOf(record, check);
      if (check.reading === "missing") return NOT_RECORDED;
      if (check.reading === "invalid") return notValid(p?.found, "");
      return `${formatQuantity(check.value, "")} of ${p?.installed ?? "?"}`;
    }
    case "first-power": {
      const w = record.firstPowerW;
      const time = record.firstPowerTime?.trim() ?? "";
      if (check.reading === "invalid")
        return typeof w === "number" && Number.isFinite(w) ? `${formatQuantity(w, "W")}, time "${time}" not valid` : "Not valid";
      if (check.reading === "missing")
        return typeof w === "number" && Number.isFinite(w) ? `${formatQuantity(w, "W")}, time not recorded` : NOT_RECORDED;
      return `${formatQuantity(check.value, "W")} at ${time}`;
    }
    case "modules-reporting":
      if (check.reading !== "recorded") return check.reading === "missing" ? NOT_RECORDED : notValid(record.modulesReporting, "");
      return `${formatQuantity(check.value, "")} of ${record.modulesInstalled}`;
    case "storage-backup": {
      const t = record.storage?.backupTest;
      if (check.reading === "missing") return NOT_RECORDED;
      return `Grid ${t?.gridOpened ? "opened" : "not opened"}; backup panel ${t?.panelCarried ? "carried" : "not carried"}`;
    }
    case "string-voc": {
      const v = stringTestOf(record, check)?.vocV;
      if (typeof v !== "number" || !Number.isFinite(v)) return v === null || v === undefined ? NOT_RECORDED : "Not valid";
      return `${formatQuantity(v, "V")}${temperatureText(record)}`;
    }
    default: {
      if (check.reading === "missing") return NOT_RECORDED;
      if (check.reading === "invalid") {
        const raw =
          check.kind === "ac-voltage"
            ? record.acVoltageV
            : check.kind === "string-shutdown"
              ? stringOf(record, check)?.measuredV
              : check.kind === "string-insulation"
                ? stringTestOf(record, check)?.insulationMohm
                : check.kind === "rapid-shutdown-voltage"
                  ? record.rapidShutdownTest?.measuredV
                  : check.kind === "rapid-shutdown-time"
                    ? record.rapidShutdownTest?.seconds
                    : storageRaw(check, record);
        return notValid(raw, unit);
      }
      return formatQuantity(check.value, unit);
    }
  }
}

/** The storage reading behind a result, for printing one that is not valid. */
function storageRaw(check: CommissioningCheck, record: CommissioningRecord): unknown {
  const r = record.storage;
  switch (check.kind) {
    case "storage-charge":
      return r?.stateOfChargePct;
    case "storage-transfer-time":
      return r?.backupTest?.transferSeconds;
    case "storage-power-control":
      return r?.pcsSettingReadA;
    case "storage-export-limit":
      return r?.exportLimitReadKw;
    default:
      return null;
  }
}

function range(low: number, high: number, unit: string): string {
  return `${formatNumber(low)}–${formatNumber(high)} ${unit}`;
}

function expectedText(check: CommissioningCheck, record: CommissioningRecord): string {
  const fallback = check.limit === null ? "—" : `Limit ${formatQuantity(check.limit, check.unit)}`;
  try {
    switch (check.kind) {
      case "string-polarity":
        return "+ to +, − to −";
      case "string-voc": {
        const s = stringTestOf(record, check);
        const t = record.vocTemperature;
        if (!s) return fallback;
        if (t?.tempC === null || t?.tempC === undefined || !Number.isFinite(t.tempC))
          return `${count(s.modulesInSeries, "module")}, corrected to the temperature read`;
        const w = stringVocWindow(s, { tempC: t.tempC, source: t.source });
        return `${formatNumber(Math.round(w.lowV * 10) / 10)}–${formatNumber(Math.round(w.highV * 10) / 10)} V for ${count(s.modulesInSeries, "module")}`;
      }
      case "string-insulation": {
        const s = stringTestOf(record, check);
        if (!s) return fallback;
        const { testV, minMohm } = insulationRequirement(s.modulesInSeries * s.moduleVocV);
        return `At least ${formatNumber(minMohm)} MΩ at a ${testV} V test`;
      }
      case "inverter-serial":
        return "The same serial on the unit and its card";
      case "inverter-activation":
        return "Done";
      case "device-pairing": {
        const p = pairingOf(record, check);
        return p ? `All ${p.installed} installed` : fallback;
      }
      case "grid-profile":
        return (
          record.acceptedGridProfiles
            .map((p) => p.trim())
            .filter(Boolean)
            .join(" or ") || "Not on file"
        );
      case "ac-voltage": {
        const { nominalV, rangeA, rangeB } = serviceVoltageRanges(record.nominalServiceV);
        return `${range(rangeA.lowV, rangeA.highV, "V")} on ${nominalV} V; ${range(rangeB.lowV, rangeB.highV, "V")} at times`;
      }
      case "string-shutdown": {
        const s = stringOf(record, check);
        if (!s) return fallback;
        const { lowV, highV } = shutdownWindow(s.devicesInSeries, s.perDeviceV ?? DEFAULT_SHUTDOWN_V_PER_DEVICE);
        const codeV = (s.wiringLeavesArray ?? true) ? OUTSIDE_BOUNDARY_MAX_V : INSIDE_BOUNDARY_MAX_V;
        return `${range(lowV, highV, "V")} for ${count(s.devicesInSeries, "device")}; ${codeV} V at most`;
      }
      case "modules-reporting":
        return `All ${record.modulesInstalled} installed`;
      case "first-power":
        return `Above 0, up to ${formatQuantity(FIRST_POWER_MAX_FRACTION * record.acRatingW, "W")}`;
      case "rapid-shutdown-voltage":
      case "rapid-shutdown-time":
        return check.limit === null ? fallback : `${formatQuantity(check.limit, check.unit)} at most`;
      case "storage-charge":
        return "As the system shows it, 0–100 %";
      case "storage-backup":
        return "Grid opened and the backup panel carried";
      case "storage-transfer-time": {
        const t = record.storage?.transferTimeS;
        return t === null || t === undefined
          ? "The inverter's stated transfer time (not in the design)"
          : `${formatQuantity(t, "s")} stated, read by hand: ${formatQuantity(check.limit, "s")} at most`;
      }
      case "storage-power-control":
        return `${formatQuantity(check.limit, "A")} as designed`;
      case "storage-export-limit":
        return `${formatQuantity(check.limit, "kW")} as designed`;
    }
  } catch {
    return fallback;
  }
}

/** Every result with the reading and the expected range in words, in the order the checks ran. */
export function readingRows(input: CommissioningDocumentInput): ReadingRow[] {
  return input.results.map((check) => ({
    check,
    reading: readingText(check, input.record),
    expected: expectedText(check, input.record),
    finding: check.status === "pass" ? null : check.message,
    fix: check.status === "pass" ? null : (check.fix ?? null),
  }));
}

/** Headline system facts, as both documents print them. */
export function systemRatingText(input: CommissioningDocumentInput): { dc: string; ac: string } {
  return { dc: formatQuantity(input.system.dcKw, "kW"), ac: formatQuantity(input.system.acKw, "kW") };
}

/** The readings the certificate names in brief, each as a label and a value. */
export function certificateReadings(input: CommissioningDocumentInput): { label: string; value: string }[] {
  const { record, results } = input;
  const result = (id: string) => results.find((r) => r.id === id);
  const lines: { label: string; value: string }[] = [];
  if (record.inverters?.length) {
    lines.push({
      label: "Inverter serial",
      value: record.inverters
        .map((u) => {
          const serial = normalizeSerial(u.serial) || "not recorded";
          const matched = result(`inverter-serial:${u.id}`)?.status === "pass";
          return `${serial}${matched ? ", card matches" : ", card not checked"}${u.activated ? ", activated" : ""}`;
        })
        .join("; "),
    });
  }
  lines.push({ label: "Grid profile", value: record.gridProfileSet?.trim() || "Not recorded" });
  if (record.pairing) {
    const found = record.pairing.found;
    lines.push({
      label: `${record.pairing.word[0]!.toUpperCase()}${record.pairing.word.slice(1)} found`,
      value: typeof found === "number" ? `${found} of ${record.pairing.installed}` : "Not recorded",
    });
  }
  const tests = record.stringTests ?? [];
  if (tests.length) {
    const ids = results.filter((r) => r.kind === "string-polarity" || r.kind === "string-voc" || r.kind === "string-insulation");
    const passing = ids.filter((r) => r.status === "pass").length;
    lines.push({ label: "String tests", value: `${count(tests.length, "string")}: ${passing} of ${ids.length} results pass` });
  }
  const storage = record.storage;
  if (storage) {
    const soc = storage.stateOfChargePct;
    const backup = result("storage-backup");
    lines.push({
      label: "Energy storage",
      value: [
        typeof soc === "number" ? `${formatNumber(soc)} % charged` : "charge not recorded",
        ...(storage.hasBackupPanel
          ? [backup?.status === "pass" ? "backup panel carried with the grid open" : "backup test not passed"]
          : []),
      ].join(", "),
    });
  }
  lines.push({
    label: "Modules reporting",
    value: record.moduleMonitoring
      ? typeof record.modulesReporting === "number"
        ? `${record.modulesReporting} of ${record.modulesInstalled}`
        : "Not recorded"
      : "No module-level monitoring",
  });
  return lines;
}

/** The statement the installer signs on the certificate, in full. */
export function installerStatement(input: CommissioningDocumentInput): string {
  const ahj = input.project.jurisdictionName ?? "the authority having jurisdiction";
  const utility = input.project.utilityName ?? "the utility";
  return (
    `I state that the grid-tied PV system described above was installed and commissioned according to the approved design, ` +
    `the NEC ${input.record.edition} with the local amendments enforced by ${ahj}, and the manufacturers' installation instructions; ` +
    `that the commissioning readings were taken by me or under my direct supervision and are truly recorded in the commissioning report; ` +
    `and that the system will not run in parallel with the grid until ${utility} grants permission to operate, apart from tests it allows.`
  );
}

/** Everything the certificate's and the report's layouts print beyond the input's own text, as printed. */
export type CommissioningFacts = {
  title: string;
  projectLabel: string;
  printedDate: string;
  cautions: readonly string[];
  bandCaution: string;
  summary: CompletionSummary;
  ratings: { dc: string; ac: string };
  /** The report's readings table. */
  rows: ReadingRow[];
  /** The certificate's key readings, in one paragraph. */
  readings: { label: string; value: string }[];
  lastRecorded: string;
  markedComplete: string;
  /** The certificate's line under the result. */
  certificateFootnote: string;
  installerStatement: string;
};

/** The printed facts of a commissioning document, from its (printable) input. */
export function commissioningFacts(input: CommissioningDocumentInput): CommissioningFacts {
  const zone = input.organization.timeZone;
  const summary = completionSummary(input);
  return {
    title: COMMISSIONING_TITLES[input.kind],
    projectLabel: commissioningProjectLabel(input),
    printedDate: documentDate(input.generatedAt, zone),
    cautions: input.record.storage ? [...COMMISSIONING_CAUTIONS, ...STORAGE_CAUTIONS] : COMMISSIONING_CAUTIONS,
    bandCaution: COMMISSIONING_BAND_CAUTION,
    summary,
    ratings: systemRatingText(input),
    rows: readingRows(input),
    readings: certificateReadings(input),
    lastRecorded: input.recordUpdatedAt ? documentTime(input.recordUpdatedAt, zone) : "Nothing recorded yet",
    markedComplete: input.completedAt ? documentTime(input.completedAt, zone) : "Not yet",
    certificateFootnote: summary.complete
      ? `Marked complete ${input.completedAt ? documentTime(input.completedAt, zone) : "(time not recorded)"}; the readings are in the commissioning report.`
      : "Do not sign until every reading is recorded and none fails; the commissioning report says what to do for each.",
    installerStatement: installerStatement(input),
  };
}

/** A commissioning document's input with its printed facts: what the layouts receive. */
export type PrintedCommissioning = CommissioningDocumentInput & { facts: CommissioningFacts };
