import { atLeast, atMost, fmt, makeCheck, plural } from "../check-result";
import { clauses } from "../clauses";
import { isDcRun, runStrings } from "../design-lookup";
import { requirePositive } from "../errors";
import { tableAmpacityA } from "../tables/ampacity";
import { CONDUCTOR_SIZES, type ConductorSize, sizeIndex, sizeLabel } from "../tables/conductor-sizes";
import { isStandardRatingA, nextStandardRatingA } from "../tables/standard-ocpd-ratings";
import type { CheckResult, ConductorRun, Design, NecEdition, Site } from "../types";
import { runCircuits, stringMaxCurrentA, stringsOnSameInput } from "./circuit-current";
import { CONTINUOUS_MULTIPLIER, type ConductorEvaluation, evaluateRun } from "./conductor-ampacity";
import { maxProtectiveOcpdA } from "./conductor-protection";

/** 690.9(B) / 705.30(B): at least 125 % of the maximum current, rounded up to a 240.6(A) standard rating of the edition. */
export function requiredOcpdA(maxCurrentA: number, options: { fuse?: boolean; edition?: NecEdition } = {}): number {
  return nextStandardRatingA(CONTINUOUS_MULTIPLIER * maxCurrentA, options);
}

export function checkOcpd(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  const { evaluation } = evaluateRun(design, site, run);
  if (isDcRun(run) && run.ocpdA === undefined) return [dcWithoutOcpd(design, site, run, evaluation)];
  const results: CheckResult[] = [];
  // AC runs without their own device are protected by the PV breaker, whose rating the point-of-connection check covers.
  const ocpdA = requirePositive(run.ocpdA ?? design.service.pvBreakerA, `runs.${run.id}.ocpdA`, "The overcurrent device rating");
  if (run.ocpdA !== undefined) results.push(ratingCheck(site, run, evaluation, ocpdA));
  results.push(protectionCheck(design, site, run, evaluation, ocpdA));
  return results;
}

function ratingCheck(site: Site, run: ConductorRun, e: ConductorEvaluation, ocpdA: number): CheckResult {
  const edition = site.necEdition;
  const fuse = run.ocpdIsFuse ?? false;
  const minimumA = CONTINUOUS_MULTIPLIER * e.maxCurrentA;
  const bigEnough = atLeast(ocpdA, minimumA);
  const standard = isStandardRatingA(ocpdA, { fuse, edition });
  const device = fuse ? "fuse" : "breaker";
  const message = `The ${ocpdA} A ${device} on run "${run.label}" must be at least 1.25 × ${fmt(e.maxCurrentA)} A = ${fmt(minimumA)} A; ${bigEnough ? "it is" : "it is not"}${standard ? "" : `, and ${ocpdA} A is not a standard rating`}.`;
  return makeCheck({
    id: `ocpd-rating:${run.id}`,
    title: `Run "${run.label}" ${device} size`,
    status: !bigEnough ? "fail" : standard ? "pass" : "warn",
    value: ocpdA,
    limit: minimumA,
    unit: "A",
    clause: clauses(edition, isDcRun(run) ? "dcOcpd" : "acOcpd", "standardRatings"),
    edition,
    message,
    fix:
      bigEnough && standard
        ? undefined
        : `Use a ${requiredOcpdA(e.maxCurrentA, { fuse, edition })} A ${device} (the next standard rating).`,
  });
}

function protectionCheck(design: Design, site: Site, run: ConductorRun, e: ConductorEvaluation, ocpdA: number): CheckResult {
  const edition = site.necEdition;
  const { size, material } = run.conductor;
  let allowedA = maxProtectiveOcpdA(e.usableAmpacityA, size, material, edition);
  const seriesFuseA = design.module.maxSeriesFuseA;
  // Source circuits (one string per circuit) are also limited by the module's series fuse rating.
  const sourceCircuit = isDcRun(run) && runCircuits(design, run).every((c) => c.strings.length === 1);
  const moduleLimits = sourceCircuit && seriesFuseA !== undefined && seriesFuseA < allowedA;
  if (moduleLimits) allowedA = seriesFuseA;
  const ok = atMost(ocpdA, allowedA);
  const bigger = ok ? null : conductorProtectedBy(run, e, ocpdA, site);
  const reason = moduleLimits
    ? `the module's ${seriesFuseA} A maximum series fuse`
    : `${sizeLabel(size)} with ${fmt(e.usableAmpacityA)} A usable ampacity`;
  return makeCheck({
    id: `ocpd-protects:${run.id}`,
    title: `Run "${run.label}" protected by its overcurrent device`,
    status: ok ? "pass" : "fail",
    value: ocpdA,
    limit: allowedA,
    unit: "A",
    clause: clauses(edition, "conductorProtection", "smallConductors"),
    edition,
    message: `A ${ocpdA} A device ${ok ? "protects" : "is too large to protect"} run "${run.label}": ${reason} allows at most ${allowedA} A.`,
    fix: ok ? undefined : `Use a device of at most ${allowedA} A${bigger && !moduleLimits ? `, or ${sizeLabel(bigger)} conductors` : ""}.`,
  });
}

/** The smallest conductor, same material and insulation, that a given device protects. */
function conductorProtectedBy(run: ConductorRun, e: ConductorEvaluation, ocpdA: number, site: Site): ConductorSize | null {
  const { material, insulationTempC } = run.conductor;
  const derate = e.correctedAmpacityA / tableAmpacityA(run.conductor.size, material, insulationTempC, site.necEdition);
  for (const size of CONDUCTOR_SIZES.slice(sizeIndex(run.conductor.size) + 1)) {
    const usable = Math.min(
      tableAmpacityA(size, material, insulationTempC, site.necEdition) * derate,
      tableAmpacityA(size, material, e.terminalColumnC, site.necEdition),
    );
    if (atMost(ocpdA, maxProtectiveOcpdA(usable, size, material))) return size;
  }
  return null;
}

/**
 * 690.9(A): string conductors need no fuse when no parallel source can push more current than they
 * and the modules withstand. Strings are in parallel where they join at one inverter input, whether
 * or not they share a raceway, so the count is taken per input.
 */
function dcWithoutOcpd(design: Design, site: Site, run: ConductorRun, e: ConductorEvaluation): CheckResult {
  const edition = site.necEdition;
  const parallel = Math.max(...runStrings(design, run).map((s) => stringsOnSameInput(design, s)));
  const perStringA = stringMaxCurrentA(design);
  const backfeedA = (parallel - 1) * perStringA;
  const seriesFuseA = design.module.maxSeriesFuseA;
  const limitA = parallel === 1 ? null : Math.min(seriesFuseA ?? 0, e.usableAmpacityA);
  const ok = limitA === null || (seriesFuseA !== undefined && atMost(backfeedA, limitA));
  const fuseA = nextStandardRatingA(CONTINUOUS_MULTIPLIER * perStringA, { fuse: true, edition });
  const missingRating = parallel > 1 && seriesFuseA === undefined;
  return makeCheck({
    id: `ocpd-rating:${run.id}`,
    title: `Run "${run.label}" string fusing`,
    status: ok ? "pass" : missingRating ? "warn" : "fail",
    // With one string on its input there is no fault current from elsewhere to state.
    value: parallel === 1 ? null : backfeedA,
    limit: limitA,
    unit: "A",
    clause: clauses(edition, "dcOcpdNotRequired"),
    edition,
    message:
      parallel === 1
        ? `Each string on run "${run.label}" is alone on its inverter input; no other string can feed a fault into it, so it needs no fuse.`
        : missingRating
          ? `${plural(parallel, "string")} join in parallel at one inverter input; without the module's maximum series fuse rating we cannot tell whether fuses are needed.`
          : `With ${plural(parallel, "string")} in parallel at one inverter input, a fault can draw ${fmt(backfeedA)} A from the other strings; the modules and conductors withstand ${fmt(limitA ?? 0)} A${ok ? ", so no fuse is needed" : ""}.`,
    fix: ok
      ? undefined
      : missingRating
        ? "Enter the module's maximum series fuse rating from its data sheet."
        : `Fuse each string at ${fuseA} A.`,
    field: missingRating ? "module.maxSeriesFuseA" : undefined,
  });
}
