import type {
  BackupLoadsPanel,
  BatteryBank,
  BatteryInverter,
  EssDisconnect,
  EssSitingLimits,
  PowerControlSystem,
  StandAloneOutput,
} from "./storage-types";
import type { ConductorSize } from "./tables/conductor-sizes";

export type { ConductorSize } from "./tables/conductor-sizes";
export * from "./storage-types";

export const NEC_EDITIONS = [2017, 2020, 2023] as const;
export type NecEdition = (typeof NEC_EDITIONS)[number];

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
  maxSystemVoltageV?: number; // the module's listed maximum system voltage (600, 1000, 1500 V)
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
  terminalTempC?: TerminalTempC; // temperature rating of its wiring terminals, as marked; unknown → 110.14(C) default
  dcArcFaultProtection?: boolean; // listed DC arc-fault protection (690.11); undefined = not known
  dcGroundFaultProtection?: boolean; // DC ground-fault protection (690.41(B)); undefined = not known
  dcDisconnect?: boolean; // an integrated DC disconnect (690.15); undefined = not known
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
  maxSystemVoltageV?: number; // the highest string voltage the device may sit in
}

export interface PvString {
  id: string;
  inverterId: string;
  mpptIndex?: number;
  modulesInSeries: number;
}

/**
 * What a conductor run carries. Strings are separate circuits in the one raceway or cable
 * (each with its own pair of conductors and its own current) unless `combined` says they were
 * joined in parallel before the run (a combiner or branch connectors). Inverter outputs are one
 * combined circuit (after an AC combiner) unless `combined` is false.
 */
export type CircuitRef =
  | { kind: "dc-strings"; stringIds: string[]; combined?: boolean } // combined default false
  | { kind: "ac-output"; sources: { inverterId: string; units?: number }[]; combined?: boolean }; // units default to the quantity; combined default true

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
  insulation?: string; // Chapter 9 Table 5 holds THHN/THWN-2, XHHW-2 and RHW-2; others need areaIn2
  areaIn2?: number; // from the wire's data sheet; overrides Table 5
}

export interface Raceway {
  type: RacewayType;
  tradeSize: TradeSize;
  wires?: RacewayWire[]; // every wire in the raceway, EGC included; default: the run's circuit conductors and its EGC
}

export interface ConductorRun {
  id: string;
  label: string;
  circuit: CircuitRef;
  lengthFt: number; // one way
  conductor: ConductorSpec;
  terminalTempC?: TerminalTempC; // default: the inverter's marked rating, else 110.14(C)
  currentCarryingConductors?: number; // in the same raceway or cable; default (and minimum) from the circuits it carries
  ambientTempC?: number; // default: the site's high design temperature
  roofClearanceIn?: number; // set only for raceway or cable in sunlight on a roof
  ocpdA?: number; // AC runs without one are protected by the PV breaker
  ocpdIsFuse?: boolean;
  egc?: { size: ConductorSize; material: ConductorMaterial };
  conductorTempC?: number; // corrects Table 8 resistance from 75 °C
  raceway?: Raceway;
  mcCable?: boolean; // Type MC cable: metal armor, no raceway
  wireAreaIn2?: number; // one circuit conductor's area from its data sheet, for insulation Chapter 9 Table 5 does not list
  insideBuilding?: boolean; // passes inside a building (690.31); undefined = not known
}

export interface ServicePanel {
  voltageV: number;
  phase: 1 | 3;
  busbarA: number;
  mainBreakerA: number | null; // null for a main-lug panel
  connection: "load-side" | "supply-side";
  pvBreakerA: number; // backfed breaker, or the supply-side disconnect's OCPD
  pvBreakerAtOppositeEnd: boolean;
  otherBreakersA?: number[]; // every other breaker on the bus except the main (an AC-coupled battery inverter's among them), for the sum rule
  serviceConductorAmpacityA?: number; // supply side; defaults to the main rating
  serviceConductor?: { size: ConductorSize; material: ConductorMaterial }; // largest ungrounded service-entrance conductor (Table 250.66)
  panelFeed?: "end" | "center"; // where the supply enters the busbar; default end-fed
  loadSideAt?: "busbar" | "feeder" | "feed-through"; // where a load-side connection lands; default the busbar
  feeder?: FeederConnection; // for connections on a feeder or on feed-through conductors
  supplySideConductors?: SupplySideConductors; // supply side: from the tap to the PV overcurrent device
  serviceLocation?: string;
  pvDisconnectLocation?: string;
}

/** A load-side connection to a feeder (705.12, feeders and taps). */
export interface FeederConnection {
  ampacityA?: number; // of the feeder (or feed-through) conductors
  ocpdA?: number; // the device protecting the feeder at its supply end
  atOppositeEnd?: boolean; // the connection is at the end of the feeder away from that device
  loadSideOcpdA?: number; // a device on the feeder, on the load side of the connection
  tapAmpacityA?: number; // the smallest tap taken from the feeder, if any
}

/** Supply-side source conductors between the service tap and the PV overcurrent device (705.11). */
export interface SupplySideConductors {
  size: ConductorSize;
  material: ConductorMaterial;
  lengthToOcpdFt?: number;
}

/** The PV system disconnecting means (690.13). */
export interface PvSystemDisconnect {
  kind: "pv-breaker" | "switch" | "fused-switch";
  ratingA?: number; // ampere rating of a separate switch
  voltageRatingV?: number;
  readilyAccessible?: boolean;
}

/** The rapid shutdown initiation device (690.12(C)). */
export interface RapidShutdownInitiator {
  kind: "service-disconnect" | "pv-disconnect" | "switch";
  outsideReadilyAccessible?: boolean;
}

/** A grounding electrode conductor the design adds (690.47, Table 250.66). */
export interface GroundingElectrodeConductor {
  size: ConductorSize;
  material: ConductorMaterial;
  electrode: "rod-pipe-plate" | "other";
}

/** The AC combiner panel that joins micro-inverter branch circuits. */
export interface AcCombiner {
  busbarA?: number;
  breakersA?: readonly number[]; // every breaker on its bus except the one feeding out; default the branch runs' devices
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
  pvDisconnect?: PvSystemDisconnect;
  rapidShutdownInitiator?: RapidShutdownInitiator;
  groundingElectrodeConductor?: GroundingElectrodeConductor;
  acCombiner?: AcCombiner;
  storage?: Storage; // batteries; absent for a PV-only design
}

/** A battery circuit: battery to the multimode inverter (DC), or the battery inverter's output (AC). */
export interface StorageCircuit {
  id: string;
  label: string;
  kind: "battery-dc" | "battery-inverter-output";
  bankIds?: string[]; // battery-dc: the banks whose units it joins in parallel; default all
  conductor: ConductorSpec;
  ocpdA?: number;
  terminalTempC?: TerminalTempC; // default 75 °C (110.14(C), common practice for equipment of this size)
}

export type StorageCoupling = "dc" | "ac";
export type OperatingMode = "backup-only" | "self-consumption" | "export" | "non-export";

export interface Storage {
  coupling: StorageCoupling;
  multimodeInverterId?: string; // dc: the hybrid inverter among the design's inverters
  batteryInverter?: BatteryInverter; // ac: required
  banks: BatteryBank[];
  operatingMode: OperatingMode;
  exportLimitKw?: number;
  importLimitKw?: number;
  pcs?: PowerControlSystem;
  backupOutput?: StandAloneOutput;
  backupPanel?: BackupLoadsPanel;
  disconnect?: EssDisconnect;
  availableFaultCurrentA?: number; // at the ESS disconnect, from the maker; printed on its label
  circuits?: StorageCircuit[];
}

/** The part of a design the string checks read: enough to review strings before the rest is entered. */
export type ArrayDesign = Pick<
  Design,
  "module" | "inverters" | "moduleLevelDevice" | "strings" | "mount" | "cellTempRiseC" | "listedRapidShutdownSystem"
>;

export interface Site {
  recordLowTempC: number;
  highDesignTempC: number;
  necEdition: NecEdition;
  isDwelling: boolean; // one- and two-family dwelling
  peakSunHours?: number;
  essSiting?: EssSitingLimits; // the AHJ's adopted residential ESS limits; default the published ones
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
  field?: string; // the entry the check needs or faults, as a design path ("runs.r1.insideBuilding")
}
