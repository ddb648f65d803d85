// The design review engine: pure functions over plain data, no I/O.
export * from "./types";
export { DesignInputError } from "./errors";
export { CLAUSES, EDITION_ONLY_CLAUSES, NON_CODE_BASES, type ClauseId, type EditionOnlyClauseId, clause, clauseInEdition, clauses } from "./clauses";
export { reviewDesign, type ReviewResult, type ReviewSummary } from "./review";
export { validateDesign, validateSite } from "./validate";
export { requiredLabels, type LabelFacts, type WarningLabel } from "./labels";

export { DWELLING_MAX_V, OTHER_BUILDING_MAX_V, coldModuleVoc, stringVoltageLimit, checkStringVoltage, type ColdVoc } from "./checks/string-voltage";
export { checkModuleLevelInputs } from "./checks/module-level-inputs";
export { CELL_TEMP_RISE_C, cellTempC, hotModuleVmpV, checkMpptWindow, checkMicroMpptWindow } from "./checks/mppt-window";
export { stringMaxCurrentA, runMaxCurrentA, checkInverterInputCurrent } from "./checks/circuit-current";
export { rooftopAdderC, conditionsOfUse, type ConditionsOfUse } from "./checks/conditions-of-use";
export { evaluateConductor, smallestPassingSize, checkConductorAmpacity, type ConductorEvaluation } from "./checks/conductor-ampacity";
export { maxProtectiveOcpdA } from "./checks/conductor-protection";
export { requiredOcpdA, checkOcpd } from "./checks/ocpd";
export { requiredEgcSize, checkEgc } from "./checks/egc";
export { evaluateLoadSideRules, largestPvBreakerA, largestMainBreakerA, type LoadSideRule, type LoadSideOutcome } from "./checks/busbar-rules";
export { checkPointOfConnection } from "./checks/point-of-connection";
export {
  VOLTAGE_DROP_WARN_PERCENT,
  VOLTAGE_DROP_FAIL_PERCENT,
  voltageDropV,
  voltageDropStatus,
  runVoltageDrop,
  checkRunVoltageDrop,
  checkPathVoltageDrop,
} from "./checks/voltage-drop";
export { racewayFill, checkConduitFill, type RacewayFill } from "./checks/conduit-fill";
export {
  DEFAULT_SHUTDOWN_V_PER_DEVICE,
  OUTSIDE_BOUNDARY_MAX_V,
  INSIDE_BOUNDARY_MAX_V,
  rapidShutdownMethod,
  shutdownStringVoltageV,
  checkRapidShutdown,
  type RapidShutdownMethod,
} from "./checks/rapid-shutdown";
export { DC_TO_AC_WARN_ABOVE, systemRatings, checkDcToAcRatio, checkModuleCount, type SystemRatings } from "./checks/system-ratings";
export { PVWATTS_V5_DEFAULT_LOSSES_PERCENT, DEFAULT_LOSS_FRACTION, combinedLossFraction, annualProductionKwh } from "./checks/production";
export { EXPEDITED_DEAD_LOAD_PSF, roofPlaneLoad, checkRoofLoad, type RoofPlaneLoad } from "./checks/roof-load";

export { CONDUCTOR_SIZES, isConductorSize, sizeLabel } from "./tables/conductor-sizes";
export { STANDARD_OCPD_RATINGS_A, nextStandardRatingA } from "./tables/standard-ocpd-ratings";
export { tableAmpacityA } from "./tables/ampacity";
export { vocCorrectionFactor } from "./tables/voc-correction";
export * from "./commissioning";
