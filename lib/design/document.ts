import { z } from "zod";
import { CONDUCTOR_SIZES, type ConductorSize, sizeLabel } from "@/lib/engineering/tables/conductor-sizes";
import { TRADE_SIZES } from "@/lib/engineering/tables/conduit";
import { ESS_LOCATIONS } from "@/lib/engineering/storage-types";
import { numberField, optionalNumberField, safeString, type Range } from "@/lib/schemas/fields";

// The public design document of POST /api/v1/design-review: plain JSON, units in
// the field names. Beyond the fields every integration needs, it carries optional
// ones (roofPlanes, quantity, ocpdA, egc, …) so that a saved design exports
// without loss and posting it back gives exactly the project's review.

const r = (min: number, max: number, unit = ""): Range => ({ min, max, unit });
const num = numberField;
const optNum = optionalNumberField;
const whole = (label: string, range: Range) => num(label, range).refine(Number.isInteger, `${label} must be a whole number`);
const optWhole = (label: string, range: Range) =>
  optNum(label, range).refine((v) => v === undefined || Number.isInteger(v), `${label} must be a whole number`);
const id = safeString({ error: "Give an id (text of 1 to 40 characters)" })
  .trim()
  .min(1, "The id must not be blank")
  .max(40, "Ids are at most 40 characters");
const text = (max: number) => safeString({ error: "Must be text" }).trim().max(max, `At most ${max} characters`).optional();
const flag = (label: string) => z.boolean({ error: `${label} must be true or false` }).optional();
const oneOf = <const T extends readonly [string, ...string[]]>(values: T) =>
  z.enum(values, { error: `Use one of: ${values.map((v) => `"${v}"`).join(", ")}` });
const oneOfNumbers = <const T extends readonly [number, ...number[]]>(values: T) =>
  z.union(values.map((v) => z.literal(v)) as unknown as [z.ZodLiteral<T[number]>], { error: `Use one of: ${values.join(", ")}` });
const list = <T extends z.ZodType>(item: T, max: number, what: string) =>
  z.array(item, { error: `Give ${what} as a list` }).max(max, `At most ${max} ${what}`);

/** "10 AWG", "1/0 AWG", "250 kcmil": the labels a coordinator reads, one per engine size. */
export const SIZE_LABELS = CONDUCTOR_SIZES.map(sizeLabel) as [string, ...string[]];
const SIZE_BY_LABEL = new Map<string, ConductorSize>(CONDUCTOR_SIZES.map((s) => [sizeLabel(s), s]));
export const sizeFromLabel = (label: string): ConductorSize => SIZE_BY_LABEL.get(label)!;
const size = z.enum(SIZE_LABELS, {
  error: 'Use a conductor size from 14 AWG to 300 kcmil, written like "10 AWG", "1/0 AWG" or "250 kcmil"',
});

export const CODE_EDITIONS = ["2017", "2020", "2023"] as const;

const Site = z.strictObject({
  recordLowC: num("The record low temperature", r(-60, 40, "°C")),
  highAmbientC: num("The high ambient temperature", r(-20, 60, "°C")),
  isDwelling: flag("isDwelling"), // one- and two-family dwelling; default true
  peakSunHours: optNum("Peak sun hours", r(0.5, 12, "h/day")),
  // The residential ESS siting limits the AHJ adopted; left out, or a figure left out: the published ones.
  essSiting: z
    .strictObject({
      code: text(60),
      perUnitKwh: optNum("The per-unit energy limit", r(0, 1000, "kWh")),
      garageKwh: optNum("The garage limit", r(0, 1000, "kWh")),
      outdoorWallKwh: optNum("The outdoor limit", r(0, 1000, "kWh")),
      utilitySpaceKwh: optNum("The utility space limit", r(0, 1000, "kWh")),
    })
    .optional(),
});

const Module = z.strictObject({
  id,
  maker: text(80),
  model: text(80),
  pmaxW: num("Pmax", r(1, 2000, "W")),
  vocV: num("Voc", r(1, 200, "V")),
  vmpV: num("Vmp", r(1, 200, "V")),
  iscA: num("Isc", r(0.1, 50, "A")),
  impA: num("Imp", r(0.1, 50, "A")),
  // Give the Voc coefficient in one unit or the other; without either, Table 690.7(A) applies.
  vocTempCoeffPctPerC: optNum("The Voc coefficient", r(-2, -0.001, "%/°C")),
  vocTempCoeffVPerC: optNum("The Voc coefficient", r(-1, -0.0001, "V/°C")),
  vmpTempCoeffPctPerC: optNum("The Vmp coefficient", r(-2, 0, "%/°C")),
  vmpTempCoeffVPerC: optNum("The Vmp coefficient", r(-1, 0, "V/°C")),
  pmaxTempCoeffPctPerC: optNum("The Pmax coefficient", r(-2, 0, "%/°C")),
  maxSeriesFuseA: optNum("The maximum series fuse", r(1, 100, "A")),
  maxSystemVoltageV: optNum("The maximum system voltage", r(100, 2000, "V")), // the module's listing; unknown → a warning
  weightLb: optNum("The module weight", r(1, 200, "lb")),
  areaFt2: optNum("The module area", r(1, 100, "ft²")),
  lengthIn: optNum("The module length", r(10, 150, "in")),
  widthIn: optNum("The module width", r(10, 150, "in")),
});

const Inverter = z.strictObject({
  id,
  maker: text(80),
  model: text(80),
  kind: oneOf(["string", "micro"]),
  quantity: optWhole("The quantity", r(1, 500)), // default 1; micro-inverters: one unit per module
  acRatedW: num("The AC rating", r(1, 1_000_000, "W")),
  acMaxContinuousA: num("The maximum continuous output current", r(0.1, 2000, "A")),
  acNominalV: num("The nominal AC voltage", r(100, 1000, "V")),
  phases: oneOfNumbers([1, 3]),
  maxDcInputV: optNum("The maximum DC input voltage", r(10, 2000, "V")),
  mpptMinV: optNum("The MPPT minimum", r(1, 2000, "V")),
  mpptMaxV: optNum("The MPPT maximum", r(1, 2000, "V")),
  maxInputCurrentA: optNum("The maximum input current", r(0.1, 500, "A")),
  regulatedStringV: optNum("The regulated string voltage", r(10, 2000, "V")),
  maxStringPowerW: optNum("The maximum power per string", r(1, 100_000, "W")),
  terminalC: oneOfNumbers([60, 75, 90]).optional(), // marked temperature rating of its terminals; unknown → 110.14(C)
  dcArcFaultProtection: flag("dcArcFaultProtection"), // 690.11; unknown → a warning where it is needed
  dcGroundFaultProtection: flag("dcGroundFaultProtection"), // 690.41(B)
  dcDisconnect: flag("dcDisconnect"), // an integrated DC disconnect (690.15)
});

const Optimizer = z.strictObject({
  id,
  kind: oneOf(["optimizer", "shutdown-device"]).optional(), // default "optimizer"
  maker: text(80),
  model: text(80),
  ratedInputW: optNum("The rated input power", r(1, 5000, "W")),
  maxInputV: num("The maximum input voltage", r(1, 500, "V")),
  maxInputCurrentA: optNum("The maximum input current", r(0.1, 100, "A")),
  maxOutputCurrentA: optNum("The maximum output current", r(0.1, 100, "A")),
  shutdownOutputV: optNum("The voltage held in shutdown", r(0, 30, "V")), // default 1 V (common practice)
  maxSystemVoltageV: optNum("The maximum system voltage", r(50, 2000, "V")),
});

const PvString = z.strictObject({
  id,
  inverterId: id,
  moduleId: id,
  optimizerId: id.optional(),
  mpptIndex: optWhole("The MPPT input", r(1, 24)),
  modulesInSeries: whole("Modules in series", r(1, 100)),
  parallel: whole("Strings in parallel", r(1, 50)),
});

const ConductorOf = z.strictObject({ size, material: oneOf(["Cu", "Al"]) });

const Feeder = z.strictObject({
  ampacityA: optNum("The feeder ampacity", r(1, 6000, "A")),
  ocpdA: optNum("The feeder's overcurrent device", r(1, 6000, "A")),
  atOppositeEnd: flag("atOppositeEnd"),
  loadSideOcpdA: optNum("The load-side overcurrent device", r(1, 6000, "A")),
  tapAmpacityA: optNum("The smallest tap's ampacity", r(1, 6000, "A")),
});

const Service = z.strictObject({
  nominalV: num("The service voltage", r(100, 1000, "V")),
  phases: oneOfNumbers([1, 3]),
  busbarA: num("The busbar rating", r(1, 6000, "A")),
  mainBreakerA: num("The main breaker rating", r(1, 6000, "A")).nullable(), // null: a main-lug panel
  connection: oneOf(["load-side", "supply-side"]),
  pvBreakerA: optNum("The PV breaker rating", r(1, 4000, "A")), // default: the next standard rating at 125 % of inverter output
  pvBreakerOppositeEnd: flag("pvBreakerOppositeEnd"),
  otherBreakersA: list(num("A breaker rating", r(1, 4000, "A")), 120, "breakers").optional(),
  serviceConductorAmpacityA: optNum("The service conductor ampacity", r(1, 6000, "A")),
  serviceConductor: ConductorOf.optional(), // the largest ungrounded service-entrance conductor (Table 250.66)
  panelFeed: oneOf(["end", "center"]).optional(), // default end-fed
  loadSideAt: oneOf(["busbar", "feeder", "feed-through"]).optional(), // default the busbar
  feeder: Feeder.optional(),
  supplySideConductors: z
    .strictObject({ size, material: oneOf(["Cu", "Al"]), lengthToOcpdFt: optNum("The length to the overcurrent device", r(0, 500, "ft")) })
    .optional(),
  serviceLocation: text(120),
  pvDisconnectLocation: text(120),
});

const Wire = z.strictObject({
  size,
  count: whole("The wire count", r(1, 100)),
  insulation: text(30),
  areaIn2: optNum("The wire area", r(0.001, 5, "in²")),
});

const Run = z.strictObject({
  id,
  label: text(60),
  circuit: oneOf(["dc-string", "dc-output", "ac-output"]),
  stringId: id.optional(), // dc-string: the string (all its parallel copies)
  stringIds: list(id, 50, "strings").min(1, "Name at least one string").optional(), // dc-string: several strings sharing the raceway
  inverterId: id.optional(), // dc-output: that inverter's strings (default all); ac-output: that inverter (default all)
  // Strings keep their own circuits in a run unless joined in parallel before it; inverter outputs leave a combiner as one.
  combined: flag("combined"), // default: false for dc-string, true for dc-output and ac-output
  lengthFt: num("The length", r(0, 5000, "ft")),
  material: oneOf(["Cu", "Al"]),
  size,
  stranded: z.boolean({ error: "stranded must be true or false" }),
  insulation: text(30), // e.g. "THWN-2"; XHHW-2 is exempt from the rooftop adder
  insulationC: oneOfNumbers([60, 75, 90]),
  terminalC: oneOfNumbers([60, 75, 90]).optional(), // default: the inverter's marked rating, else 110.14(C)
  ambientC: num("The ambient temperature", r(-60, 80, "°C")),
  aboveRoofIn: optNum("The height above the roof", r(0, 120, "in")), // only for raceway or cable in sunlight on a roof
  currentCarrying: optWhole("Current-carrying conductors", r(1, 60)), // default (and least): what the run's circuits put in it
  wireAreaIn2: optNum("The wire area", r(0.001, 5, "in²")), // one conductor, from its data sheet, for insulation Table 5 does not list
  mcCable: flag("mcCable"), // Type MC cable (metal armor) instead of a raceway
  insideBuilding: flag("insideBuilding"), // passes inside a building (690.31); unknown → a warning for DC runs
  conduit: z
    .strictObject({
      type: oneOf(["EMT", "PVC-40"]),
      tradeSize: oneOf(TRADE_SIZES as unknown as ["1/2", "3/4", "1", "1-1/4", "1-1/2", "2"]),
      wires: list(Wire, 20, "wire groups").optional(), // default: the current-carrying conductors and the EGC
    })
    .optional(),
  ocpdA: optNum("The overcurrent device rating", r(1, 4000, "A")),
  ocpdIsFuse: flag("ocpdIsFuse"),
  egc: z.strictObject({ size, material: oneOf(["Cu", "Al"]).optional() }).optional(), // material defaults to the run's
  conductorTempC: optNum("The conductor temperature", r(-40, 150, "°C")),
});

const RoofPlane = z.strictObject({
  id,
  label: text(60),
  moduleCount: whole("The module count", r(1, 5000)),
  attachmentCount: whole("The attachment count", r(1, 20_000)),
  rackingWeightLb: num("The racking weight", r(0, 100_000, "lb")),
});

const VoltageDropPath = z.strictObject({ id, label: text(60), runIds: list(id, 20, "runs").min(1, "Name at least one run") });

const PvDisconnect = z.strictObject({
  kind: oneOf(["pv-breaker", "switch", "fused-switch"]),
  ratingA: optNum("The disconnect's ampere rating", r(1, 6000, "A")),
  voltageRatingV: optNum("The disconnect's voltage rating", r(100, 2000, "V")),
  readilyAccessible: flag("readilyAccessible"),
});

const RapidShutdownInitiator = z.strictObject({
  kind: oneOf(["service-disconnect", "pv-disconnect", "switch"]),
  outsideReadilyAccessible: flag("outsideReadilyAccessible"),
});

const GroundingElectrodeConductor = z.strictObject({ size, material: oneOf(["Cu", "Al"]), electrode: oneOf(["rod-pipe-plate", "other"]) });

const AcCombiner = z.strictObject({
  busbarA: optNum("The combiner's busbar rating", r(1, 1200, "A")),
  breakersA: list(num("A breaker rating", r(1, 1200, "A")), 40, "breakers").optional(), // default: the branch runs' devices
});

// Storage: batteries, how they couple, how they run, the backup loads panel, the ESS disconnect and battery circuits.
const Battery = z.strictObject({
  id,
  maker: text(80),
  model: text(80),
  quantity: whole("The number of units", r(1, 100)),
  location: oneOf(ESS_LOCATIONS),
  usableKwh: num("The usable energy", r(0.1, 500, "kWh")),
  nameplateKwh: num("The nameplate energy", r(0.1, 500, "kWh")),
  maxContinuousChargeA: num("The maximum continuous charge current", r(0.1, 2000, "A")),
  maxContinuousDischargeA: num("The maximum continuous discharge current", r(0.1, 2000, "A")),
  maxChargeKw: num("The maximum charge power", r(0.1, 500, "kW")),
  maxDischargeKw: num("The maximum discharge power", r(0.1, 500, "kW")),
  nominalV: num("The nominal voltage", r(1, 2000, "V")),
  listings: list(
    safeString({ error: "Each listing is text" }).trim().min(1).max(40, "Each listing is at most 40 characters"),
    10,
    "listings",
  ).optional(), // e.g. ["UL 9540", "UL 9540A"]; unknown → a warning
  maxUnitsInParallel: optWhole("The units allowed in parallel", r(1, 100)),
});

const BatteryInverter = z.strictObject({
  maker: text(80),
  model: text(80),
  acRatedW: num("The battery inverter's AC rating", r(1, 1_000_000, "W")),
  acMaxContinuousA: num("The battery inverter's maximum continuous output current", r(0.1, 2000, "A")),
  acNominalV: num("The battery inverter's nominal AC voltage", r(100, 1000, "V")),
  breakerA: num("The battery inverter's breaker", r(1, 4000, "A")),
});

const BackupLoad = z.strictObject({
  name: safeString({ error: "Name the load" }).trim().min(1, "Name the load").max(60, "At most 60 characters"),
  currentA: num("The load current", r(0.1, 1000, "A")),
  voltageV: oneOfNumbers([120, 240]),
});

const BackupPanel = z.strictObject({
  busbarA: num("The backup panel's busbar rating", r(1, 4000, "A")),
  mainBreakerA: num("The backup panel's main breaker", r(1, 4000, "A")).nullable(), // null: main lugs
  inverterBreakerA: num("The inverter's breaker in the backup panel", r(1, 4000, "A")),
  inverterBreakerOppositeEnd: flag("inverterBreakerOppositeEnd"),
  otherBreakersA: list(num("A breaker rating", r(1, 4000, "A")), 120, "breakers").optional(),
  voltageV: oneOfNumbers([120, 240]), // 240: a 120/240 V panel
  multiwireBranchCircuits: flag("multiwireBranchCircuits"),
  loads: list(BackupLoad, 60, "loads").optional(),
});

const BatteryCircuit = z.strictObject({
  id,
  label: text(60),
  kind: oneOf(["battery-dc", "battery-inverter-output"]),
  batteryIds: list(id, 20, "batteries").min(1, "Name at least one battery").optional(), // battery-dc: default all
  material: oneOf(["Cu", "Al"]),
  size,
  insulationC: oneOfNumbers([75, 90]),
  insulation: text(30),
  terminalC: oneOfNumbers([60, 75, 90]).optional(), // default 75 °C
  ocpdA: optNum("The overcurrent device rating", r(1, 4000, "A")),
});

const Storage = z.strictObject({
  coupling: oneOf(["dc", "ac"]),
  multimodeInverterId: id.optional(), // dc: the hybrid inverter among inverters
  batteryInverter: BatteryInverter.optional(), // ac: required
  batteries: list(Battery, 20, "batteries").min(1, "List at least one battery"),
  operatingMode: oneOf(["backup-only", "self-consumption", "export", "non-export"]),
  exportLimitKw: optNum("The export limit", r(0, 10_000, "kW")),
  importLimitKw: optNum("The import limit", r(0, 10_000, "kW")),
  powerControl: z
    .strictObject({
      listed: z.boolean({ error: "listed must be true or false" }),
      currentSettingA: optNum("The power control setting", r(1, 4000, "A")),
    })
    .optional(),
  backupOutput: z
    .strictObject({
      continuousA: num("The backup output current", r(0.1, 2000, "A")),
      voltageV: oneOfNumbers([120, 240]),
      powerW: optNum("The backup output power", r(1, 1_000_000, "W")),
      transferTimeS: optNum("The transfer time", r(0, 600, "s")),
    })
    .optional(),
  backupPanel: BackupPanel.optional(),
  disconnect: z
    .strictObject({
      kind: oneOf(["integral", "separate"]),
      withinSight: flag("withinSight"),
      lockable: flag("lockable"),
      location: text(120),
    })
    .optional(),
  availableFaultCurrentA: optNum("The available fault current", r(1, 500_000, "A")),
  circuits: list(BatteryCircuit, 20, "battery circuits").optional(),
});

export const DesignDocument = z.strictObject(
  {
    codeEdition: oneOf(CODE_EDITIONS),
    site: Site,
    mount: oneOf(["roof", "ground"]).optional(), // default roof
    listedRapidShutdownSystem: flag("listedRapidShutdownSystem"),
    modules: list(Module, 20, "modules").min(1, "List at least one module"),
    inverters: list(Inverter, 20, "inverters").min(1, "List at least one inverter"),
    optimizers: list(Optimizer, 20, "module-level devices").default([]),
    strings: list(PvString, 100, "strings").default([]),
    service: Service,
    runs: list(Run, 100, "runs").default([]),
    roofPlanes: list(RoofPlane, 50, "roof planes").min(1, "List at least one roof plane, or leave roofPlanes out").optional(),
    attachmentRatedLoadLb: optNum("The attachment rating", r(1, 100_000, "lb")),
    cellTempRiseC: optNum("The cell temperature rise", r(0, 60, "°C")),
    paths: list(VoltageDropPath, 20, "paths").optional(),
    pvDisconnect: PvDisconnect.optional(),
    rapidShutdownInitiator: RapidShutdownInitiator.optional(),
    groundingElectrodeConductor: GroundingElectrodeConductor.optional(),
    acCombiner: AcCombiner.optional(),
    storage: Storage.optional(), // batteries; leave it out for a PV-only design
  },
  { error: "The design document must be a JSON object" },
);
export type DesignDocument = z.output<typeof DesignDocument>;
export type DesignDocumentInput = z.input<typeof DesignDocument>;
