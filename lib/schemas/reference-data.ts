import { z } from "zod";
import { INSPECTION_KINDS_BY_FILING } from "@/lib/domain/filings";
import { NEC_EDITIONS } from "@/lib/engineering/types";
import { numberField, optionalNumberField, optionalText, requiredText, safeString, toNumber, whenValid } from "./fields";

/**
 * The inspections an authority requires, from a group of check boxes (nothing ticked arrives as false) or a
 * list; left out, the usual ones.
 */
const requiredInspections = <K extends readonly [string, ...string[]]>(kinds: K, usual: K[number][]) =>
  z.preprocess(
    (v) => (v === undefined ? usual : v === false || v === null ? [] : typeof v === "string" ? [v] : v),
    z.array(z.enum(kinds, { error: "Choose from the inspections listed" })).transform((list) => [...new Set(list)]),
  );

/** An adopted ESS siting figure; blank stores null, meaning the published model-code figure. */
const essKwh = (label: string) => optionalNumberField(label, { min: 0, max: 1000, unit: "kWh" }).transform((v) => v ?? null);

/** Days an authority usually takes to answer; left out, the given default. */
const days = (label: string, range: { min: number; max: number }, usual: number) =>
  optionalNumberField(label, { ...range, unit: "days" }).transform((v) => v ?? usual);

export const JurisdictionInput = z
  .object({
    name: requiredText("authority's name", 160),
    state: safeString()
      .trim()
      .toUpperCase()
      .regex(/^[A-Z]{2}$/, "Use the two-letter state code"),
    necEdition: z.preprocess(
      toNumber,
      z.union(
        NEC_EDITIONS.map((e) => z.literal(e)),
        { error: `Choose the adopted NEC edition: ${NEC_EDITIONS.join(", ")}` },
      ),
    ),
    // ASHRAE extreme annual mean minimum design dry-bulb temperature of the nearest station.
    recordLowTempC: numberField("Record low", { min: -60, max: 20, unit: "°C" }),
    highDesignTempC: numberField("High design temperature", { min: 10, max: 60, unit: "°C" }),
    reviewDays: days("Usual review time", { min: 1, max: 365 }, 10),
    permitValidDays: days("Permit validity", { min: 30, max: 1095 }, 180),
    requiredInspections: requiredInspections(INSPECTION_KINDS_BY_FILING.permit, ["final"]),
    notes: optionalText(2000),
    // The residential ESS siting limits the AHJ adopted, where they differ from the published ones.
    essCode: optionalText(60).transform((v) => v || null),
    essPerUnitKwh: essKwh("Per-unit energy limit"),
    essGarageKwh: essKwh("Garage limit"),
    essOutdoorKwh: essKwh("Outdoor limit"),
    essUtilitySpaceKwh: essKwh("Utility space limit"),
  })
  .refine((j) => j.recordLowTempC < j.highDesignTempC, {
    path: ["highDesignTempC"],
    message: "The high design temperature must be above the record low",
    when: whenValid("recordLowTempC", "highDesignTempC"),
  });
export type JurisdictionInput = z.input<typeof JurisdictionInput>;
export type JurisdictionValues = z.output<typeof JurisdictionInput>;

// A form sends service voltages as one per line; the API as a list.
const serviceVoltages = z.preprocess(
  (v) => (typeof v === "string" ? v.split(/\r?\n/) : v),
  z
    .array(safeString({ error: "Each service voltage is text" }).trim().max(40, "Each service voltage is at most 40 characters"), {
      error: "List the service voltages",
    })
    .transform((list) => list.filter(Boolean))
    .pipe(z.array(safeString()).min(1, "Enter at least one service voltage").max(8, "At most 8 service voltages")),
);

// Each as the utility words it, e.g. "IEEE 1547-2018 Category B, utility's default settings"; a form sends one per line.
const acceptedGridProfiles = z.preprocess(
  (v) => (typeof v === "string" ? v.split(/\r?\n/) : (v ?? [])),
  z
    .array(safeString({ error: "Each grid profile is text" }).trim().max(300, "Each grid profile is at most 300 characters"), {
      error: "List the accepted grid profiles",
    })
    .transform((list) => [...new Set(list.filter(Boolean))])
    .pipe(z.array(safeString()).max(12, "At most 12 grid profiles")),
);

export const UtilityInput = z.object({
  name: requiredText("utility's name", 160),
  serviceVoltages,
  acceptedGridProfiles,
  reviewDays: days("Usual review time", { min: 1, max: 365 }, 15),
  requiredInspections: requiredInspections(INSPECTION_KINDS_BY_FILING.interconnection, []),
  notes: optionalText(2000),
});
export type UtilityInput = z.input<typeof UtilityInput>;
export type UtilityValues = z.output<typeof UtilityInput>;

export const UpdateJurisdictionInput = z.object({ jurisdictionId: safeString().uuid("Unknown jurisdiction") }).and(JurisdictionInput);
export const UpdateUtilityInput = z.object({ utilityId: safeString().uuid("Unknown utility") }).and(UtilityInput);
