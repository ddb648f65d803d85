import { z } from "zod";
import { safeString } from "./fields";

/**
 * A meter reading as typed on a phone: empty means "not taken yet" (null), anything else must be a
 * number. Negative or implausible numbers pass through so the checks can flag them with a reason
 * (a negative Voc is a reversed string; a temperature may be below zero).
 */
const reading = z
  .union([z.number(), safeString(), z.null()])
  .optional()
  .transform((value, ctx): number | null => {
    if (value === null || value === undefined) return null;
    const text = String(value).trim().replace(/,/g, "");
    if (text === "") return null;
    const number = Number(text);
    if (!Number.isFinite(number)) {
      ctx.addIssue({ code: "custom", message: "Enter the reading as a number, for example 241.5" });
      return z.NEVER;
    }
    return number;
  });

const wholeReading = reading.refine((v) => v === null || Number.isInteger(v), "Enter a whole number");

export const BOUNDARIES = ["outside", "inside"] as const;
export const POLARITIES = ["correct", "reversed"] as const;
export const TEMPERATURE_SOURCES = ["module", "ambient"] as const;

/** Typed or scanned text: trimmed, empty means not recorded (null). */
const text = (max: number) =>
  safeString()
    .trim()
    .max(max, `At most ${max} characters`)
    .nullish()
    .transform((v) => (v ? v : null));

/** One string's readings: the tests before energizing, the devices the inverter found on it, its voltage with the array shut down. */
const StringReadings = z.object({
  id: safeString().trim().min(1).max(80),
  polarity: z
    .enum(POLARITIES, { error: "Choose correct or reversed" })
    .nullish()
    .transform((v) => v ?? null),
  vocV: reading,
  insulationMohm: reading,
  devicesFound: wholeReading,
  measuredV: reading,
});

/** One inverter unit: the serial on its label, the serial on its activation card, activation done. */
const InverterReadings = z.object({
  id: safeString().trim().min(1).max(80),
  serial: text(80),
  cardSerial: text(80),
  activated: z.boolean().default(false),
});

/** A yes or no seen on site; not answered yet is null. */
const seen = z
  .boolean()
  .nullish()
  .transform((v) => v ?? null);

/** With batteries: the charge the system shows, the backup test, and the settings read back from the inverter. */
const StorageReadings = z.object({
  stateOfChargePct: reading,
  gridOpened: seen,
  panelCarried: seen,
  transferSeconds: reading,
  pcsSettingA: reading,
  exportLimitKw: reading,
});
export const EMPTY_STORAGE_READINGS = {
  stateOfChargePct: null,
  gridOpened: null,
  panelCarried: null,
  transferSeconds: null,
  pcsSettingA: null,
  exportLimitKw: null,
} as const;

/** What the installer records on site, in the order of the work; the facts they are checked against come from the design. */
export const CommissioningReadings = z.object({
  vocTemperature: z
    .object({ tempC: reading, source: z.enum(TEMPERATURE_SOURCES, { error: "Choose where the temperature was read" }).default("module") })
    .default({ tempC: null, source: "module" }),
  strings: z.array(StringReadings).max(200, "At most 200 strings").default([]),
  inverters: z.array(InverterReadings).max(50, "At most 50 inverters").default([]),
  gridProfileSet: text(300),
  devicesFound: wholeReading,
  acVoltageV: reading,
  modulesReporting: wholeReading,
  firstPowerW: reading,
  firstPowerTime: safeString()
    .trim()
    .nullish()
    .transform((v) => (v ? v : null))
    .refine((v) => v === null || /^([01]?\d|2[0-3]):[0-5]\d$/.test(v), "Enter the time as HH:MM, 24-hour"),
  rapidShutdown: z
    .object({
      boundary: z.enum(BOUNDARIES, { error: "Choose where the test was read" }).default("outside"),
      measuredV: reading,
      seconds: reading,
    })
    .default({ boundary: "outside", measuredV: null, seconds: null }),
  storage: StorageReadings.default(EMPTY_STORAGE_READINGS),
});
export type CommissioningReadingsInput = z.input<typeof CommissioningReadings>;
export type CommissioningReadings = z.output<typeof CommissioningReadings>;

export const SaveCommissioningInput = z.object({
  projectId: safeString().uuid("Unknown project"),
  readings: CommissioningReadings,
  /** Ask to mark the record complete; refused (and the readings still saved) while anything fails or is missing. */
  complete: z.boolean().default(false),
});
export type SaveCommissioningInput = z.input<typeof SaveCommissioningInput>;
