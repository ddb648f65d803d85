import type { CommissioningReadings, CommissioningReadingsInput } from "@/lib/schemas/commissioning";

// The field record as the form holds it (every input a string) and back to readings.

/** The grid profile select's value for a profile typed by hand. */
export const OTHER_PROFILE = "__other__";

export type FormValues = {
  vocTemperature: { tempC: string; source: "module" | "ambient" };
  strings: {
    id: string;
    polarity: "" | "correct" | "reversed";
    vocV: string;
    insulationMohm: string;
    devicesFound: string;
    measuredV: string;
  }[];
  inverters: { id: string; serial: string; cardSerial: string; activated: boolean }[];
  gridProfileChoice: string;
  gridProfileOther: string;
  devicesFound: string;
  acVoltageV: string;
  modulesReporting: string;
  firstPowerW: string;
  firstPowerTime: string;
  rapidShutdown: { boundary: "outside" | "inside"; measuredV: string; seconds: string };
  storage: {
    stateOfChargePct: string;
    gridOpened: YesNo;
    panelCarried: YesNo;
    transferSeconds: string;
    pcsSettingA: string;
    exportLimitKw: string;
  };
};

/** A yes-or-no seen on site, as a radio group holds it. */
export type YesNo = "" | "yes" | "no";
const yesNo = (v: boolean | null): YesNo => (v === null ? "" : v ? "yes" : "no");
const fromYesNo = (v: YesNo): boolean | null => (v === "" ? null : v === "yes");

const text = (v: number | string | null) => (v === null ? "" : String(v));

export function toFormValues(r: CommissioningReadings, acceptedGridProfiles: readonly string[]): FormValues {
  const set = r.gridProfileSet ?? "";
  const listed = acceptedGridProfiles.includes(set);
  return {
    vocTemperature: { tempC: text(r.vocTemperature.tempC), source: r.vocTemperature.source },
    strings: r.strings.map((s) => ({
      id: s.id,
      polarity: s.polarity ?? "",
      vocV: text(s.vocV),
      insulationMohm: text(s.insulationMohm),
      devicesFound: text(s.devicesFound),
      measuredV: text(s.measuredV),
    })),
    inverters: r.inverters.map((u) => ({ id: u.id, serial: u.serial ?? "", cardSerial: u.cardSerial ?? "", activated: u.activated })),
    gridProfileChoice: set === "" ? "" : listed ? set : OTHER_PROFILE,
    gridProfileOther: set !== "" && !listed ? set : "",
    devicesFound: text(r.devicesFound),
    acVoltageV: text(r.acVoltageV),
    modulesReporting: text(r.modulesReporting),
    firstPowerW: text(r.firstPowerW),
    firstPowerTime: text(r.firstPowerTime),
    rapidShutdown: {
      boundary: r.rapidShutdown.boundary,
      measuredV: text(r.rapidShutdown.measuredV),
      seconds: text(r.rapidShutdown.seconds),
    },
    storage: {
      stateOfChargePct: text(r.storage.stateOfChargePct),
      gridOpened: yesNo(r.storage.gridOpened),
      panelCarried: yesNo(r.storage.panelCarried),
      transferSeconds: text(r.storage.transferSeconds),
      pcsSettingA: text(r.storage.pcsSettingA),
      exportLimitKw: text(r.storage.exportLimitKw),
    },
  };
}

/** What the form sends: the chosen profile or the typed one, a polarity not chosen as none. */
export function toReadingsInput(v: FormValues): CommissioningReadingsInput {
  const { gridProfileChoice, gridProfileOther, strings, storage, ...rest } = v;
  return {
    ...rest,
    storage: { ...storage, gridOpened: fromYesNo(storage.gridOpened), panelCarried: fromYesNo(storage.panelCarried) },
    strings: strings.map((s) => ({ ...s, polarity: s.polarity === "" ? null : s.polarity })),
    gridProfileSet: gridProfileChoice === OTHER_PROFILE ? gridProfileOther : gridProfileChoice,
  };
}
