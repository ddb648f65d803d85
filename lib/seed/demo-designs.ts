// Designs for the demo projects that are past "Draft", built as the editor
// would hold them. Three invented system types, chosen by the service size.
import { BLANK_SERVICE_DETAILS } from "@/lib/design/defaults";
import type { DesignFormValues } from "@/lib/schemas/design";

export type CatalogIds = Record<
  | "stringModule"
  | "optimizerModule"
  | "microModule"
  | "stringInverter"
  | "optimizerInverter"
  | "microInverter"
  | "optimizer"
  | "shutdownDevice",
  string
>;

/** Demo catalog models each design type uses (see demo-catalog.ts). */
export const DESIGN_MODELS: Record<keyof CatalogIds, string> = {
  stringModule: "LK-405M-54H",
  optimizerModule: "NM-380B Slate",
  microModule: "HV-370 Black",
  stringInverter: "QS-7600",
  optimizerInverter: "CB-6000R",
  microInverter: "PM-320 Micro",
  optimizer: "CB-P450 Optimizer",
  shutdownDevice: "SR-1 Shutdown Unit",
};

type Service = { busbarA: number; mainBreakerA: number };

// String runs cross the roof in free air as PV wire with a bare 6 AWG grounding conductor (250.120(C) needs
// no raceway for 6 AWG) and stay outdoors down to an inverter on the outside wall.
const run = (
  lineId: string,
  label: string,
  circuit: string,
  lengthFt: number,
  size: string,
  more: Partial<DesignFormValues["runs"][number]> = {},
): DesignFormValues["runs"][number] => ({
  lineId,
  label,
  circuit,
  lengthFt: String(lengthFt),
  material: "Cu",
  size: size as DesignFormValues["runs"][number]["size"],
  stranding: "stranded",
  insulation: "PV wire",
  wireAreaIn2: "",
  insulationTempC: "90",
  terminalTempC: "75",
  ambientTempC: "",
  onRoof: true,
  roofClearanceIn: "1",
  currentCarryingConductors: "2",
  arrangement: "",
  racewayType: "none",
  tradeSize: "",
  route: "outdoors",
  ocpdA: "",
  egcSize: "6",
  ...more,
});
const homeRun = (lineId: string, label: string, circuit: string, lengthFt: number, size: string) =>
  run(lineId, label, circuit, lengthFt, size, {
    insulation: "THWN-2",
    onRoof: false,
    roofClearanceIn: "",
    racewayType: "EMT",
    tradeSize: "3/4",
    route: "inside",
    egcSize: "10",
  });

function base(
  service: Service,
  pvBreakerA: number,
  connection: "load-side" | "supply-side",
): Omit<DesignFormValues, "equipment" | "array" | "runs"> {
  // A supply-side tap goes through a fused disconnect beside the meter; a load-side connection's PV breaker is the disconnect.
  const disconnect =
    connection === "supply-side"
      ? {
          pvDisconnectKind: "fused-switch",
          pvDisconnectRatingA: "60",
          pvDisconnectVoltageV: "240",
          pvDisconnectAccessible: "yes",
          supplyConductorSize: "6",
          supplyConductorMaterial: "Cu",
          supplyTapLengthFt: "4",
        }
      : { pvDisconnectKind: "pv-breaker" };
  return {
    service: {
      voltageV: "240",
      phase: "1",
      busbarA: String(service.busbarA),
      mainBreakerA: String(service.mainBreakerA),
      connection,
      pvBreakerA: String(pvBreakerA),
      pvBreakerAtOppositeEnd: true,
      otherBreakersA: "",
      serviceLocation: "East wall, beside the meter",
      pvDisconnectLocation: "Within 10 ft of the meter",
      ...BLANK_SERVICE_DETAILS,
      ...disconnect,
      rsdInitiatorKind: connection === "supply-side" ? "pv-disconnect" : "service-disconnect",
      rsdInitiatorOutside: "yes",
    } as DesignFormValues["service"],
    site: { isDwelling: true, peakSunHours: "5.4" },
  };
}

/** A demo design that suits the service: supply side for 100 A, microinverters for 150 A, strings otherwise. */
export function demoDesign(ids: CatalogIds, service: Service, variant: number): DesignFormValues {
  if (service.mainBreakerA <= 100 || (service.mainBreakerA >= 200 && variant % 2 === 0)) {
    return {
      ...base(service, 40, service.mainBreakerA <= 100 ? "supply-side" : "load-side"),
      equipment: {
        moduleId: ids.stringModule,
        inverters: [{ lineId: "inv-1", equipmentId: ids.stringInverter, quantity: "1" }],
        deviceId: ids.shutdownDevice,
        listedRapidShutdownSystem: false,
      },
      array: {
        mount: "roof",
        roofPlanes: [
          {
            lineId: "plane-1",
            label: "South roof",
            tiltDeg: "23",
            azimuthDeg: "185",
            moduleCount: "22",
            attachmentCount: "28",
            rackingWeightLb: "160",
          },
        ],
        strings: [
          { lineId: "S1", inverterLineId: "inv-1", mpptIndex: "1", modulesInSeries: "11", parallelCount: "1" },
          { lineId: "S2", inverterLineId: "inv-1", mpptIndex: "2", modulesInSeries: "11", parallelCount: "1" },
        ],
      },
      runs: [
        run("run-1", "String S1 to inverter", "dc:S1", 62, "10"),
        run("run-2", "String S2 to inverter", "dc:S2", 66, "10"),
        homeRun("run-3", "Inverter to service panel", "ac:all", 28, "8"),
      ],
    };
  }
  if (service.mainBreakerA < 200) {
    const micro = base(service, 30, "load-side");
    return {
      ...micro,
      // The two branch circuits land in a 125 A AC combiner beside the service panel.
      service: { ...micro.service, combinerBusbarA: "125" },
      equipment: {
        moduleId: ids.microModule,
        inverters: [
          { lineId: "inv-1", equipmentId: ids.microInverter, quantity: "8" },
          { lineId: "inv-2", equipmentId: ids.microInverter, quantity: "8" },
        ],
        deviceId: "",
        listedRapidShutdownSystem: false,
      },
      array: {
        mount: "roof",
        roofPlanes: [
          {
            lineId: "plane-1",
            label: "West roof",
            tiltDeg: "26",
            azimuthDeg: "250",
            moduleCount: "16",
            attachmentCount: "22",
            rackingWeightLb: "120",
          },
        ],
        strings: [],
      },
      runs: [
        run("run-1", "Branch 1 on the roof", "ac:inv-1", 35, "12", { insulation: "THWN-2", ocpdA: "20", egcSize: "12", route: "" }),
        run("run-2", "Branch 2 on the roof", "ac:inv-2", 40, "12", { insulation: "THWN-2", ocpdA: "20", egcSize: "12", route: "" }),
        homeRun("run-3", "Combiner to service panel", "ac:all", 45, "10"),
      ],
    };
  }
  return {
    ...base(service, 35, "load-side"),
    equipment: {
      moduleId: ids.optimizerModule,
      inverters: [{ lineId: "inv-1", equipmentId: ids.optimizerInverter, quantity: "1" }],
      deviceId: ids.optimizer,
      listedRapidShutdownSystem: false,
    },
    array: {
      mount: "roof",
      roofPlanes: [
        {
          lineId: "plane-1",
          label: "South roof",
          tiltDeg: "20",
          azimuthDeg: "175",
          moduleCount: "20",
          attachmentCount: "26",
          rackingWeightLb: "150",
        },
      ],
      strings: [
        { lineId: "S1", inverterLineId: "inv-1", mpptIndex: "1", modulesInSeries: "10", parallelCount: "1" },
        { lineId: "S2", inverterLineId: "inv-1", mpptIndex: "1", modulesInSeries: "10", parallelCount: "1" },
      ],
    },
    runs: [
      run("run-1", "String S1 to inverter", "dc:S1", 55, "10"),
      run("run-2", "String S2 to inverter", "dc:S2", 58, "10"),
      homeRun("run-3", "Inverter to service panel", "ac:all", 30, "8"),
    ],
  };
}
