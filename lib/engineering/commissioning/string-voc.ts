// A string's open-circuit voltage before it is connected, against the
// modules' data sheet Voc corrected to the temperature read on site. A
// string a module short (or long) reads about one module's Voc off.
import { atLeast, atMost, fmt, plural } from "../check-result";
import { clause } from "../clauses";
import { requirePositive, requireWholePositive } from "../errors";
import type { NecEdition, TempCoefficient } from "../types";
import { ENTER_AGAIN, build, unrecorded } from "./reading";
import type { CommissioningCheck, StringTestReading, VocTemperature } from "./types";

// Where the data sheet gives no coefficient: a typical crystalline silicon module (common
// practice: about −0.25 to −0.35 %/°C; REFERENCE.md's tables assume crystalline modules).
export const TYPICAL_VOC_COEFF: TempCoefficient = { value: -0.3, unit: "%/C" };
// A string's Voc within ±5 % of the temperature-corrected expectation is normal (common practice).
export const VOC_TOLERANCE_FRACTION = 0.05;
// In sun, modules run up to about 30 °C above the air around them (common practice), so an air
// temperature brackets the cells between it and 30 °C warmer.
export const AMBIENT_TO_CELL_MAX_RISE_C = 30;
export const VOC_TEMPERATURE_RANGE_C = { min: -40, max: 90 } as const;

/** Module Voc at a cell temperature, by the maker's coefficient: the 690.7(A)(1) arithmetic at any temperature. */
export function moduleVocAtV(vocStcV: number, coeff: TempCoefficient, cellTempC: number): number {
  const deltaC = cellTempC - 25;
  return coeff.unit === "%/C" ? vocStcV * (1 + (deltaC * coeff.value) / 100) : vocStcV + deltaC * coeff.value;
}

export interface VocWindow {
  expectedV: number;
  lowV: number;
  highV: number;
  /** The cell temperatures the window spans: one with a module temperature, a range with an air temperature. */
  cellC: { low: number; high: number };
}

/** The string Voc to expect at the temperature read, ±5 %; from an air temperature the cells may be up to 30 °C warmer. */
export function stringVocWindow(
  s: Pick<StringTestReading, "modulesInSeries" | "moduleVocV" | "vocTempCoeff">,
  t: { tempC: number; source: VocTemperature["source"] },
): VocWindow {
  const n = requireWholePositive(s.modulesInSeries, "strings", "The number of modules in series");
  const voc = requirePositive(s.moduleVocV, "strings", "The module's Voc");
  const coeff = s.vocTempCoeff ?? TYPICAL_VOC_COEFF;
  const cellC = { low: t.tempC, high: t.source === "ambient" ? t.tempC + AMBIENT_TO_CELL_MAX_RISE_C : t.tempC };
  const warmV = n * moduleVocAtV(voc, coeff, cellC.high);
  const coolV = n * moduleVocAtV(voc, coeff, cellC.low);
  return { expectedV: (warmV + coolV) / 2, lowV: warmV * (1 - VOC_TOLERANCE_FRACTION), highV: coolV * (1 + VOC_TOLERANCE_FRACTION), cellC };
}

export const VOC_BASIS = "module data sheet Voc, corrected as in";

export function checkStringVoc(s: StringTestReading, temperature: VocTemperature | undefined, edition: NecEdition): CommissioningCheck {
  const base = {
    id: `string-voc:${s.id}`,
    title: `String ${s.id} open-circuit voltage`,
    unit: "V",
    clause: `${VOC_BASIS} ${clause("maxVoltage", edition)}(1)`,
    edition,
  };
  const modules = plural(s.modulesInSeries, "module");
  const tempC = temperature?.tempC;
  const v = s.vocV;
  if (v !== null && v !== undefined && Number.isFinite(v) && v < 0) {
    return build("string-voc", "recorded", {
      ...base,
      status: "fail",
      value: v,
      limit: 0,
      message: `String ${s.id} read ${fmt(v)} V: a negative reading means the meter leads, or the string's conductors, are the wrong way round.`,
      fix: "Do not connect the string. Check which conductor is positive at both ends, correct the labels or the wiring, and measure again.",
    });
  }
  if (v === null || v === undefined || !Number.isFinite(v)) {
    const state = v === null || v === undefined ? "missing" : "invalid";
    return unrecorded("string-voc", state, base, {
      missing: `Not recorded yet: measure string ${s.id}'s open-circuit voltage (${modules}) before connecting it, with the temperature.`,
      invalid: `String ${s.id}'s Voc must be a number.`,
      fix: ENTER_AGAIN,
    });
  }
  if (
    tempC === null ||
    tempC === undefined ||
    !Number.isFinite(tempC) ||
    tempC < VOC_TEMPERATURE_RANGE_C.min ||
    tempC > VOC_TEMPERATURE_RANGE_C.max
  ) {
    const missing = tempC === null || tempC === undefined;
    return build("string-voc", missing ? "missing" : "invalid", {
      ...base,
      status: missing ? "warn" : "fail",
      value: v,
      limit: null,
      message: missing
        ? `String ${s.id} read ${fmt(v)} V; record the module or air temperature at the time so it can be compared with the data sheet.`
        : `The temperature ${fmt(tempC)} °C is outside ${VOC_TEMPERATURE_RANGE_C.min} to ${VOC_TEMPERATURE_RANGE_C.max} °C; check it was entered in °C.`,
      fix: missing ? undefined : "Enter the temperature in °C.",
    });
  }
  const w = stringVocWindow(s, { tempC, source: temperature!.source });
  const at =
    temperature!.source === "ambient"
      ? `cells at ${fmt(w.cellC.low)}–${fmt(w.cellC.high)} °C (air ${fmt(tempC)} °C)`
      : `a module at ${fmt(tempC)} °C`;
  const windowText = `${fmt(w.lowV, 1)}–${fmt(w.highV, 1)} V`;
  const ok = atLeast(v, w.lowV) && atMost(v, w.highV);
  const moduleAt = moduleVocAtV(s.moduleVocV, s.vocTempCoeff ?? TYPICAL_VOC_COEFF, (w.cellC.low + w.cellC.high) / 2);
  const offBy = Math.round((v - w.expectedV) / moduleAt);
  return build("string-voc", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    value: v,
    limit: ok ? null : v < w.lowV ? w.lowV : w.highV,
    message: ok
      ? `String ${s.id} read ${fmt(v)} V, as expected for ${modules} with ${at} (${windowText}).`
      : `String ${s.id} read ${fmt(v)} V; ${modules} with ${at} should read ${windowText}${offBy !== 0 ? `, so the string may have ${Math.abs(offBy)} module${Math.abs(offBy) === 1 ? "" : "s"} ${offBy < 0 ? "fewer" : "more"} than the design` : ""}.`,
    fix: ok
      ? undefined
      : "Do not connect the string. Count its modules against the design, look for a connector not fully mated or a module wired backwards, read the temperature on the back of a module in full sun, and measure again.",
  });
}
