// Each inverter unit is activated with the key on its card, only once the
// card's serial matches the unit's (inverter-serial.ts).
import type { NecEdition } from "../types";
import { build } from "./reading";
import type { CommissioningCheck, InverterUnitReading } from "./types";

export const ACTIVATION_BASIS = "inverter maker's activation card";

export function checkActivation(unit: InverterUnitReading, edition: NecEdition): CommissioningCheck {
  const base = {
    id: `inverter-activation:${unit.id}`,
    title: `${unit.label} activated`,
    unit: "",
    clause: ACTIVATION_BASIS,
    edition,
    value: null,
    limit: null,
  };
  return unit.activated === true
    ? build("inverter-activation", "recorded", { ...base, status: "pass", message: `${unit.label} is activated.` })
    : build("inverter-activation", "missing", {
        ...base,
        status: "warn",
        message: "Not done yet: activate this unit with the key on its card once the serials match.",
      });
}
