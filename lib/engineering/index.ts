// The design review engine: pure functions over plain data, no I/O.
export * from "./types";
export { DesignInputError, unlessInputError } from "./errors";
export {
  CLAUSES,
  EDITION_ONLY_CLAUSES,
  NON_CODE_BASES,
  type ClauseId,
  type EditionOnlyClauseId,
  clause,
  clauseInEdition,
  clauses,
} from "./clauses";
export { reviewArray, reviewDesign, type ReviewResult, type ReviewSummary } from "./review";
export {
  isCheckOfRun,
  isConnectionCheck,
  type ConnectionFigures,
  type InverterOutputFigures,
  type ReviewFigures,
  type RunFigures,
  type StringFigures,
} from "./figures";
export { validateArrayDesign, validateDesign, validateSite } from "./validate";
export { requiredLabels, type LabelFacts, type WarningLabel } from "./labels";
export { article, withArticle, plural, countAgrees } from "./check-result";

export {
  DWELLING_MAX_V,
  OTHER_BUILDING_MAX_V,
  coldModuleVoc,
  stringVoltageLimit,
  checkStringVoltage,
  type ColdVoc,
} from "./checks/string-voltage";
export { checkModuleLevelInputs } from "./checks/module-level-inputs";
export { CELL_TEMP_RISE_C, cellTempC, hotModuleVmpV, checkMpptWindow, checkMicroMpptWindow } from "./checks/mppt-window";
export {
  stringMaxCurrentA,
  runMaxCurrentA,
  runCircuits,
  circuitConductorCount,
  stringsOnSameInput,
  checkInverterInputCurrent,
  type RunCircuit,
} from "./checks/circuit-current";
export { rooftopAdderC, conditionsOfUse, type ConditionsOfUse } from "./checks/conditions-of-use";
export {
  evaluateConductor,
  evaluateRun,
  smallestPassingSize,
  terminalBasis,
  checkConductorAmpacity,
  checkCurrentCarryingCount,
  type ConductorEvaluation,
  type TerminalBasis,
} from "./checks/conductor-ampacity";
export { maxProtectiveOcpdA } from "./checks/conductor-protection";
export { requiredOcpdA, checkOcpd } from "./checks/ocpd";
export { egcBasisA, egcRequirement, requiredEgcSize, checkEgc, type EgcRequirement } from "./checks/egc";
export { checkDataSheets, coefficientPctPerC, vocCoefficientTrusted, VOC_COEFF_TYPICAL_PCT } from "./checks/data-sheets";
export { checkSystemVoltageRatings, stringMaxVoltageV } from "./checks/system-voltage";
export { checkProtectionFunctions, ARC_FAULT_FROM_V } from "./checks/protection-functions";
export { checkPvSystemDisconnect, checkEquipmentDisconnects, checkRapidShutdownInitiator } from "./checks/disconnects";
export { checkWiringMethods, enclosureOf, isExposedArrayConductor } from "./checks/wiring-methods";
export { checkGroundingElectrodeConductor } from "./checks/grounding-electrode";
export { checkFeederConnection } from "./checks/feeder-connection";
export { checkSupplySideConductors } from "./checks/supply-side";
export { checkAcCombiner, hasAcCombiner } from "./checks/ac-combiner";
export { checkStringsHaveRuns } from "./checks/string-runs";
export {
  evaluateLoadSideRules,
  largestPvBreakerA,
  largestMainBreakerA,
  type LoadSideRule,
  type LoadSideOutcome,
} from "./checks/busbar-rules";
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
export { racewayFill, runRacewayWires, wiresWithoutArea, checkConduitFill, type RacewayFill } from "./checks/conduit-fill";
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
export { STANDARD_OCPD_RATINGS_A, nextStandardRatingA, standardRatingsA } from "./tables/standard-ocpd-ratings";
export { areaCmil } from "./tables/conductor-area";
export { table5AreaIn2, table5Insulation, type Table5Insulation } from "./tables/conduit";
export { tableAmpacityA } from "./tables/ampacity";
export { vocCorrectionFactor } from "./tables/voc-correction";
export * from "./commissioning";
export { DEFAULT_ESS_SITING } from "./checks/ess-siting";
export {
  countedSourceCurrent,
  hasStorage,
  powerControlSettingA,
  totalUnits,
  type CountedSourceCurrent,
  type StoredDesign,
} from "./storage";
export type { StorageCircuitFigure, StorageFigures, StorageLocationFigure, StorageSummary } from "./storage-review";
