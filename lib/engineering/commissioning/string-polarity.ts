// Each string's polarity at the inverter end, checked before it is landed:
// a reversed string can damage the inverter or the other strings on its input.
import type { NecEdition } from "../types";
import { build } from "./reading";
import type { CommissioningCheck, StringTestReading } from "./types";

export const POLARITY_BASIS = "inverter input marking (+ to +, − to −)";

export function checkPolarity(s: StringTestReading, edition: NecEdition): CommissioningCheck {
  const base = {
    id: `string-polarity:${s.id}`,
    title: `String ${s.id} polarity`,
    unit: "",
    clause: POLARITY_BASIS,
    edition,
    value: null,
    limit: null,
  };
  if (!s.polarity) {
    return build("string-polarity", "missing", {
      ...base,
      status: "warn",
      message: `Not recorded yet: confirm string ${s.id}'s positive conductor lands on a positive input.`,
    });
  }
  const ok = s.polarity === "correct";
  return build("string-polarity", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    message: ok
      ? `String ${s.id}'s polarity matches the inverter's input marking.`
      : `String ${s.id} is reversed: its positive conductor is marked or landed as negative.`,
    fix: ok ? undefined : "Do not close the DC disconnect. Correct the conductor labels or the landing, then check the polarity again.",
  });
}
