// Module-level devices that report to the inverter (or microinverters to
// their gateway) must all be found before commissioning goes on. Devices
// join over several minutes, so fewer found than installed means wait or
// scan again: not a fault yet, but not a pass either. More found than
// installed means the inverter has picked up devices that are not this
// system's.
import { plural } from "../check-result";
import { requireWholePositive } from "../errors";
import type { NecEdition } from "../types";
import { build, countState, unrecorded } from "./reading";
import type { CommissioningCheck, DevicePairingReading } from "./types";

export const PAIRING_BASIS = "the design's device count";

function pairingCheck(
  id: string,
  title: string,
  what: string,
  word: string,
  installed: number,
  found: number | null | undefined,
  edition: NecEdition,
): CommissioningCheck {
  requireWholePositive(installed, "pairing", `The number of ${word} installed`);
  const base = { id, title, unit: word, clause: PAIRING_BASIS, edition };
  const state = countState(found);
  if (state !== "recorded") {
    return unrecorded("device-pairing", state, base, {
      missing: `Not recorded yet: how many of the ${installed} ${word} ${what} the inverter found.`,
      invalid: `The count of ${word} found must be a whole number of zero or more.`,
      fix: "Enter the count the inverter or its app shows.",
      limit: installed,
    });
  }
  const n = found as number;
  const said = `${n} of ${installed} ${word} ${what} found`;
  if (n === installed)
    return build("device-pairing", "recorded", {
      ...base,
      status: "pass",
      value: n,
      limit: installed,
      message: `All ${installed} ${word} ${what} found.`,
    });
  if (n > installed) {
    return build("device-pairing", "recorded", {
      ...base,
      status: "fail",
      value: n,
      limit: installed,
      message: `${said}: more than are installed. The inverter may have found devices of another system nearby, or the design's count is wrong.`,
      fix: `Remove the devices that are not this system's from the inverter's list (compare their serials with the site map) and scan again.`,
    });
  }
  return build(
    "device-pairing",
    "recorded",
    {
      ...base,
      status: "warn",
      value: n,
      limit: installed,
      message: `${said}: ${plural(installed - n, "device")} not found yet. Not a pass: wait a few minutes and read the count again, or scan again.`,
      fix: "If the count does not rise, check the missing devices' connectors and that the array is in sun, then scan again.",
    },
    { waiting: true },
  );
}

/** Found against installed for the whole system, then for each string whose count the inverter shows. */
export function checkDevicePairing(p: DevicePairingReading, edition: NecEdition): CommissioningCheck[] {
  const whole = pairingCheck("device-pairing", `Module-level ${p.word} found`, "in the system", p.word, p.installed, p.found, edition);
  const perString = p.strings
    // Per string only where the inverter shows it: a count not entered is not asked for.
    .filter((s) => s.found !== null && s.found !== undefined)
    .map((s) =>
      pairingCheck(`device-pairing:${s.id}`, `String ${s.id}: ${p.word} found`, `on string ${s.id}`, p.word, s.installed, s.found, edition),
    );
  return [whole, ...perString];
}
