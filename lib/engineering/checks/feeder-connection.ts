import { atLeast, atMost, fmt, makeCheck } from "../check-result";
import { clause, clauseInEdition } from "../clauses";
import { totalInverterOutputA } from "../design-lookup";
import type { CheckResult, Design, Site } from "../types";
import { CONTINUOUS_MULTIPLIER } from "./conductor-ampacity";

// 240.21(B)(2): a feeder tap up to 25 ft needs at least one third of the feeding device's rating (from memory);
// 705.12 feeder taps are sized as if that device were the feeder's plus 125 % of the inverter current.
export const TAP_25_FT_FRACTION = 1 / 3;

/**
 * A load-side connection on a feeder, or on the feed-through conductors a busbar feeds (705.12, feeders
 * and taps; 2020 on, the feed-through item of the busbar rules). Away from the feeder's far end, the
 * feeder on the load side of the connection needs ampacity for its device plus 125 % of the inverter
 * current, or a device of its own no larger than its ampacity. Taps from it are sized from the same sum.
 */
export function checkFeederConnection(design: Design, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const s = design.service;
  const f = s.feeder;
  const feedThrough = s.loadSideAt === "feed-through";
  const what = feedThrough ? "feed-through conductors" : "feeder";
  const ref = feedThrough
    ? (clauseInEdition("feedThrough", edition) ?? clause("feederConnection", edition))
    : clause("feederConnection", edition);
  const base = {
    id: "feeder-connection",
    title: feedThrough ? "Feed-through conductors" : "Connection on a feeder",
    unit: "A",
    clause: ref,
    edition,
  };
  const sourceA = CONTINUOUS_MULTIPLIER * totalInverterOutputA(design);
  // A feed-through pair starts at the panel's main: that device protects it from the utility side.
  const ocpdA = f?.ocpdA ?? (feedThrough ? (s.mainBreakerA ?? undefined) : undefined);
  if (!f || f.ampacityA === undefined || ocpdA === undefined) {
    return [
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        limit: null,
        field: f?.ampacityA === undefined ? "service.feeder.ampacityA" : "service.feeder.ocpdA",
        message: `The ${what}' ampacity and the device protecting them must both be entered to check a connection on them.`,
        fix: `Enter the ${what}' ampacity and the rating of the device at their supply end.`,
      }),
    ];
  }
  const results: CheckResult[] = [];
  const neededA = ocpdA + sourceA;
  if (f.atOppositeEnd && !feedThrough) {
    results.push(
      makeCheck({
        ...base,
        status: "pass",
        value: null,
        limit: f.ampacityA,
        message: `The inverters connect at the end of the feeder away from its ${ocpdA} A device, so no part of the feeder carries both sources.`,
      }),
    );
  } else if (f.loadSideOcpdA !== undefined) {
    const ok = atMost(f.loadSideOcpdA, f.ampacityA);
    results.push(
      makeCheck({
        ...base,
        status: ok ? "pass" : "fail",
        value: f.loadSideOcpdA,
        limit: f.ampacityA,
        message: `A ${f.loadSideOcpdA} A device on the load side of the connection ${ok ? "protects" : "is too large to protect"} the ${fmt(f.ampacityA)} A ${what}.`,
        fix: ok ? undefined : `Use a device of at most ${fmt(f.ampacityA)} A there, or larger ${what}.`,
      }),
    );
  } else {
    const ok = atLeast(f.ampacityA, neededA);
    results.push(
      makeCheck({
        ...base,
        status: ok ? "pass" : "fail",
        value: f.ampacityA,
        limit: neededA,
        message: `The ${what} can carry ${fmt(f.ampacityA)} A; with the ${ocpdA} A device and 1.25 × ${fmt(totalInverterOutputA(design))} A of inverter current both feeding them they need ${fmt(neededA)} A.`,
        fix: ok
          ? undefined
          : `Use ${what} of at least ${fmt(neededA)} A, or add a device of at most ${fmt(f.ampacityA)} A on the load side of the connection.`,
      }),
    );
  }
  if (f.tapAmpacityA !== undefined) {
    const tapNeededA = neededA * TAP_25_FT_FRACTION;
    const ok = atLeast(f.tapAmpacityA, tapNeededA);
    results.push(
      makeCheck({
        id: "feeder-taps",
        title: "Taps from the feeder",
        status: ok ? "pass" : "fail",
        value: f.tapAmpacityA,
        limit: tapNeededA,
        unit: "A",
        clause: `${clause("tapConnection", edition)}, 240.21(B)`,
        edition,
        message: `Taps are sized as if protected by ${fmt(neededA)} A (the feeder's device plus 125 % of the inverter current): a tap up to 25 ft needs a third of that, ${fmt(tapNeededA)} A; the smallest tap carries ${fmt(f.tapAmpacityA)} A.`,
        fix: ok ? undefined : `Use tap conductors of at least ${fmt(tapNeededA)} A, or a 10 ft tap as 240.21(B)(1) allows.`,
      }),
    );
  }
  return results;
}
