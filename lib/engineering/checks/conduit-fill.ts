import { atMost, countAgrees, fmt, makeCheck, plural } from "../check-result";
import { clause } from "../clauses";
import { DesignInputError, requirePositive, requireWholePositive } from "../errors";
import { TRADE_SIZES, allowedFillPercent, racewayAreaIn2, table5AreaIn2 } from "../tables/conduit";
import { sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorRun, Design, RacewayType, RacewayWire, Site, TradeSize } from "../types";
import { circuitConductorCount } from "./circuit-current";

type FilledRaceway = { type: RacewayType; tradeSize: TradeSize; wires: RacewayWire[] };

// An EGC pulled into a raceway is usually green THWN-2 (common practice): where the circuit conductors'
// insulation is not in Table 5 (PV wire), the derived EGC is taken as THWN-2.
const DEFAULT_EGC_INSULATION = "THWN-2";

/**
 * The wires in a run's raceway: as listed, else the current-carrying conductors its circuits need (or the
 * entered count when higher) in the run's insulation, with the run's data-sheet area, plus its EGC.
 */
export function runRacewayWires(design: Design, run: ConductorRun): RacewayWire[] {
  if (run.raceway?.wires) return run.raceway.wires;
  const count = Math.max(run.currentCarryingConductors ?? 0, circuitConductorCount(design, run));
  const insulation = run.conductor.insulation;
  const wires: RacewayWire[] = [{ size: run.conductor.size, count, insulation, areaIn2: run.wireAreaIn2 }];
  if (run.egc) {
    const sameAsCircuit = run.egc.size === run.conductor.size && run.wireAreaIn2 !== undefined;
    const egcInsulation = table5AreaIn2(insulation, run.egc.size) !== null || sameAsCircuit ? insulation : DEFAULT_EGC_INSULATION;
    wires.push({ size: run.egc.size, count: 1, insulation: egcInsulation, areaIn2: sameAsCircuit ? run.wireAreaIn2 : undefined });
  }
  return wires;
}

export interface RacewayFill {
  conductorCount: number;
  conductorAreaIn2: number;
  racewayAreaIn2: number;
  fillPercent: number;
  allowedPercent: number;
}

/** A wire's area: as entered from its data sheet, else Chapter 9 Table 5 for its insulation, else null (not known). */
export function wireAreaIn2(wire: RacewayWire): number | null {
  if (wire.areaIn2 !== undefined)
    return requirePositive(wire.areaIn2, "raceway.wires.areaIn2", `The area of the ${sizeLabel(wire.size)} wire`);
  return table5AreaIn2(wire.insulation, wire.size);
}

/** The wires whose area neither the design nor Table 5 gives: the fill cannot be computed without them. */
export function wiresWithoutArea(raceway: FilledRaceway): RacewayWire[] {
  return raceway.wires.filter((w) => wireAreaIn2(w) === null);
}

/** Chapter 9: wire areas (Table 5 for the insulation, or as entered) over the raceway's area (Table 4), against Table 1's limit for the count. */
export function racewayFill(raceway: FilledRaceway): RacewayFill {
  let conductorCount = 0;
  let conductorAreaIn2 = 0;
  for (const wire of raceway.wires) {
    const count = requireWholePositive(wire.count, "raceway.wires.count", "The number of wires");
    const area = wireAreaIn2(wire);
    if (area === null) {
      throw new DesignInputError(
        "raceway.wires.areaIn2",
        `Enter the area of the ${sizeLabel(wire.size)} ${wire.insulation ?? "wire"} from its data sheet; Chapter 9 Table 5 does not list it.`,
      );
    }
    conductorCount += count;
    conductorAreaIn2 += count * area;
  }
  if (conductorCount === 0) throw new DesignInputError("raceway.wires", "A raceway needs at least one wire to check its fill.");
  const areaIn2 = racewayAreaIn2(raceway.type, raceway.tradeSize);
  return {
    conductorCount,
    conductorAreaIn2,
    racewayAreaIn2: areaIn2,
    fillPercent: (conductorAreaIn2 / areaIn2) * 100,
    allowedPercent: allowedFillPercent(conductorCount),
  };
}

export function checkConduitFill(design: Design, site: Site, run: ConductorRun): CheckResult[] {
  if (!run.raceway) return [];
  const raceway: FilledRaceway = { type: run.raceway.type, tradeSize: run.raceway.tradeSize, wires: runRacewayWires(design, run) };
  for (const wire of raceway.wires) requireWholePositive(wire.count, "raceway.wires.count", "The number of wires");
  const base = {
    id: `conduit-fill:${run.id}`,
    title: `Run "${run.label}" conduit fill`,
    unit: "%",
    clause: `${clause("conduitFill", site.necEdition)}, Tables 4 and 5`,
    edition: site.necEdition,
  };
  const unknown = wiresWithoutArea(raceway);
  if (unknown.length > 0) {
    // Never a guessed area: an insulation Table 5 does not list needs the maker's figure.
    const names = [...new Set(unknown.map((w) => `${sizeLabel(w.size)} ${w.insulation ?? "wire of unnamed insulation"}`))].join(" and ");
    return [
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        limit: null,
        message: `The fill of run "${run.label}" cannot be checked: Chapter 9 Table 5 does not list ${names}, and no wire area is entered.`,
        fix: "Enter the wire's cross-section area from its data sheet (π/4 × outside diameter²), or choose an insulation Table 5 lists.",
        field: `runs.${run.id}.wireAreaIn2`,
      }),
    ];
  }
  const fill = racewayFill(raceway);
  const ok = atMost(fill.fillPercent, fill.allowedPercent);
  const bigger = ok
    ? undefined
    : TRADE_SIZES.find((tradeSize) => atMost(racewayFill({ ...raceway, tradeSize }).fillPercent, fill.allowedPercent));
  return [
    makeCheck({
      ...base,
      status: ok ? "pass" : "fail",
      value: fill.fillPercent,
      limit: fill.allowedPercent,
      message: `${countAgrees(fill.conductorCount, "wire", "fills", "fill")} ${fmt(fill.fillPercent, 1)} % of the ${raceway.tradeSize} in ${raceway.type}; up to ${fill.allowedPercent} % is allowed for ${plural(fill.conductorCount, "wire")}.`,
      fix: ok ? undefined : bigger ? `Use ${bigger} in ${raceway.type}.` : "Split the wires between two raceways.",
    }),
  ];
}
