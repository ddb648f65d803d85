// Every commissioning check of a field record, run in the order the crew
// works; each check lives in its own file beside this one.
import { checkAcVoltage } from "./ac-voltage";
import { checkDevicePairing } from "./device-pairing";
import { checkFirstPower } from "./first-power";
import { checkGridProfile } from "./grid-profile";
import { checkInsulation } from "./insulation-resistance";
import { checkActivation } from "./inverter-activation";
import { checkInverterSerial } from "./inverter-serial";
import { checkModulesReporting } from "./modules-reporting";
import { checkRapidShutdownTest } from "./rapid-shutdown-test";
import { checkShutdownString } from "./shutdown-string";
import { checkPolarity } from "./string-polarity";
import { checkStorageCommissioning } from "./storage-tests";
import { checkStringVoc } from "./string-voc";
import type { CommissioningCheck, CommissioningRecord } from "./types";

/**
 * Every check of a record, in the order the crew works: the strings tested before anything is
 * energized, then at the inverter its serial against the activation card, activation, the grid
 * profile, the devices found, the strings with the array shut down; then the AC side, first power,
 * modules reporting (with module-level monitoring only) and the rapid shutdown test; last, with
 * batteries, their charge, the backup test and the settings read from the inverter.
 */
export function checkCommissioning(record: CommissioningRecord): CommissioningCheck[] {
  const { edition } = record;
  return [
    ...(record.stringTests ?? []).flatMap((s) => [
      checkPolarity(s, edition),
      ...(s.vocApplies ? [checkStringVoc(s, record.vocTemperature, edition)] : []),
      checkInsulation(s, edition),
    ]),
    ...(record.inverters ?? []).flatMap((unit) => [checkInverterSerial(unit, edition), checkActivation(unit, edition)]),
    checkGridProfile(record),
    ...(record.pairing ? checkDevicePairing(record.pairing, edition) : []),
    ...record.strings.map((s) => checkShutdownString(s, edition)),
    checkAcVoltage(record),
    checkFirstPower(record),
    ...(record.moduleMonitoring ? [checkModulesReporting(record)] : []),
    ...checkRapidShutdownTest(record.rapidShutdownTest, edition),
    ...(record.storage ? checkStorageCommissioning(record.storage, edition) : []),
  ];
}
