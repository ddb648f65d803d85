import { makeCheck, round, worstStatus } from "./check-result";
import { evaluateLoadSideRules, largestPvBreakerA } from "./checks/busbar-rules";
import { checkInverterInputCurrent, runMaxCurrentA, stringMaxCurrentA } from "./checks/circuit-current";
import { checkConductorAmpacity } from "./checks/conductor-ampacity";
import { checkConduitFill } from "./checks/conduit-fill";
import { checkEgc } from "./checks/egc";
import { checkModuleLevelInputs } from "./checks/module-level-inputs";
import { checkMicroMpptWindow, checkMpptWindow } from "./checks/mppt-window";
import { checkOcpd } from "./checks/ocpd";
import { checkPointOfConnection, governingLoadSideRule } from "./checks/point-of-connection";
import { annualProductionKwh } from "./checks/production";
import { checkRapidShutdown, rapidShutdownMethod } from "./checks/rapid-shutdown";
import { checkRoofLoad } from "./checks/roof-load";
import { checkStringVoltage } from "./checks/string-voltage";
import { checkPathVoltageDrop, checkRunVoltageDrop } from "./checks/voltage-drop";
import { type SystemRatings, checkDcToAcRatio, checkModuleCount, systemRatings } from "./checks/system-ratings";
import { isDcRun, totalInverterOutputA } from "./design-lookup";
import { DesignInputError } from "./errors";
import { type WarningLabel, requiredLabels } from "./labels";
import type { CheckResult, CheckStatus, Design, NecEdition, Site } from "./types";
import { validateDesign, validateSite } from "./validate";

export interface ReviewSummary {
  pass: number;
  warn: number;
  fail: number;
  status: CheckStatus; // the worst of all checks
  ratings: SystemRatings;
  annualProductionKwh: number | null; // null without peak sun hours
  maxDcVoltageV: number | null; // null when no DC string leaves the modules
  maxDcCircuitCurrentA: number | null;
  largestPvBreakerA: number | null; // load side with a main breaker only
}

export interface ReviewResult {
  edition: NecEdition;
  checks: CheckResult[];
  labels: WarningLabel[];
  summary: ReviewSummary;
}

/**
 * Runs every check on a design. Site or design faults that leave nothing to check throw a
 * DesignInputError; a fault confined to one string, run or roof plane becomes a failed result.
 */
export function reviewDesign(design: Design, site: Site): ReviewResult {
  validateSite(site);
  validateDesign(design);
  const edition = site.necEdition;
  const checks: CheckResult[] = [];
  const attempt = (what: string, key: string, fn: () => CheckResult[]) => {
    try {
      checks.push(...fn());
    } catch (err) {
      if (!(err instanceof DesignInputError)) throw err;
      checks.push(makeCheck({
        id: `input:${key}`, title: `Could not check ${what}`, status: "fail", value: null, limit: null, unit: "",
        clause: "input", edition, message: err.message, fix: "Correct this entry and run the review again.",
      }));
    }
  };

  for (const s of design.strings) {
    attempt(`string ${s.id}`, `string:${s.id}`, () => [...checkStringVoltage(design, site, s), ...checkMpptWindow(design, site, s)]);
  }
  attempt("module-level inputs", "module-level", () => [...checkModuleLevelInputs(design, site), ...checkMicroMpptWindow(design, site)]);
  attempt("inverter input current", "inverter-input", () => checkInverterInputCurrent(design, site));
  for (const run of design.runs) {
    attempt(`run "${run.label}"`, `run:${run.id}`, () => [
      ...checkConductorAmpacity(design, site, run),
      ...checkOcpd(design, site, run),
      ...checkEgc(design, site, run),
      ...checkRunVoltageDrop(design, site, run),
      ...checkConduitFill(site, run),
    ]);
  }
  for (const path of design.paths ?? []) {
    attempt(`path "${path.label}"`, `path:${path.id}`, () => checkPathVoltageDrop(design, site, path));
  }
  attempt("the point of connection", "point-of-connection", () => checkPointOfConnection(design, site));
  attempt("rapid shutdown", "rapid-shutdown", () => checkRapidShutdown(design, site));
  attempt("system ratings", "ratings", () => [...checkModuleCount(design, site), ...checkDcToAcRatio(design, site)]);
  for (const plane of design.roofPlanes) {
    attempt(`roof plane ${plane.label}`, `roof:${plane.id}`, () => checkRoofLoad(design, site, plane));
  }

  const summary = summarize(design, site, checks);
  return { edition, checks, labels: labelsFor(design, site, summary), summary };
}

function summarize(design: Design, site: Site, checks: CheckResult[]): ReviewSummary {
  const ratings = systemRatings(design);
  const stringVoltages = checks.filter((c) => c.id.startsWith("string-voltage:") && c.value !== null).map((c) => c.value!);
  const s = design.service;
  return {
    pass: checks.filter((c) => c.status === "pass").length,
    warn: checks.filter((c) => c.status === "warn").length,
    fail: checks.filter((c) => c.status === "fail").length,
    status: worstStatus(checks.map((c) => c.status)),
    ratings: { ...ratings, dcKw: round(ratings.dcKw, 3), acKw: round(ratings.acKw, 3), dcToAcRatio: round(ratings.dcToAcRatio) },
    annualProductionKwh: site.peakSunHours === undefined ? null : Math.round(annualProductionKwh(ratings.dcKw, site.peakSunHours)),
    maxDcVoltageV: stringVoltages.length > 0 ? Math.max(...stringVoltages) : null,
    maxDcCircuitCurrentA: maxDcCurrentA(design),
    largestPvBreakerA:
      s.connection === "load-side" && s.mainBreakerA !== null
        ? largestPvBreakerA(s.busbarA, s.mainBreakerA, s.pvBreakerAtOppositeEnd ? "120%" : "100%")
        : null,
  };
}

function maxDcCurrentA(design: Design): number | null {
  if (design.strings.length === 0) return null;
  try {
    const fromRuns = design.runs.filter(isDcRun).map((r) => runMaxCurrentA(design, r));
    return Math.max(stringMaxCurrentA(design), ...fromRuns);
  } catch (err) {
    if (err instanceof DesignInputError) return null; // already reported as a failed check
    throw err;
  }
}

function labelsFor(design: Design, site: Site, summary: ReviewSummary): WarningLabel[] {
  const s = design.service;
  const rule = s.connection === "load-side" ? governingLoadSideRule(evaluateLoadSideRules(s, totalInverterOutputA(design))) : null;
  return requiredLabels({
    edition: site.necEdition,
    onBuilding: design.mount !== "ground",
    maxDcVoltageV: summary.maxDcVoltageV,
    maxDcCircuitCurrentA: summary.maxDcCircuitCurrentA,
    rapidShutdown: rapidShutdownMethod(design),
    connection: s.connection,
    loadSideRule: rule?.rule ?? null,
    busbarA: s.busbarA,
    pvBreakerA: s.pvBreakerA,
    inverterOutputA: totalInverterOutputA(design),
    acVoltageV: design.inverters[0]!.acVoltageV,
    serviceLocation: s.serviceLocation,
    pvDisconnectLocation: s.pvDisconnectLocation,
  });
}
