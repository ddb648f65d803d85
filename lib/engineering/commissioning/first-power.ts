// The first power reading once the system exports, with the time it was
// read: more than the system can make is a misread meter, nothing at all is a
// system not connected, and very little at midday is worth a look.
import { atMost, fmt } from "../check-result";
import { requirePositive } from "../errors";
import { build } from "./reading";
import type { CommissioningCheck, CommissioningRecord, ReadingState } from "./types";

// First power: at most 5 % over the AC rating (meter error); below 10 % of it at midday warns (common practice).
export const FIRST_POWER_MAX_FRACTION = 1.05;
export const MIDDAY_LOW_FRACTION = 0.1;
export const MIDDAY_START_MINUTES = 10 * 60;
export const MIDDAY_END_MINUTES = 14 * 60;

/** Minutes after midnight for "HH:MM" (24-hour), or null if it is not a time of day. */
export function parseTimeOfDay(text: string): number | null {
  const m = /^([01]?\d|2[0-3]):([0-5]\d)$/.exec(text.trim());
  return m ? Number(m[1]) * 60 + Number(m[2]) : null;
}

/** First power against the AC rating: above zero, at most 1.05 × the rating; very low at midday warns (common practice). */
export function checkFirstPower(
  record: Pick<CommissioningRecord, "edition" | "acRatingW" | "firstPowerW" | "firstPowerTime">,
): CommissioningCheck {
  const ratingW = requirePositive(record.acRatingW, "acRatingW", "The system's AC rating");
  const maxW = FIRST_POWER_MAX_FRACTION * ratingW;
  const base = {
    id: "first-power",
    title: "First power reading",
    unit: "W",
    clause: `the system's AC rating (${fmt(ratingW)} W)`,
    edition: record.edition,
  };
  const w = record.firstPowerW;
  const time = record.firstPowerTime?.trim() ?? "";
  const powerState: ReadingState = w === null || w === undefined ? "missing" : Number.isFinite(w) ? "recorded" : "invalid";
  const minutes = time === "" ? null : parseTimeOfDay(time);
  const timeState: ReadingState = time === "" ? "missing" : minutes === null ? "invalid" : "recorded";
  if (powerState === "invalid" || timeState === "invalid") {
    return build("first-power", "invalid", {
      ...base,
      status: "fail",
      value: null,
      limit: maxW,
      message:
        powerState === "invalid"
          ? "The first power reading must be a number of watts."
          : `"${time}" is not a time of day; use HH:MM, 24-hour.`,
      fix: "Enter the power in watts and the time as HH:MM.",
    });
  }
  if (powerState === "missing" || timeState === "missing") {
    return build("first-power", "missing", {
      ...base,
      status: "warn",
      value: powerState === "recorded" ? (w as number) : null,
      limit: maxW,
      message: `Not recorded yet: enter the first power reading in watts and the time of day it was read.`,
    });
  }
  const watts = w as number;
  const at = `${fmt(watts)} W at ${time}`;
  if (!(watts > 0) || !atMost(watts, maxW)) {
    const tooHigh = watts > 0;
    return build("first-power", "recorded", {
      ...base,
      status: "fail",
      value: watts,
      limit: tooHigh ? maxW : 0,
      message: tooHigh
        ? `${at} is more than the system can make (${fmt(maxW)} W, 1.05 × its ${fmt(ratingW)} W rating).`
        : `${at}: the system is not sending power to the grid.`,
      fix: tooHigh
        ? "Check the reading is in watts, not kilowatts, and that it is this system's meter."
        : "Check the AC disconnect and the PV breaker are on and the inverter has finished its start-up wait, then read again.",
    });
  }
  const midday = (minutes as number) >= MIDDAY_START_MINUTES && (minutes as number) <= MIDDAY_END_MINUTES;
  const low = midday && watts < MIDDAY_LOW_FRACTION * ratingW;
  return build("first-power", "recorded", {
    ...base,
    status: low ? "warn" : "pass",
    value: watts,
    limit: low ? MIDDAY_LOW_FRACTION * ratingW : maxW,
    message: low ? `${at} is under 10 % of the ${fmt(ratingW)} W rating at midday.` : `${at} is plausible for a ${fmt(ratingW)} W system.`,
    fix: low ? "If the sky is clear, check for strings not producing, shading or a setting that limits output." : undefined,
  });
}
