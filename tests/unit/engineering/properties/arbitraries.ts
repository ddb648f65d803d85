// Generators for the property tests. Equipment is invented (names as in ../fixtures); figures
// stay in the ranges a residential data sheet shows so generated designs are reviewable.
import fc from "fast-check";
import { CONDUCTOR_SIZES, NEC_EDITIONS, STANDARD_OCPD_RATINGS_A } from "@/lib/engineering";
import type {
  ConductorMaterial,
  ConductorRun,
  ConductorSize,
  Design,
  Inverter,
  ModuleLevelDevice,
  PvModule,
  PvString,
  Raceway,
  RoofPlane,
  ServicePanel,
  Site,
} from "@/lib/engineering";

// Enough cases to find an edge, few enough that the whole unit suite stays well under a minute.
export const RUNS = { numRuns: 150 } as const;

/** A finite double in [min, max]. */
export const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const optional = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });

/** A copy without the keys whose value is undefined, so generated objects read like entered ones. */
function compact<T extends object>(value: T): T {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as T;
}

export const editionArb = fc.constantFrom(...NEC_EDITIONS);
export const materialArb = fc.constantFrom<ConductorMaterial>("Cu", "Al");

/** Sizes Table 310.16 lists for a material: no 14 AWG aluminum. */
export function listedSizes(material: ConductorMaterial): readonly ConductorSize[] {
  return material === "Al" ? CONDUCTOR_SIZES.filter((s) => s !== "14") : CONDUCTOR_SIZES;
}

// Chapter 9 Table 5 holds THHN/THWN-2 areas for these sizes only; larger wires need an entered area.
const THHN_SIZES: readonly ConductorSize[] = ["14", "12", "10", "8", "6", "4", "3", "2"];

export const siteArb: fc.Arbitrary<Site> = fc
  .record({
    necEdition: editionArb,
    // Table 690.7(A) stops at −40 °C; colder sites need the maker's coefficient.
    recordLowTempC: num(-40, 20),
    spreadC: num(0, 35),
    isDwelling: fc.boolean(),
    peakSunHours: optional(num(2, 7)),
  })
  .map(({ spreadC, ...s }) => compact({ ...s, highDesignTempC: s.recordLowTempC + spreadC }));

export const moduleArb: fc.Arbitrary<PvModule> = fc
  .record({
    vocV: num(20, 60),
    vmpShare: num(0.7, 0.9),
    iscA: num(5, 15),
    impShare: num(0.85, 0.98),
    vocTempCoeff: optional(
      fc.oneof(
        fc.record({ value: num(-0.5, -0.2), unit: fc.constant("%/C" as const) }),
        fc.record({ value: num(-0.2, -0.05), unit: fc.constant("V/C" as const) }),
      ),
    ),
    pmaxTempCoeffPctPerC: optional(num(-0.5, -0.25)),
    maxSeriesFuseA: optional(fc.constantFrom(15, 20, 25, 30)),
    lengthIn: num(60, 90),
    widthIn: num(39, 46),
    weightLb: num(35, 60),
  })
  .map(({ vmpShare, impShare, ...m }) => {
    const vmpV = m.vocV * vmpShare;
    const impA = m.iscA * impShare;
    return compact({ ...m, maker: "Larkspur", model: "LS-GEN", vmpV, impA, powerW: Math.round(vmpV * impA) });
  });

const acOutputArb = fc
  .record({ acOutputCurrentA: num(8, 48), acVoltageV: fc.constantFrom(208, 240), phase: fc.constantFrom<1 | 3>(1, 3) })
  .map((o) => ({ ...o, acPowerW: Math.round(o.acOutputCurrentA * o.acVoltageV) }));

const ratingArb = (maxA: number) => fc.constantFrom(...STANDARD_OCPD_RATINGS_A.filter((r) => r <= maxA));

const racewayArb: fc.Arbitrary<Raceway> = fc.record({
  type: fc.constantFrom("EMT" as const, "PVC-40" as const),
  tradeSize: fc.constantFrom("1/2" as const, "3/4" as const, "1" as const, "1-1/4" as const, "1-1/2" as const, "2" as const),
  wires: fc.array(
    fc.oneof(
      fc.record({ size: fc.constantFrom(...THHN_SIZES), count: fc.integer({ min: 1, max: 6 }) }),
      fc.record({ size: fc.constantFrom(...CONDUCTOR_SIZES), count: fc.integer({ min: 1, max: 4 }), areaIn2: num(0.005, 0.5) }),
    ),
    { minLength: 1, maxLength: 3 },
  ),
});

function runArb(id: string, circuit: ConductorRun["circuit"], dc: boolean): fc.Arbitrary<ConductorRun> {
  return fc
    .record({
      material: materialArb,
      sizePick: fc.nat(),
      solid: fc.boolean(),
      insulationTempC: fc.constantFrom<75 | 90>(75, 90),
      insulation: optional(fc.constantFrom("PV wire", "THWN-2", "XHHW-2")),
      lengthFt: num(0, 300),
      terminalTempC: optional(fc.constantFrom<60 | 75 | 90>(60, 75, 90)),
      currentCarryingConductors: optional(fc.integer({ min: 1, max: 45 })),
      ambientTempC: optional(num(-10, 55)),
      roofClearanceIn: optional(num(0, 12)),
      ocpdA: optional(ratingArb(200)),
      ocpdIsFuse: dc ? optional(fc.boolean()) : fc.constant(undefined),
      egc: optional(fc.record({ size: fc.constantFrom(...CONDUCTOR_SIZES), material: materialArb })),
      conductorTempC: optional(num(20, 90)),
      raceway: optional(racewayArb),
    })
    .map(({ material, sizePick, solid, insulationTempC, insulation, ...r }) => {
      const sizes = listedSizes(material);
      const size = sizes[sizePick % sizes.length]!;
      // Table 8 lists solid copper up to 8 AWG only.
      const stranding = solid && material === "Cu" && ["14", "12", "10", "8"].includes(size) ? ("solid" as const) : undefined;
      return compact({
        ...r,
        id,
        label: id === "dc" ? "Array to inverter" : "Inverter to panel",
        circuit,
        conductor: compact({ size, material, stranding, insulationTempC, insulation }),
      });
    });
}

const serviceArb: fc.Arbitrary<ServicePanel> = fc
  .record({
    busbarA: fc.constantFrom(100, 125, 150, 200, 225),
    mainPick: fc.option(ratingArb(225), { nil: null }),
    connection: fc.constantFrom("load-side" as const, "supply-side" as const),
    pvBreakerA: ratingArb(100),
    pvBreakerAtOppositeEnd: fc.boolean(),
    otherBreakersA: optional(fc.array(ratingArb(60), { maxLength: 6 })),
    serviceConductorAmpacityA: optional(fc.constantFrom(100, 150, 200)),
    serviceLocation: optional(fc.constantFrom("east wall", "garage")),
    pvDisconnectLocation: optional(fc.constantFrom("beside the meter", "north wall")),
  })
  .map(({ mainPick, ...s }) =>
    compact({ ...s, voltageV: 240, phase: 1 as const, mainBreakerA: mainPick === null ? null : Math.min(mainPick, s.busbarA) }),
  );

/** One or two roof planes holding every module. */
function roofPlanesArb(moduleCount: number): fc.Arbitrary<RoofPlane[]> {
  return fc
    .record({ split: fc.boolean(), attachmentCount: fc.integer({ min: 4, max: 40 }), rackingWeightLb: num(0, 400) })
    .map(({ split, attachmentCount, rackingWeightLb }) => {
      const first = split && moduleCount > 1 ? Math.ceil(moduleCount / 2) : moduleCount;
      const planes: RoofPlane[] = [{ id: "south", label: "South roof", moduleCount: first, attachmentCount, rackingWeightLb }];
      if (first < moduleCount) {
        planes.push({
          id: "west",
          label: "West roof",
          moduleCount: moduleCount - first,
          attachmentCount,
          rackingWeightLb: rackingWeightLb / 2,
        });
      }
      return planes;
    });
}

const designExtrasArb = fc.record({
  mount: optional(fc.constantFrom("roof" as const, "ground" as const)),
  cellTempRiseC: optional(num(10, 35)),
  attachmentRatedLoadLb: optional(num(200, 600)),
  service: serviceArb,
});

/** String inverter with plain strings, behind shutdown devices or a listed system, or with none. */
const seriesDesignArb: fc.Arbitrary<Design> = fc
  .record({
    module: moduleArb,
    ac: acOutputArb,
    maxDcInputV: fc.constantFrom(480, 600, 1000),
    mpptMinV: optional(num(80, 250)),
    mpptMaxV: optional(num(300, 550)),
    maxInputIscA: optional(num(10, 40)),
    device: optional(fc.record({ maxInputV: num(60, 100), shutdownOutputV: optional(num(0.5, 2)) })),
    listedRapidShutdownSystem: optional(fc.boolean()),
    stringCount: fc.integer({ min: 1, max: 3 }),
    modulesInSeries: fc.integer({ min: 1, max: 20 }),
    oneInput: fc.boolean(),
    extras: designExtrasArb,
  })
  .chain((g) => {
    const inverter: Inverter = compact({
      id: "inv-1",
      maker: "Northmere",
      model: "NS-GEN",
      kind: "string" as const,
      quantity: 1,
      ...g.ac,
      maxDcInputV: g.maxDcInputV,
      mpptMinV: g.mpptMinV,
      mpptMaxV: g.mpptMaxV,
      maxInputIscA: g.maxInputIscA,
    });
    const strings: PvString[] = Array.from({ length: g.stringCount }, (_, i) => ({
      id: `S${i + 1}`,
      inverterId: "inv-1",
      mpptIndex: g.oneInput ? 1 : i + 1,
      modulesInSeries: g.modulesInSeries,
    }));
    const device: ModuleLevelDevice | undefined =
      g.device && compact({ kind: "shutdown-device" as const, maker: "Quillon", model: "QR-GEN", ...g.device });
    return fc
      .record({
        dc: runArb("dc", { kind: "dc-strings", stringIds: strings.map((s) => s.id) }, true),
        ac: runArb("ac", { kind: "ac-output", sources: [{ inverterId: "inv-1" }] }, false),
        roofPlanes: roofPlanesArb(g.stringCount * g.modulesInSeries),
        withPath: fc.boolean(),
      })
      .map(({ dc, ac, roofPlanes, withPath }) =>
        compact({
          ...g.extras,
          module: g.module,
          inverters: [inverter],
          moduleLevelDevice: device,
          listedRapidShutdownSystem: g.listedRapidShutdownSystem,
          strings,
          runs: [dc, ac],
          roofPlanes,
          paths: withPath ? [{ id: "p1", label: "Array to panel", runIds: ["dc", "ac"] }] : undefined,
        }),
      );
  });

/** Optimizer strings held at the inverter's fixed voltage. */
const optimizerDesignArb: fc.Arbitrary<Design> = fc
  .record({
    module: moduleArb,
    ac: acOutputArb,
    regulatedStringV: num(350, 420),
    maxStringPowerW: optional(num(4000, 8000)),
    optimizer: fc.record({ maxInputV: num(60, 85), maxInputIscA: optional(num(12, 20)), maxOutputCurrentA: num(10, 15) }),
    stringCount: fc.integer({ min: 1, max: 2 }),
    modulesInSeries: fc.integer({ min: 6, max: 20 }),
    extras: designExtrasArb,
  })
  .chain((g) => {
    const inverter: Inverter = compact({
      id: "inv-opt",
      maker: "Northmere",
      model: "NO-GEN",
      kind: "string" as const,
      quantity: 1,
      ...g.ac,
      maxDcInputV: 480,
      regulatedStringV: g.regulatedStringV,
      maxStringPowerW: g.maxStringPowerW,
    });
    const strings: PvString[] = Array.from({ length: g.stringCount }, (_, i) => ({
      id: `S${i + 1}`,
      inverterId: "inv-opt",
      modulesInSeries: g.modulesInSeries,
    }));
    const optimizer: ModuleLevelDevice = compact({ kind: "optimizer" as const, maker: "Fenwick", model: "FO-GEN", ...g.optimizer });
    return fc
      .record({
        dc: runArb("dc", { kind: "dc-strings", stringIds: strings.map((s) => s.id) }, true),
        ac: runArb("ac", { kind: "ac-output", sources: [{ inverterId: "inv-opt" }] }, false),
        roofPlanes: roofPlanesArb(g.stringCount * g.modulesInSeries),
      })
      .map(({ dc, ac, roofPlanes }) =>
        compact({
          ...g.extras,
          module: g.module,
          inverters: [inverter],
          moduleLevelDevice: optimizer,
          strings,
          runs: [dc, ac],
          roofPlanes,
        }),
      );
  });

/** Micro-inverters, one per module: no DC wiring leaves the array. */
const microDesignArb: fc.Arbitrary<Design> = fc
  .record({
    module: moduleArb,
    moduleCount: fc.integer({ min: 1, max: 30 }),
    unitA: num(0.8, 1.6),
    acVoltageV: fc.constantFrom(208, 240),
    maxDcInputV: num(48, 80),
    mpptMinV: optional(num(16, 30)),
    mpptMaxV: optional(num(36, 55)),
    maxInputIscA: optional(num(10, 20)),
    extras: designExtrasArb,
  })
  .chain((g) => {
    const micro: Inverter = compact({
      id: "micro",
      maker: "Halvard",
      model: "HM-GEN",
      kind: "micro" as const,
      quantity: g.moduleCount,
      acPowerW: Math.round(g.unitA * g.acVoltageV),
      acOutputCurrentA: g.unitA,
      acVoltageV: g.acVoltageV,
      phase: 1 as const,
      maxDcInputV: g.maxDcInputV,
      mpptMinV: g.mpptMinV,
      mpptMaxV: g.mpptMaxV,
      maxInputIscA: g.maxInputIscA,
    });
    return fc
      .record({
        ac: runArb("ac", { kind: "ac-output", sources: [{ inverterId: "micro" }] }, false),
        roofPlanes: roofPlanesArb(g.moduleCount),
      })
      .map(({ ac, roofPlanes }) => compact({ ...g.extras, module: g.module, inverters: [micro], strings: [], runs: [ac], roofPlanes }));
  });

/** A complete design the review accepts: every entry present, finite and in range. */
export const designArb: fc.Arbitrary<Design> = fc.oneof(seriesDesignArb, optimizerDesignArb, microDesignArb);
