import { makeCheck, round, worstStatus } from "./check-result";
import { evaluateLoadSideRules, feedThroughLimitsToFullRating, largestPvBreakerA } from "./checks/busbar-rules";
import { checkInverterInputCurrent, runMaxCurrentA, stringMaxCurrentA } from "./checks/circuit-current";
import { checkConductorAmpacity, checkCurrentCarryingCount } from "./checks/conductor-ampacity";
import { checkConduitFill } from "./checks/conduit-fill";
import { checkDataSheets } from "./checks/data-sheets";
import { checkEquipmentDisconnects, checkPvSystemDisconnect, checkRapidShutdownInitiator } from "./checks/disconnects";
import { checkEgc } from "./checks/egc";
import { checkGroundingElectrodeConductor } from "./checks/grounding-electrode";
import { checkModuleLevelInputs } from "./checks/module-level-inputs";
import { checkMicroMpptWindow, checkMpptWindow } from "./checks/mppt-window";
import { checkOcpd } from "./checks/ocpd";
import { checkPointOfConnection, governingLoadSideRule } from "./checks/point-of-connection";
import { annualProductionKwh } from "./checks/production";
import { checkProtectionFunctions } from "./checks/protection-functions";
import { checkRapidShutdown, rapidShutdownMethod } from "./checks/rapid-shutdown";
import { checkRoofLoad } from "./checks/roof-load";
import { checkStringsHaveRuns } from "./checks/string-runs";
import { checkStringVoltage, coldModuleVoc } from "./checks/string-voltage";
import { checkSystemVoltageRatings } from "./checks/system-voltage";
import { checkPathVoltageDrop, checkRunVoltageDrop } from "./checks/voltage-drop";
import { type SystemRatings, checkDcToAcRatio, checkModuleCount, systemRatings } from "./checks/system-ratings";
import { checkWiringMethods } from "./checks/wiring-methods";
import { isDcRun, totalInverterOutputA } from "./design-lookup";
import { countedSourceCurrent, hasStorage } from "./storage";
import { type StorageSummary, storageChecks, storageFigures, storageLabelFacts, storageSummary } from "./storage-review";
import { DesignInputError } from "./errors";
import { reviewFigures, type ReviewFigures } from "./figures";
import { type WarningLabel, requiredLabels } from "./labels";
import type { ArrayDesign, CheckResult, CheckStatus, Design, NecEdition, Site } from "./types";
import { validateArrayDesign, validateDesign, validateSite } from "./validate";

export interface ReviewSummary {
  pass: number;
  warn: number;
  fail: number;
  status: CheckStatus; // the worst of all checks
  ratings: SystemRatings;
  annualProductionKwh: number | null; // null without peak sun hours
  maxDcVoltageV: number | null; // null when no DC string leaves the modules
  maxDcCircuitCurrentA: number | null;
  largestPvBreakerA: number | null; // load side on a busbar with a main breaker only
}

export interface ReviewResult {
  edition: NecEdition;
  checks: CheckResult[];
  labels: WarningLabel[];
  summary: ReviewSummary;
  /** Every figure behind the checks, per string, inverter output, run and at the point of connection. */
  figures: ReviewFigures;
  /** The batteries in brief; present only for a design with storage. */
  storage?: StorageSummary;
}

type Attempt = (what: string, key: string, fn: () => CheckResult[]) => void;

/** Runs checks one group at a time: a DesignInputError inside a group becomes a failed result naming what could not be checked. */
function collector(edition: NecEdition): { checks: CheckResult[]; attempt: Attempt } {
  const checks: CheckResult[] = [];
  const attempt: Attempt = (what, key, fn) => {
    try {
      checks.push(...fn());
    } catch (err) {
      if (!(err instanceof DesignInputError)) throw err;
      checks.push(
        makeCheck({
          id: `input:${key}`,
          title: `Could not check ${what}`,
          status: "fail",
          value: null,
          limit: null,
          unit: "",
          clause: "input",
          edition,
          message: err.message,
          fix: "Correct this entry and run the review again.",
          field: err.field,
        }),
      );
    }
  };
  return { checks, attempt };
}

/** The checks that need only the equipment and the strings. */
function arrayChecks(design: ArrayDesign, site: Site, attempt: Attempt): void {
  attempt("the data-sheet figures", "data-sheets", () => checkDataSheets(design, site));
  for (const s of design.strings) {
    attempt(`string ${s.id}`, `string:${s.id}`, () => [...checkStringVoltage(design, site, s), ...checkMpptWindow(design, site, s)]);
  }
  attempt("module-level inputs", "module-level", () => [...checkModuleLevelInputs(design, site), ...checkMicroMpptWindow(design, site)]);
  attempt("inverter input current", "inverter-input", () => checkInverterInputCurrent(design, site));
  attempt("equipment voltage ratings", "system-voltage", () => checkSystemVoltageRatings(design, site));
  attempt("arc-fault and ground-fault protection", "protection", () =>
    checkProtectionFunctions(design, site, coldModuleVoc(design.module, site.recordLowTempC).vocV),
  );
}

/**
 * The checks that can already be computed from the equipment and the strings alone, so a string that is
 * too long is flagged while the service and the runs are still being entered. Throws DesignInputError
 * when the site or those entries cannot be reviewed at all.
 */
export function reviewArray(design: ArrayDesign, site: Site): CheckResult[] {
  validateSite(site);
  validateArrayDesign(design);
  const { checks, attempt } = collector(site.necEdition);
  arrayChecks(design, site, attempt);
  return checks;
}

/**
 * Runs every check on a design. Site or design faults that leave nothing to check throw a
 * DesignInputError; a fault confined to one string, run or roof plane becomes a failed result.
 */
export function reviewDesign(design: Design, site: Site): ReviewResult {
  validateSite(site);
  validateDesign(design);
  const edition = site.necEdition;
  const { checks, attempt } = collector(edition);

  arrayChecks(design, site, attempt);
  for (const run of design.runs) {
    attempt(`run "${run.label}"`, `run:${run.id}`, () => [
      ...checkCurrentCarryingCount(design, site, run),
      ...checkConductorAmpacity(design, site, run),
      ...checkOcpd(design, site, run),
      ...checkEgc(design, site, run),
      ...checkRunVoltageDrop(design, site, run),
      ...checkConduitFill(design, site, run),
      ...checkWiringMethods(site, run),
    ]);
  }
  attempt("the strings' conductor runs", "string-runs", () => checkStringsHaveRuns(design, site));
  for (const path of design.paths ?? []) {
    attempt(`path "${path.label}"`, `path:${path.id}`, () => checkPathVoltageDrop(design, site, path));
  }
  attempt("the point of connection", "point-of-connection", () => checkPointOfConnection(design, site));
  attempt("the disconnects", "disconnects", () => [...checkPvSystemDisconnect(design, site), ...checkEquipmentDisconnects(design, site)]);
  attempt("rapid shutdown", "rapid-shutdown", () => [...checkRapidShutdown(design, site), ...checkRapidShutdownInitiator(design, site)]);
  attempt("the grounding electrode conductor", "gec", () => checkGroundingElectrodeConductor(design, site));
  attempt("system ratings", "ratings", () => [...checkModuleCount(design, site), ...checkDcToAcRatio(design, site)]);
  for (const plane of design.roofPlanes) {
    attempt(`roof plane ${plane.label}`, `roof:${plane.id}`, () => checkRoofLoad(design, site, plane));
  }

  if (hasStorage(design)) storageChecks(design, site, attempt);

  const summary = summarize(design, site, checks);
  const result: ReviewResult = {
    edition,
    checks,
    labels: labelsFor(design, site, summary),
    summary,
    figures: reviewFigures(design, site, checks),
  };
  if (hasStorage(design)) {
    result.figures.storage = storageFigures(design, site, checks);
    result.storage = storageSummary(design, site);
  }
  return result;
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
      s.connection === "load-side" && s.mainBreakerA !== null && s.loadSideAt !== "feeder"
        ? largestPvBreakerA(s.busbarA, s.mainBreakerA, s.pvBreakerAtOppositeEnd && !feedThroughLimitsToFullRating(s) ? "120%" : "100%")
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
  const rule =
    s.connection === "load-side"
      ? governingLoadSideRule(
          evaluateLoadSideRules(s, countedSourceCurrent(design, site.necEdition).currentA, { isDwelling: site.isDwelling }),
        )
      : null;
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
    hasDcRuns: design.runs.some(isDcRun),
    storage: hasStorage(design) ? (storageLabelFacts(design, site) ?? undefined) : undefined,
  });
}
