import { atLeast, atMost, fmt, makeCheck } from "../check-result";
import { clause, clauses } from "../clauses";
import { type StoredDesign, storageConverter } from "../storage";
import type { BackupLoadsPanel, CheckResult, ServicePanel, Site } from "../types";
import { type LoadSideOutcome, type LoadSideRule, evaluateLoadSideRules } from "./busbar-rules";
import { CONTINUOUS_MULTIPLIER } from "./conductor-ampacity";
import { requiredOcpdA } from "./ocpd";
import { governingLoadSideRule } from "./point-of-connection";

const RULE_CLAUSE = { "100%": "loadSide100", "120%": "loadSide120", sum: "loadSideSum" } as const;

/**
 * The current the multimode inverter puts on the backup panel's bus: the larger of its grid-connected
 * continuous output and its stand-alone output, since the panel carries either (common practice: count the larger).
 */
export function backupSourceA(design: StoredDesign): number {
  return Math.max(storageConverter(design).continuousA, design.storage.backupOutput?.continuousA ?? 0);
}

/** The backup panel as the 705.12 busbar rules read a panel: the inverter's breaker is the source's. */
function asBusbar(p: BackupLoadsPanel): ServicePanel {
  return {
    voltageV: p.voltageV,
    phase: 1,
    busbarA: p.busbarA,
    mainBreakerA: p.mainBreakerA,
    connection: "load-side",
    pvBreakerA: p.inverterBreakerA,
    pvBreakerAtOppositeEnd: p.inverterBreakerAtOppositeEnd,
    otherBreakersA: p.otherBreakersA,
  };
}

export function backupPanelOutcome(
  design: StoredDesign,
): { rule: LoadSideRule | null; sourceA: number; outcomes: LoadSideOutcome[] } | null {
  const p = design.storage.backupPanel;
  if (!p) return null;
  const sourceA = backupSourceA(design);
  const outcomes = evaluateLoadSideRules(asBusbar(p), sourceA);
  return { rule: governingLoadSideRule(outcomes)?.rule ?? null, sourceA, outcomes };
}

/** 705.12 on the backup loads panel the multimode inverter feeds, the inverter's breaker there, and 710.15 for the stand-alone supply. */
export function checkBackupPanel(design: StoredDesign, site: Site): CheckResult[] {
  const p = design.storage.backupPanel;
  if (!p) return [];
  return [backupBusbar(design, site, p), backupInverterBreaker(design, site, p), ...checkStandAloneSupply(design, site, p)];
}

function backupBusbar(design: StoredDesign, site: Site, p: BackupLoadsPanel): CheckResult {
  const edition = site.necEdition;
  const { rule, sourceA, outcomes } = backupPanelOutcome(design)!;
  const base = { id: "backup-panel-busbar", title: "Backup loads panel busbar", unit: "A", edition };
  const governing = outcomes.find((o) => o.rule === rule);
  if (governing) {
    const what =
      governing.rule === "sum"
        ? `its breakers other than the main total ${fmt(governing.valueA)} A`
        : `1.25 × ${fmt(sourceA)} A from the inverter plus the ${p.mainBreakerA} A main is ${fmt(governing.valueA)} A`;
    return makeCheck({
      ...base,
      status: "pass",
      value: governing.valueA,
      limit: governing.limitA,
      clause: clause(RULE_CLAUSE[governing.rule], edition),
      message: `The backup panel meets the ${governing.rule === "sum" ? "sum-of-breakers" : governing.rule} rule: ${what}, within the ${fmt(governing.limitA)} A allowed on its ${p.busbarA} A busbar.`,
    });
  }
  if (p.mainBreakerA === null && p.otherBreakersA === undefined) {
    return makeCheck({
      ...base,
      status: "warn",
      value: null,
      limit: p.busbarA,
      clause: clause("loadSideSum", edition),
      message: "The backup panel has no main breaker, so only the sum rule applies; enter the other breakers on its bus to check it.",
      fix: "List every breaker on the backup panel's bus.",
      field: "storage.backupPanel.otherBreakersA",
    });
  }
  // Show the most generous rule the panel could use, as the main panel's result does.
  const shown = outcomes.find((o) => o.rule === "120%" && o.applies) ?? outcomes.find((o) => o.applies) ?? outcomes[0]!;
  return makeCheck({
    ...base,
    status: "fail",
    value: shown.valueA,
    limit: shown.limitA,
    clause: clauses(edition, "loadSide100", "loadSide120", "loadSideSum"),
    message: `The inverter's feed does not fit the backup panel: ${shown.rule === "sum" ? `its breakers total ${fmt(shown.valueA)} A` : `1.25 × ${fmt(sourceA)} A from the inverter plus the ${p.mainBreakerA ?? 0} A main is ${fmt(shown.valueA)} A`}, above the ${fmt(shown.limitA)} A its ${p.busbarA} A busbar allows, and no other busbar rule is met.`,
    fix: "Use a backup panel with a larger busbar, a smaller main, or place the inverter's breaker at the end of the bus opposite the main.",
  });
}

function backupInverterBreaker(design: StoredDesign, site: Site, p: BackupLoadsPanel): CheckResult {
  const edition = site.necEdition;
  const outputA = backupSourceA(design);
  const minimumA = CONTINUOUS_MULTIPLIER * outputA;
  const ok = atLeast(p.inverterBreakerA, minimumA);
  return makeCheck({
    id: "backup-inverter-breaker",
    title: "Inverter breaker in the backup panel",
    status: ok ? "pass" : "fail",
    value: p.inverterBreakerA,
    limit: minimumA,
    unit: "A",
    clause: clauses(edition, "acOcpd", "standardRatings"),
    edition,
    message: `The multimode inverter feeds the backup panel with up to ${fmt(outputA)} A continuous, so its breaker there must be at least 1.25 × ${fmt(outputA)} A = ${fmt(minimumA)} A; the ${p.inverterBreakerA} A breaker ${ok ? "is large enough" : "is too small"}.`,
    fix: ok ? undefined : `Use a ${requiredOcpdA(outputA, { edition })} A breaker.`,
  });
}

/**
 * 710.15: while the grid is down the multimode inverter is a stand-alone supply. Its output may be below the
 * backup panel's calculated load, but not below the largest single load moved to it (710.15(A)); a single
 * 120 V supply may feed a 120/240 V panel only with no 240 V loads and no multiwire branch circuits (710.15(C)).
 */
export function checkStandAloneSupply(design: StoredDesign, site: Site, p: BackupLoadsPanel): CheckResult[] {
  const edition = site.necEdition;
  const out = design.storage.backupOutput;
  const base = { id: "backup-supply", title: "Backup supply against the largest load", unit: "A", edition };
  if (!out) {
    return [
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        limit: null,
        clause: clause("standAloneSupply", edition),
        message: "The multimode inverter's backup output rating is not entered.",
        fix: "Enter the backup output's continuous current and voltage from the inverter's data sheet.",
        field: "storage.backupOutput.continuousA",
      }),
    ];
  }
  const results: CheckResult[] = [];
  const loads = p.loads ?? [];
  if (loads.length === 0) {
    results.push(
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        limit: out.continuousA,
        clause: clause("standAloneSupply", edition),
        message: "No loads are listed on the backup panel, so the backup supply cannot be checked against the largest of them.",
        fix: "List the loads moved to the backup panel with their running current.",
        field: "storage.backupPanel.loads",
      }),
    );
  } else {
    const largest = loads.reduce((a, b) => (b.currentA > a.currentA ? b : a));
    const totalA = loads.reduce((sum, l) => sum + l.currentA, 0);
    const ok = atMost(largest.currentA, out.continuousA);
    const shed = totalA > out.continuousA;
    results.push(
      makeCheck({
        ...base,
        status: ok ? "pass" : "fail",
        value: largest.currentA,
        limit: out.continuousA,
        clause: clause("standAloneSupply", edition),
        message: `The largest backup load, ${largest.name}, draws ${fmt(largest.currentA)} A; the inverter supplies ${fmt(out.continuousA)} A continuous while the grid is down${ok ? "" : ", too little to run it"}.${shed ? ` The listed loads draw ${fmt(totalA)} A together, more than the supply: the code permits that, but they cannot all run at once.` : ""}`,
        fix: ok ? undefined : `Move ${largest.name} off the backup panel, or use an inverter with a larger backup output.`,
      }),
    );
  }
  if (out.voltageV === 120 && p.voltageV === 240) results.push(single120(p, loads, edition));
  return results;
}

function single120(p: BackupLoadsPanel, loads: NonNullable<BackupLoadsPanel["loads"]>, edition: Site["necEdition"]): CheckResult {
  const loads240 = loads.filter((l) => l.voltageV === 240);
  const mwbc = p.multiwireBranchCircuits;
  const fail = loads240.length > 0 || mwbc === true;
  const unknown = !fail && mwbc === undefined;
  const faults = [
    loads240.length > 0 ? `240 V loads (${loads240.map((l) => l.name).join(", ")}) cannot run from it` : "",
    mwbc === true ? "the panel has multiwire branch circuits, whose shared neutral it would overload" : "",
  ].filter(Boolean);
  return makeCheck({
    id: "backup-single-120",
    title: "Single 120 V backup supply",
    status: fail ? "fail" : unknown ? "warn" : "pass",
    value: null,
    limit: null,
    unit: "",
    clause: clause("singleSupply120", edition),
    edition,
    message: fail
      ? `A single 120 V supply feeds this 120/240 V backup panel: ${faults.join("; ")}.`
      : unknown
        ? "A single 120 V supply feeds this 120/240 V backup panel; whether it has multiwire branch circuits is not entered."
        : "A single 120 V supply feeds this 120/240 V backup panel, which has no 240 V loads and no multiwire branch circuits.",
    fix: fail ? "Move 240 V loads and multiwire branch circuits off the backup panel, or use a 120/240 V backup supply." : undefined,
    field: unknown ? "storage.backupPanel.multiwireBranchCircuits" : undefined,
  });
}
