import { z } from "zod";
import { safeString } from "./fields";
import { withArticle } from "@/lib/engineering/check-result";
import { CONDUCTOR_SIZES } from "@/lib/engineering/tables/conductor-sizes";
import { ESS_LOCATIONS } from "@/lib/engineering/storage-types";
import { BATTERY_CIRCUIT_KINDS, INSULATIONS, OPERATING_MODES, RACEWAY_TYPES, SERVICE_VOLTAGES_V, TRADE_SIZES } from "./design-options";

// The plain choices live in a zod-free module the editor's steps import; importers of this module keep finding them here.
export {
  BATTERY_CIRCUIT_KINDS,
  DESIGN_STEPS,
  INSULATIONS,
  OPERATING_MODES,
  RACEWAY_TYPES,
  SERVICE_VOLTAGES_V,
  TRADE_SIZES,
} from "./design-options";

const YES_NO = ["", "yes", "no"] as const;

const blankToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);

function numberIn(label: string, min: number, max: number, unit = "", { integer = false } = {}) {
  return z.coerce
    .number({ error: `${label} must be a number` })
    .refine((v) => Number.isFinite(v), `${label} must be a number`)
    .refine((v) => !integer || Number.isInteger(v), `${label} must be a whole number`)
    .refine((v) => v >= min && v <= max, `${label} must be between ${min} and ${max}${unit ? ` ${unit}` : ""}`);
}
/** "Busbar rating" → "busbar rating", but "PV breaker" stays "PV breaker" and "MPPT input" stays "MPPT input". */
const inSentence = (label: string) => (/^[A-Z]{2}/.test(label) ? label : label[0]!.toLowerCase() + label.slice(1));
const required = (label: string, min: number, max: number, unit = "", opts = {}) =>
  z
    .preprocess(blankToUndefined, numberIn(label, min, max, unit, opts).optional())
    .refine((v) => v !== undefined, `Enter the ${inSentence(label)}`) as unknown as z.ZodType<number, string | number>;
const optional = (label: string, min: number, max: number, unit = "", opts = {}) =>
  z.preprocess(blankToUndefined, numberIn(label, min, max, unit, opts).optional()) as unknown as z.ZodType<
    number | undefined,
    string | number | undefined
  >;
const choice = <const T extends readonly [string, ...string[]]>(values: T, label: string) =>
  z.enum(values, { error: `Choose the ${label}` });
const text = (label: string, max: number) => safeString().trim().min(1, `Enter the ${label}`).max(max, `At most ${max} characters`);
const optionalText = (max: number) => safeString().trim().max(max, `At most ${max} characters`).optional();
const catalogId = (label: string) => safeString({ error: `Choose ${withArticle(label)}` }).uuid(`Choose ${withArticle(label)}`);
const yesNo = z.enum(YES_NO, { error: "Answer yes or no" }).optional();
const sizeOrBlank = z.union([z.enum(CONDUCTOR_SIZES), z.literal("")], { error: "Choose a conductor size" }).optional();
const materialOrBlank = z.union([z.enum(["Cu", "Al"]), z.literal("")]).optional();
const lineId = safeString().min(1).max(20);
const flag = z.boolean().optional();
/** Breakers typed as "20, 20, 30": whole amperes. */
const breakerList = safeString()
  .max(200)
  .optional()
  .transform((v, ctx) => {
    const parts = (v ?? "")
      .split(/[,\s]+/)
      .filter(Boolean)
      .map(Number);
    if (parts.some((n) => !Number.isInteger(n) || n <= 0 || n > 1200)) {
      ctx.addIssue({ code: "custom", message: "List the other breakers in whole amperes separated by commas, e.g. 20, 20, 30" });
      return z.NEVER;
    }
    return parts;
  });

/** What storage shares whichever way it couples: the batteries, how they run, the backup loads panel, the disconnect and circuits. */
const storageParts = {
  banks: z
    .array(
      z.object({
        lineId,
        equipmentId: catalogId("battery"),
        quantity: required("Number of units", 1, 40, "", { integer: true }),
        location: choice(ESS_LOCATIONS, "place the batteries stand"),
      }),
    )
    .min(1, "Add at least one battery")
    .max(6, "At most 6 battery lines"),
  operatingMode: choice(OPERATING_MODES, "operating mode"),
  exportLimitKw: optional("Export limit", 0, 1000, "kW"),
  importLimitKw: optional("Import limit", 0, 1000, "kW"),
  // The current a listed power control system holds the sources to (705.13); blank: not set.
  pcsCurrentSettingA: optional("Power control setting", 1, 1200, "A"),
  hasBackupPanel: flag,
  backupBusbarA: optional("Backup panel busbar", 20, 1200, "A", { integer: true }),
  backupMainBreakerA: optional("Backup panel main breaker", 15, 1200, "A", { integer: true }),
  backupInverterBreakerA: optional("Inverter breaker in the backup panel", 10, 1200, "A", { integer: true }),
  backupInverterBreakerAtOppositeEnd: flag,
  backupOtherBreakersA: breakerList,
  backupPanelVoltageV: z.enum(["240", "120"], { error: "Choose the backup panel's voltage" }).optional(),
  backupMultiwire: yesNo,
  backupLoads: z
    .array(
      z.object({
        lineId,
        name: text("load's name", 60),
        currentA: required("Load current", 0.1, 200, "A"),
        voltageV: choice(["120", "240"], "load's voltage"),
      }),
    )
    .max(24, "At most 24 backed-up loads")
    .optional(),
  disconnectKind: z.enum(["", "integral", "separate"], { error: "Choose the storage disconnect" }).optional(),
  disconnectWithinSight: yesNo,
  disconnectLockable: yesNo,
  disconnectLocation: optionalText(120),
  availableFaultCurrentA: optional("Available fault current", 1, 100_000, "A"),
  circuits: z
    .array(
      z.object({
        lineId,
        label: text("circuit name", 60),
        kind: choice(BATTERY_CIRCUIT_KINDS, "circuit kind"),
        material: choice(["Cu", "Al"], "conductor material"),
        size: choice(CONDUCTOR_SIZES, "conductor size"),
        insulationTempC: choice(["75", "90"], "insulation temperature rating"),
        insulation: z.union([z.enum(INSULATIONS), z.literal("")]).optional(),
        terminalTempC: z.enum(["", "60", "75", "90"], { error: "Choose the terminal temperature rating" }).optional(),
        ocpdA: optional("Overcurrent device", 1, 1200, "A", { integer: true }),
      }),
    )
    .max(6, "At most 6 battery circuits")
    .optional(),
};

const backupPanelComplete = (
  s: { hasBackupPanel?: boolean; backupBusbarA?: number; backupInverterBreakerA?: number },
  ctx: z.RefinementCtx,
) => {
  if (!s.hasBackupPanel) return;
  if (s.backupBusbarA === undefined)
    ctx.addIssue({ code: "custom", path: ["backupBusbarA"], message: "Enter the backup panel's busbar rating" });
  if (s.backupInverterBreakerA === undefined)
    ctx.addIssue({ code: "custom", path: ["backupInverterBreakerA"], message: "Enter the inverter's breaker in the backup panel" });
};

/**
 * The design's batteries, or "none": a PV-only design. Other entries beside "none" are dropped unread,
 * so switching a design back to no battery never leaves it refused for a half-typed battery line.
 */
export const StorageInput = z.discriminatedUnion(
  "coupling",
  [
    z.object({ coupling: z.literal("none") }),
    z
      .object({
        coupling: z.literal("dc"),
        multimodeInverterLineId: safeString({ error: "Choose the multimode inverter the batteries charge through" })
          .min(1, "Choose the multimode inverter the batteries charge through")
          .max(20),
        ...storageParts,
      })
      .superRefine(backupPanelComplete),
    z
      .object({
        coupling: z.literal("ac"),
        batteryInverterId: catalogId("battery inverter"),
        batteryInverterBreakerA: required("Battery inverter breaker", 10, 1200, "A", { integer: true }),
        ...storageParts,
      })
      .superRefine(backupPanelComplete),
  ],
  { error: "Choose no battery, DC-coupled or AC-coupled" },
);

/** The design as the review needs it; parsed on the client as you type and again on the server. */
export const DesignInput = z.object({
  equipment: z.object({
    moduleId: catalogId("PV module"),
    inverters: z
      .array(z.object({ lineId, equipmentId: catalogId("inverter"), quantity: required("Quantity", 1, 200, "", { integer: true }) }))
      .min(1, "Add at least one inverter")
      .max(6, "At most 6 inverter lines"),
    deviceId: z
      .union([safeString().uuid("Choose a module-level device, or none"), z.literal("")])
      .optional()
      .transform((v) => v || null),
    listedRapidShutdownSystem: flag,
  }),
  array: z.object({
    mount: choice(["roof", "ground"], "mounting"),
    roofPlanes: z
      .array(
        z.object({
          lineId,
          label: text("plane name", 60),
          tiltDeg: required("Tilt", 0, 90, "°"),
          azimuthDeg: required("Azimuth", 0, 360, "°"),
          moduleCount: required("Module count", 1, 500, "", { integer: true }),
          attachmentCount: required("Attachment count", 1, 2000, "", { integer: true }),
          rackingWeightLb: required("Racking weight", 0, 5000, "lb"),
        }),
      )
      .min(1, "Add at least one roof plane or ground array")
      .max(12, "At most 12 planes"),
    strings: z
      .array(
        z.object({
          lineId,
          inverterLineId: safeString({ error: "Choose the inverter this string feeds" })
            .min(1, "Choose the inverter this string feeds")
            .max(20),
          mpptIndex: optional("MPPT input", 1, 12, "", { integer: true }),
          modulesInSeries: required("Modules in series", 1, 40, "", { integer: true }),
          parallelCount: required("Strings in parallel", 1, 8, "", { integer: true }),
        }),
      )
      .max(24, "At most 24 string lines"),
  }),
  service: z.object({
    voltageV: choice(SERVICE_VOLTAGES_V, "service voltage"),
    phase: choice(["1", "3"], "number of phases"),
    busbarA: required("Busbar rating", 20, 4000, "A", { integer: true }),
    mainBreakerA: optional("Main breaker", 15, 4000, "A", { integer: true }),
    connection: choice(["load-side", "supply-side"], "point of connection"),
    pvBreakerA: required("PV breaker", 10, 1200, "A", { integer: true }),
    pvBreakerAtOppositeEnd: flag,
    otherBreakersA: breakerList,
    serviceLocation: optionalText(120),
    pvDisconnectLocation: optionalText(120),
    // Where a load-side connection lands, and the panel's feed.
    panelFeed: z.enum(["end", "center"], { error: "Choose how the panel is fed" }).optional(),
    loadSideAt: z.enum(["busbar", "feeder", "feed-through"], { error: "Choose where the connection lands" }).optional(),
    feederAmpacityA: optional("Feeder ampacity", 1, 4000, "A"),
    feederOcpdA: optional("Feeder overcurrent device", 1, 4000, "A", { integer: true }),
    feederLoadSideOcpdA: optional("Load-side overcurrent device", 1, 4000, "A", { integer: true }),
    feederTapAmpacityA: optional("Smallest tap ampacity", 1, 4000, "A"),
    feederAtOppositeEnd: flag,
    // Supply side: the conductors from the tap to the PV overcurrent device.
    supplyConductorSize: sizeOrBlank,
    supplyConductorMaterial: materialOrBlank,
    supplyTapLengthFt: optional("Length to the overcurrent device", 0, 500, "ft"),
    serviceConductorSize: sizeOrBlank,
    serviceConductorMaterial: materialOrBlank,
    // Disconnecting means and rapid shutdown initiator (690.13, 690.12(C)).
    pvDisconnectKind: z.enum(["", "pv-breaker", "switch", "fused-switch"], { error: "Choose the PV system disconnect" }).optional(),
    pvDisconnectRatingA: optional("Disconnect rating", 1, 1200, "A", { integer: true }),
    pvDisconnectVoltageV: optional("Disconnect voltage rating", 100, 1000, "V", { integer: true }),
    pvDisconnectAccessible: yesNo,
    rsdInitiatorKind: z
      .enum(["", "service-disconnect", "pv-disconnect", "switch"], { error: "Choose the rapid shutdown initiator" })
      .optional(),
    rsdInitiatorOutside: yesNo,
    // A grounding electrode conductor the design adds (690.47).
    gecSize: sizeOrBlank,
    gecMaterial: materialOrBlank,
    gecElectrode: z.enum(["", "rod-pipe-plate", "other"]).optional(),
    // The AC combiner of micro-inverter branch circuits.
    combinerBusbarA: optional("Combiner busbar", 1, 1200, "A", { integer: true }),
  }),
  runs: z
    .array(
      z
        .object({
          lineId,
          label: text("run name", 60),
          circuit: safeString({ error: "Choose what this run carries" }).regex(/^(dc|ac):[\w.-]+$/, "Choose what this run carries"),
          lengthFt: required("Length", 1, 2000, "ft"),
          material: choice(["Cu", "Al"], "conductor material"),
          size: choice(CONDUCTOR_SIZES, "conductor size"),
          stranding: choice(["stranded", "solid"], "stranding"),
          insulation: choice(INSULATIONS, "insulation"),
          wireAreaIn2: optional("Wire area", 0.001, 1, "in²"),
          insulationTempC: choice(["75", "90"], "insulation temperature rating"),
          // Blank: the inverter's marked rating, else 110.14(C) (60 °C up to 100 A).
          terminalTempC: z.enum(["", "60", "75", "90"], { error: "Choose the terminal temperature rating" }).optional(),
          ambientTempC: optional("Ambient temperature", -40, 70, "°C"),
          onRoof: flag,
          roofClearanceIn: optional("Height above the roof", 0, 36, "in"),
          // Blank: counted from the circuits the run carries.
          currentCarryingConductors: optional("Current-carrying conductors", 1, 40, "", { integer: true }),
          // Strings keep their own circuits unless joined in parallel before the run; inverter outputs leave a combiner as one.
          arrangement: z.enum(["", "separate", "combined"], { error: "Choose how the circuits run" }).optional(),
          racewayType: choice(RACEWAY_TYPES, "conduit type"),
          tradeSize: z.union([z.enum(TRADE_SIZES), z.literal("")]).optional(),
          route: z.enum(["", "outdoors", "inside"], { error: "Choose whether the run enters the building" }).optional(),
          ocpdA: optional("Overcurrent device", 1, 1200, "A", { integer: true }),
          egcSize: z.union([z.enum(CONDUCTOR_SIZES), z.literal("")]).optional(),
        })
        .refine((r) => !(r.racewayType === "EMT" || r.racewayType === "PVC-40") || Boolean(r.tradeSize), {
          path: ["tradeSize"],
          message: "Choose the conduit's trade size",
        }),
    )
    .min(1, "Add at least one conductor run")
    .max(20, "At most 20 conductor runs"),
  site: z.object({
    isDwelling: flag,
    peakSunHours: optional("Peak sun hours", 1, 8, "h/day"),
  }),
  // Absent in designs saved before storage existed: the same as "none".
  storage: StorageInput.optional(),
});
export type StorageInput = z.output<typeof StorageInput>;
export type DesignInput = z.output<typeof DesignInput>;
/** The editor's form values: what the inputs hold before parsing. */
export type DesignFormValues = z.input<typeof DesignInput>;

type Leaf = string | number | boolean | null | undefined;
const LOOSE_LEAF = z.union([safeString().max(200), z.number(), z.boolean(), z.null()]).optional();

/** The same shape with every leaf accepting whatever was typed: drafts are saved as they are. */
function loosen(schema: z.ZodType): z.ZodType {
  const def = (
    schema as unknown as {
      _zod: {
        def: { type: string; shape?: Record<string, z.ZodType>; element?: z.ZodType; innerType?: z.ZodType; options?: z.ZodType[] };
      };
    }
  )._zod.def;
  if (def.type === "optional" && def.innerType) return loosen(def.innerType);
  // A choice of shapes (storage's couplings) is saved as one shape holding every option's fields.
  if (def.type === "union" && def.options?.every((o) => (o as unknown as { _zod: { def: { type: string } } })._zod.def.type === "object"))
    return loosen(z.object(Object.assign({}, ...def.options.map((o) => (o as z.ZodObject).shape))));
  if (def.type === "object" && def.shape)
    return z.object(Object.fromEntries(Object.entries(def.shape).map(([k, v]) => [k, loosen(v)]))).partial();
  if (def.type === "array" && def.element) return z.array(loosen(def.element)).max(50).optional();
  return LOOSE_LEAF;
}

/** What the editor saves as you go: any partial input, never refused for being incomplete. */
export const DesignDraft = loosen(DesignInput) as z.ZodType<DeepLoose<DesignFormValues>>;
type DeepLoose<T> = T extends Leaf ? Leaf : T extends (infer U)[] ? DeepLoose<U>[] | undefined : { [K in keyof T]?: DeepLoose<T[K]> };
export type DesignDraft = DeepLoose<DesignFormValues>;
