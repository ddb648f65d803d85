import { atLeast, atMost, fmt, makeCheck } from "../check-result";
import { type ClauseId, clause, clauseInEdition, clauses } from "../clauses";
import { totalInverterOutputA } from "../design-lookup";
import { type CountedSourceCurrent, countedSourceCurrent } from "../storage";
import type { CheckResult, Design, Site } from "../types";
import { checkAcCombiner } from "./ac-combiner";
import { checkFeederConnection } from "./feeder-connection";
import { checkSupplySideConductors } from "./supply-side";
import { type LoadSideOutcome, type LoadSideRule, evaluateLoadSideRules, largestMainBreakerA, largestPvBreakerA } from "./busbar-rules";
import { CONTINUOUS_MULTIPLIER } from "./conductor-ampacity";
import { requiredOcpdA } from "./ocpd";

const RULE_CLAUSE: Record<LoadSideRule, ClauseId> = { "100%": "loadSide100", "120%": "loadSide120", sum: "loadSideSum" };
const RULE_NAME: Record<LoadSideRule, string> = { "100%": "100 % rule", "120%": "120 % rule", sum: "sum-of-breakers rule" };

/** The load-side rule a design relies on: the first that passes, in the order the code lists them. */
export function governingLoadSideRule(outcomes: LoadSideOutcome[]): LoadSideOutcome | null {
  return outcomes.find((o) => o.passes) ?? null;
}

export function checkPointOfConnection(design: Design, site: Site): CheckResult[] {
  const s = design.service;
  const results = [pvBreakerSize(design, site)];
  if (s.connection === "supply-side") results.push(supplySide(design, site), ...checkSupplySideConductors(design, site));
  else {
    const at = s.loadSideAt ?? "busbar";
    if (at !== "feeder") results.push(loadSide(design, site));
    if (at !== "busbar") results.push(...checkFeederConnection(design, site));
  }
  results.push(...checkAcCombiner(design, site));
  return results;
}

/** The clause a load-side rule is cited by: a center-fed bus has its own 120 % item, and a bus with feed-through lugs cites that item too (2020 on). */
function ruleClause(rule: LoadSideRule, design: Design, site: Site): string {
  const s = design.service;
  const main = clause(rule === "120%" && s.panelFeed === "center" ? "centerFed" : RULE_CLAUSE[rule], site.necEdition);
  const feedThrough = s.loadSideAt === "feed-through" ? clauseInEdition("feedThrough", site.necEdition) : null;
  return feedThrough ? `${main}, ${feedThrough.replace(/^NEC \d+ /, "")}` : main;
}

function pvBreakerSize(design: Design, site: Site): CheckResult {
  const edition = site.necEdition;
  const outputA = totalInverterOutputA(design);
  const minimumA = CONTINUOUS_MULTIPLIER * outputA;
  const { pvBreakerA } = design.service;
  const ok = atLeast(pvBreakerA, minimumA);
  return makeCheck({
    id: "pv-breaker-size",
    title: "PV breaker size",
    status: ok ? "pass" : "fail",
    value: pvBreakerA,
    limit: minimumA,
    unit: "A",
    clause: clauses(edition, "acOcpd", "standardRatings"),
    edition,
    message: `The inverters put out ${fmt(outputA)} A continuous, so the PV breaker must be at least 1.25 × ${fmt(outputA)} A = ${fmt(minimumA)} A; the ${pvBreakerA} A breaker ${ok ? "is large enough" : "is too small"}.`,
    fix: ok ? undefined : `Use a ${requiredOcpdA(outputA)} A PV breaker.`,
  });
}

function loadSide(design: Design, site: Site): CheckResult {
  const edition = site.necEdition;
  const s = design.service;
  const counted = countedSourceCurrent(design, edition);
  const outputA = counted.currentA;
  const outcomes = evaluateLoadSideRules(s, outputA, { isDwelling: site.isDwelling });
  const governing = governingLoadSideRule(outcomes);
  const base = { id: "point-of-connection", title: "Connection to the panel busbar", unit: "A", edition };
  const source = sourceWords(counted);
  if (governing) {
    const breakerSumA = s.pvBreakerA + (s.mainBreakerA ?? 0);
    // Code arithmetic uses 125 % of inverter current; many AHJs add the breaker rating instead.
    const breakerOver = governing.rule === "120%" && !atMost(breakerSumA, governing.limitA);
    const where =
      governing.rule === "120%"
        ? s.panelFeed === "center"
          ? ", with the PV breaker at one end of the center-fed bus"
          : ", with the PV breaker at the far end of the bus from the main"
        : "";
    const sum =
      governing.rule === "sum"
        ? `its breakers other than the main total ${fmt(governing.valueA)} A`
        : `1.25 × ${fmt(outputA)} A ${source} plus the ${s.mainBreakerA} A main is ${fmt(governing.valueA)} A`;
    return makeCheck({
      ...base,
      status: breakerOver ? "warn" : "pass",
      value: governing.valueA,
      limit: governing.limitA,
      clause: withPowerControl(ruleClause(governing.rule, design, site), counted, edition),
      message: `The panel meets the ${RULE_NAME[governing.rule]}: ${sum}, within the ${fmt(governing.limitA)} A allowed on the ${s.busbarA} A busbar${where}.${breakerOver ? ` Counting the ${s.pvBreakerA} A breaker itself gives ${breakerSumA} A, which some AHJs will not accept.` : ""}`,
      fix: breakerOver ? pvBreakerFix(s.busbarA, s.mainBreakerA) : undefined,
    });
  }
  if (s.mainBreakerA === null) return mainLugOnly(outcomes, base, s.busbarA, edition);
  const shown = outcomes.find((o) => o.rule === "120%")!;
  const fixes = [pvBreakerFix(s.busbarA, s.mainBreakerA, requiredOcpdA(outputA)), mainFix(s.busbarA, s.mainBreakerA, s.pvBreakerA)];
  if (!s.pvBreakerAtOppositeEnd) {
    fixes.unshift(
      s.panelFeed === "center"
        ? "Move the PV breaker to one end of the center-fed bus to use the 120 % rule."
        : "Move the PV breaker to the end of the bus opposite the main to use the 120 % rule.",
    );
  }
  fixes.push("Or connect on the supply side of the main.");
  return makeCheck({
    ...base,
    status: "fail",
    value: shown.valueA,
    limit: shown.limitA,
    clause: withPowerControl(clauses(edition, "loadSide100", "loadSide120", "loadSideSum"), counted, edition),
    message: `The PV breaker does not fit this panel: 1.25 × ${fmt(outputA)} A ${source} plus the ${s.mainBreakerA} A main is ${fmt(shown.valueA)} A, above the ${fmt(shown.limitA)} A that 120 % of the ${s.busbarA} A busbar allows, and no other load-side rule is met.`,
    fix: fixes.filter(Boolean).join(" "),
  });
}

/** How a message names the current it counts: the inverters' output, or the power control system's setting. */
function sourceWords(counted: CountedSourceCurrent): string {
  return counted.by === "power-control-system" ? "(the power control system's setting)" : "of inverter current";
}

/** A result that counts a power control system's setting cites 705.13 beside the busbar rule. */
function withPowerControl(citation: string, counted: CountedSourceCurrent, edition: Site["necEdition"]): string {
  const pcs = counted.by === "power-control-system" ? clauseInEdition("powerControl", edition) : null;
  return pcs ? `${citation}, ${pcs.replace(/^NEC \d+ /, "")}` : citation;
}

/** A panel without a main breaker: only the sum rule can apply. */
function mainLugOnly(
  outcomes: LoadSideOutcome[],
  base: Pick<CheckResult, "id" | "title" | "unit" | "edition">,
  busbarA: number,
  edition: Site["necEdition"],
): CheckResult {
  const sum = outcomes.find((o) => o.rule === "sum")!;
  return makeCheck({
    ...base,
    status: sum.applies ? "fail" : "warn",
    value: sum.applies ? sum.valueA : null,
    limit: busbarA,
    clause: clause("loadSideSum", edition),
    message: sum.applies
      ? `This panel has no main breaker, so only the sum rule applies: its breakers total ${fmt(sum.valueA)} A, above the ${busbarA} A busbar.`
      : "This panel has no main breaker, so only the sum rule applies; enter the other breakers on the bus to check it.",
    fix: sum.applies ? "Remove or reduce breakers on the bus, or connect on the supply side." : "List every breaker on the bus.",
  });
}

function pvBreakerFix(busbarA: number, mainA: number | null, neededA?: number): string {
  if (mainA === null) return "";
  const largest = largestPvBreakerA(busbarA, mainA, "120%");
  if (largest === null) return `With a ${mainA} A main on a ${busbarA} A busbar no PV breaker fits under the 120 % rule.`;
  const enough = neededA === undefined || largest >= neededA;
  return `The largest PV breaker that fits under the 120 % rule is ${largest} A${enough ? "." : `, smaller than the ${neededA} A these inverters need.`}`;
}

function mainFix(busbarA: number, mainA: number | null, pvBreakerA: number): string {
  const main = largestMainBreakerA(busbarA, pvBreakerA, "120%");
  if (mainA === null || main === null || main >= mainA) return "";
  return `A ${main} A main breaker would make room for the ${pvBreakerA} A PV breaker, if the load calculation allows it.`;
}

/** 705.11 (2017: 705.12(A)): the PV source against the service rating. 2017 counts OCPD ratings; 2020 on, continuous output current (from memory). */
function supplySide(design: Design, site: Site): CheckResult {
  const edition = site.necEdition;
  const s = design.service;
  const serviceA = s.serviceConductorAmpacityA ?? s.mainBreakerA ?? s.busbarA;
  const valueA = edition === 2017 ? s.pvBreakerA : countedSourceCurrent(design, edition).currentA;
  const what = edition === 2017 ? `The ${s.pvBreakerA} A PV overcurrent device` : `The inverters' ${fmt(valueA)} A continuous output`;
  const ok = atMost(valueA, serviceA);
  return makeCheck({
    id: "point-of-connection",
    title: "Supply-side connection",
    status: ok ? "pass" : "fail",
    value: valueA,
    limit: serviceA,
    unit: "A",
    clause: clause("supplySide", edition),
    edition,
    message: `${what} is ${ok ? "within" : "above"} the ${serviceA} A service rating.`,
    fix: ok ? undefined : "Reduce the PV system's output or upgrade the service.",
  });
}
