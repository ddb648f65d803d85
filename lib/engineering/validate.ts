import { DesignInputError, requireFinite, requirePositive, requireWholePositive } from "./errors";
import { type ArrayDesign, type Design, NEC_EDITIONS, type Site } from "./types";

// Data-sheet names for the fields, so an error reads the way the entry form does.
const NAMES: Record<string, string> = {
  powerW: "rated power",
  vocV: "open-circuit voltage (Voc)",
  vmpV: "maximum-power voltage (Vmp)",
  iscA: "short-circuit current (Isc)",
  impA: "maximum-power current (Imp)",
  lengthIn: "length",
  widthIn: "width",
  weightLb: "weight",
  vocTempCoeff: "Voc temperature coefficient",
  vmpTempCoeff: "Vmp temperature coefficient",
  pmaxTempCoeffPctPerC: "Pmax temperature coefficient",
  acPowerW: "AC power rating",
  acOutputCurrentA: "continuous output current",
  acVoltageV: "AC voltage",
  maxDcInputV: "maximum DC input voltage",
  mpptMinV: "MPPT minimum voltage",
  mpptMaxV: "MPPT maximum voltage",
  maxInputIscA: "maximum input short-circuit current",
  regulatedStringV: "regulated string voltage",
  maxStringPowerW: "maximum power per string",
  maxOutputCurrentA: "maximum output current",
  shutdownOutputV: "voltage in shutdown",
  maxSystemVoltageV: "maximum system voltage",
};

/** Site data every check depends on; throws DesignInputError naming the field. */
export function validateSite(site: Site): void {
  if (!NEC_EDITIONS.includes(site.necEdition)) {
    throw new DesignInputError("site.necEdition", `NEC edition ${String(site.necEdition)} is not supported; choose 2017, 2020 or 2023.`);
  }
  requireFinite(site.recordLowTempC, "site.recordLowTempC", "The record low temperature");
  requireFinite(site.highDesignTempC, "site.highDesignTempC", "The high design temperature");
  if (site.recordLowTempC > site.highDesignTempC) {
    throw new DesignInputError(
      "site.recordLowTempC",
      "The record low temperature is above the high design temperature; check the two entries.",
    );
  }
  if (site.peakSunHours !== undefined) requirePositive(site.peakSunHours, "site.peakSunHours", "Peak sun hours");
}

/**
 * Design data that every check leans on (module, inverters, service, string lengths, module
 * counts). Faults
 * confined to one string, run or roof plane are left to that item's check, which reports them
 * as a failed result instead of stopping the whole review.
 */
export function validateDesign(design: Design): void {
  validateArrayDesign(design);
  for (const key of ["lengthIn", "widthIn", "weightLb"] as const) {
    requirePositive(design.module[key], `module.${key}`, `The module's ${NAMES[key]}`);
  }
  optionalPositive(design.attachmentRatedLoadLb, "attachmentRatedLoadLb", "The attachment rating");
  const hasStringInverter = design.inverters.some((i) => i.kind === "string");
  if (hasStringInverter && design.strings.length === 0) {
    throw new DesignInputError("strings", "The design has a string inverter but no strings.");
  }
  const s = design.service;
  requirePositive(s.busbarA, "service.busbarA", "The busbar rating");
  requirePositive(s.pvBreakerA, "service.pvBreakerA", "The PV breaker rating");
  requirePositive(s.voltageV, "service.voltageV", "The service voltage");
  if (s.mainBreakerA !== null) requirePositive(s.mainBreakerA, "service.mainBreakerA", "The main breaker rating");
  for (const b of s.otherBreakersA ?? []) requirePositive(b, "service.otherBreakersA", "Each breaker rating on the bus");
  optionalPositive(s.serviceConductorAmpacityA, "service.serviceConductorAmpacityA", "The service conductor ampacity");
  if (design.roofPlanes.length === 0)
    throw new DesignInputError("roofPlanes", "The design has no modules: add a roof plane with its module count.");
  // The plane counts add up to the system's size, so a blank or fractional one spoils every rating.
  for (const p of design.roofPlanes) {
    if (!Number.isInteger(p.moduleCount) || p.moduleCount < 0) {
      throw new DesignInputError(
        `roofPlanes.${p.id}.moduleCount`,
        `The number of modules on ${p.label} must be a whole number, zero or more.`,
      );
    }
  }
  const modules = design.roofPlanes.reduce((sum, p) => sum + p.moduleCount, 0);
  if (!(modules > 0)) throw new DesignInputError("roofPlanes", "The design has zero modules; enter the module count of each roof plane.");
  optionalPositive(design.pvDisconnect?.ratingA, "pvDisconnect.ratingA", "The PV system disconnect's ampere rating");
  optionalPositive(design.pvDisconnect?.voltageRatingV, "pvDisconnect.voltageRatingV", "The PV system disconnect's voltage rating");
  for (const key of ["ampacityA", "ocpdA", "loadSideOcpdA", "tapAmpacityA"] as const) {
    optionalPositive(s.feeder?.[key], `service.feeder.${key}`, "Each feeder figure");
  }
  const tapFt = s.supplySideConductors?.lengthToOcpdFt;
  if (tapFt !== undefined && !(Number.isFinite(tapFt) && tapFt >= 0)) {
    throw new DesignInputError("service.supplySideConductors.lengthToOcpdFt", "The length to the overcurrent device must be zero or more.");
  }
  optionalPositive(design.acCombiner?.busbarA, "acCombiner.busbarA", "The AC combiner's busbar rating");
  for (const b of design.acCombiner?.breakersA ?? []) requirePositive(b, "acCombiner.breakersA", "Each breaker in the AC combiner");
}

/** What the string checks lean on: the module's electrical figures, the inverters, the device and the string lengths. */
export function validateArrayDesign(design: ArrayDesign): void {
  const m = design.module;
  for (const key of ["powerW", "vocV", "vmpV", "iscA", "impA"] as const) {
    requirePositive(m[key], `module.${key}`, `The module's ${NAMES[key]}`);
  }
  for (const [key, value] of [
    ["vocTempCoeff", m.vocTempCoeff?.value],
    ["vmpTempCoeff", m.vmpTempCoeff?.value],
    ["pmaxTempCoeffPctPerC", m.pmaxTempCoeffPctPerC],
  ] as const) {
    if (value !== undefined) requireFinite(value, `module.${key}`, `The module's ${NAMES[key]}`);
  }
  optionalPositive(m.maxSeriesFuseA, "module.maxSeriesFuseA", "The module's maximum series fuse");
  optionalPositive(m.maxSystemVoltageV, "module.maxSystemVoltageV", "The module's maximum system voltage");
  if (m.vmpV > m.vocV || m.impA > m.iscA) {
    throw new DesignInputError("module", "The module's Vmp and Imp must not exceed its Voc and Isc; check the data sheet entries.");
  }
  if (design.inverters.length === 0) throw new DesignInputError("inverters", "The design has no inverter.");
  const ids = new Set<string>();
  for (const inv of design.inverters) {
    if (ids.has(inv.id)) throw new DesignInputError("inverters", `Two inverters share the id "${inv.id}".`);
    ids.add(inv.id);
    requireWholePositive(inv.quantity, `inverters.${inv.id}.quantity`, `The quantity of ${inv.model}`);
    for (const key of ["acPowerW", "acOutputCurrentA", "acVoltageV", "maxDcInputV"] as const) {
      requirePositive(inv[key], `inverters.${inv.id}.${key}`, `The ${inv.model}'s ${NAMES[key]}`);
    }
    for (const key of ["mpptMinV", "mpptMaxV", "maxInputIscA", "regulatedStringV", "maxStringPowerW"] as const) {
      optionalPositive(inv[key], `inverters.${inv.id}.${key}`, `The ${inv.model}'s ${NAMES[key]}`);
    }
  }
  const d = design.moduleLevelDevice;
  if (d) {
    requirePositive(d.maxInputV, "moduleLevelDevice.maxInputV", `The ${d.model}'s maximum input voltage`);
    for (const key of ["maxInputIscA", "maxOutputCurrentA", "shutdownOutputV", "maxSystemVoltageV"] as const) {
      optionalPositive(d[key], `moduleLevelDevice.${key}`, `The ${d.model}'s ${NAMES[key]}`);
    }
  }
  if (design.cellTempRiseC !== undefined) requireFinite(design.cellTempRiseC, "cellTempRiseC", "The cell temperature rise");
  // A string's length is not confined to its own check: the runs, voltage-drop paths, rapid
  // shutdown and module count all lean on it, and a zero or blank one turns them into NaN.
  for (const s of design.strings) {
    requireWholePositive(s.modulesInSeries, `strings.${s.id}.modulesInSeries`, `The number of modules in string ${s.id}`);
  }
}

function optionalPositive(value: number | undefined, field: string, what: string): void {
  if (value !== undefined) requirePositive(value, field, what);
}
