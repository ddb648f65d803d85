import type { ConductorSize } from "./tables/conductor-sizes";

export type { ConductorSize } from "./tables/conductor-sizes";

export type NecEdition = 2017 | 2020 | 2023;
export const NEC_EDITIONS: readonly NecEdition[] = [2017, 2020, 2023];

export type ConductorMaterial = "Cu" | "Al";
export type Stranding = "stranded" | "solid";
export type InsulationTempC = 75 | 90;
export type TerminalTempC = 60 | 75 | 90;

/** A maker's temperature coefficient, as printed: percent or volts per °C (negative for voltage). */
export interface TempCoefficient {
  value: number;
  unit: "%/C" | "V/C";
}

export interface PvModule {
  maker: string;
  model: string;
  powerW: number; // at STC
  vocV: number;
  vmpV: number;
  iscA: number;
  impA: number;
  vocTempCoeff?: TempCoefficient; // without it, Table 690.7(A) is used
  vmpTempCoeff?: TempCoefficient; // without it, the Pmax coefficient stands in
  pmaxTempCoeffPctPerC?: number;
  maxSeriesFuseA?: number;
  lengthIn: number;
  widthIn: number;
  weightLb: number;
}

export interface Inverter {
  id: string;
  maker: string;
  model: string;
  kind: "string" | "micro";
  quantity: number;
  acPowerW: number; // continuous rated output, per unit
  acOutputCurrentA: number; // continuous output current, per unit
  acVoltageV: number; // nominal, line to line
  phase: 1 | 3;
  maxDcInputV: number; // string: whole string; micro: per module input
  mpptMinV?: number;
  mpptMaxV?: number;
  maxInputIscA?: number; // string: per MPPT input; micro: per module input
  regulatedStringV?: number; // inverters made for optimizer strings
  maxStringPowerW?: number; // per-string limit of optimizer-string inverters
}

/** A device behind each module: a DC optimizer or a shutdown-only device. */
export interface ModuleLevelDevice {
  kind: "optimizer" | "shutdown-device";
  maker: string;
  model: string;
  maxInputV: number;
  maxInputIscA?: number;
  maxOutputCurrentA?: number; // optimizer continuous output current
  shutdownOutputV?: number; // per device while shut down; default 1 V (common practice)
}

export interface PvString {
  id: string;
  inverterId: string;
  mpptIndex?: number;
  modulesInSeries: number;
}

/** What a conductor run carries: strings in parallel, or the output of some inverter units. */
export type CircuitRef =
  | { kind: "dc-strings"; stringIds: string[] }
  | { kind: "ac-output"; sources: { inverterId: string; units?: number }[] }; // units default to the quantity

export interface ConductorSpec {
  size: ConductorSize;
  material: ConductorMaterial;
  stranding?: Stranding; // default stranded
  insulationTempC: InsulationTempC;
  insulation?: string; // e.g. "PV wire", "THWN-2", "XHHW-2"
}

export type RacewayType = "EMT" | "PVC-40";
export type TradeSize = "1/2" | "3/4" | "1" | "1-1/4" | "1-1/2" | "2";

export interface RacewayWire {
  size: ConductorSize;
  count: number;
  areaIn2?: number; // needed for insulation other than THHN/THWN-2
}

export interface Raceway {
  type: RacewayType;
  tradeSize: TradeSize;
  wires: RacewayWire[]; // every wire in the raceway, EGC included
}

export interface ConductorRun {
  id: string;
  label: string;
  circuit: CircuitRef;
  lengthFt: number; // one way
  conductor: ConductorSpec;
  terminalTempC?: TerminalTempC; // default 75
  currentCarryingConductors?: number; // in the same raceway or cable; default from the circuit
  ambientTempC?: number; // default: the site's high design temperature
  roofClearanceIn?: number; // set only for raceway or cable in sunlight on a roof
  ocpdA?: number; // AC runs without one are protected by the PV breaker
  ocpdIsFuse?: boolean;
  egc?: { size: ConductorSize; material: ConductorMaterial };
  conductorTempC?: number; // corrects Table 8 resistance from 75 °C
  raceway?: Raceway;
}

export interface ServicePanel {
  voltageV: number;
  phase: 1 | 3;
  busbarA: number;
  mainBreakerA: number | null; // null for a main-lug panel
  connection: "load-side" | "supply-side";
  pvBreakerA: number; // backfed breaker, or the supply-side disconnect's OCPD
  pvBreakerAtOppositeEnd: boolean;
  otherBreakersA?: number[]; // every other breaker on the bus except the main, for the sum rule
  serviceConductorAmpacityA?: number; // supply side; defaults to the main rating
  serviceLocation?: string;
  pvDisconnectLocation?: string;
}

export interface RoofPlane {
  id: string;
  label: string;
  moduleCount: number;
  attachmentCount: number;
  rackingWeightLb: number; // rails, attachments and clamps on this plane
}

export interface VoltageDropPath {
  id: string;
  label: string;
  runIds: string[];
}

export interface Design {
  module: PvModule;
  inverters: Inverter[];
  moduleLevelDevice?: ModuleLevelDevice;
  listedRapidShutdownSystem?: boolean; // a listed PV hazard control system
  mount?: "roof" | "ground"; // default roof
  strings: PvString[]; // empty for micro-inverter designs
  service: ServicePanel;
  runs: ConductorRun[];
  paths?: VoltageDropPath[];
  roofPlanes: RoofPlane[];
  cellTempRiseC?: number; // overrides the common-practice rise over ambient
  attachmentRatedLoadLb?: number;
}

export interface Site {
  recordLowTempC: number;
  highDesignTempC: number;
  necEdition: NecEdition;
  isDwelling: boolean; // one- and two-family dwelling
  peakSunHours?: number;
}

export type CheckStatus = "pass" | "warn" | "fail";

export interface CheckResult {
  id: string;
  title: string;
  status: CheckStatus;
  value: number | null;
  limit: number | null;
  unit: string;
  clause: string;
  edition: NecEdition;
  message: string;
  fix?: string;
}
