import { atMost, fmt, makeCheck } from "../check-result";
import { clause } from "../clauses";
import { DesignInputError, requirePositive, requireWholePositive } from "../errors";
import { TRADE_SIZES, allowedFillPercent, racewayAreaIn2, thhnAreaIn2 } from "../tables/conduit";
import { sizeLabel } from "../tables/conductor-sizes";
import type { CheckResult, ConductorRun, Raceway, Site } from "../types";

export interface RacewayFill {
  conductorCount: number;
  conductorAreaIn2: number;
  racewayAreaIn2: number;
  fillPercent: number;
  allowedPercent: number;
}

/** Chapter 9: wire areas (Table 5, or as entered) over the raceway's area (Table 4), against Table 1's limit for the count. */
export function racewayFill(raceway: Raceway): RacewayFill {
  let conductorCount = 0;
  let conductorAreaIn2 = 0;
  for (const wire of raceway.wires) {
    const count = requireWholePositive(wire.count, "raceway.wires.count", "The number of wires");
    // An entered area must be a real one: an infinite area would make the fill infinite too.
    if (wire.areaIn2 !== undefined) requirePositive(wire.areaIn2, "raceway.wires.areaIn2", `The area of the ${sizeLabel(wire.size)} wire`);
    const area = wire.areaIn2 ?? thhnAreaIn2(wire.size);
    if (area === null) {
      throw new DesignInputError("raceway.wires.areaIn2", `Enter the area of the ${sizeLabel(wire.size)} wire; our table holds THHN/THWN-2 areas up to 2 AWG only.`);
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

export function checkConduitFill(site: Site, run: ConductorRun): CheckResult[] {
  const raceway = run.raceway;
  if (!raceway) return [];
  const fill = racewayFill(raceway);
  const ok = atMost(fill.fillPercent, fill.allowedPercent);
  const bigger = ok
    ? undefined
    : TRADE_SIZES.find((tradeSize) => atMost(racewayFill({ ...raceway, tradeSize }).fillPercent, fill.allowedPercent));
  return [
    makeCheck({
      id: `conduit-fill:${run.id}`,
      title: `Run "${run.label}" conduit fill`,
      status: ok ? "pass" : "fail",
      value: fill.fillPercent,
      limit: fill.allowedPercent,
      unit: "%",
      clause: `${clause("conduitFill", site.necEdition)}, Tables 4 and 5`,
      edition: site.necEdition,
      message: `${fill.conductorCount} wires fill ${fmt(fill.fillPercent, 1)} % of the ${raceway.tradeSize} in ${raceway.type}; up to ${fill.allowedPercent} % is allowed for ${fill.conductorCount} wire${fill.conductorCount === 1 ? "" : "s"}.`,
      fix: ok ? undefined : bigger ? `Use ${bigger} in ${raceway.type}.` : "Split the wires between two raceways.",
    }),
  ];
}
