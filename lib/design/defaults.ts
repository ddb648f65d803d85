import type { DesignDraft, DesignFormValues } from "@/lib/schemas/design";

type ServiceFacts = { serviceVoltageV: number | null; servicePhases: number | null; busbarA: number | null; mainBreakerA: number | null };

const str = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));

/** The service step's less common entries, blank until the design needs them. */
export const BLANK_SERVICE_DETAILS = {
  panelFeed: "end",
  loadSideAt: "busbar",
  feederAmpacityA: "",
  feederOcpdA: "",
  feederLoadSideOcpdA: "",
  feederTapAmpacityA: "",
  feederAtOppositeEnd: false,
  supplyConductorSize: "",
  supplyConductorMaterial: "",
  supplyTapLengthFt: "",
  serviceConductorSize: "",
  serviceConductorMaterial: "",
  pvDisconnectKind: "pv-breaker",
  pvDisconnectRatingA: "",
  pvDisconnectVoltageV: "",
  pvDisconnectAccessible: "",
  rsdInitiatorKind: "",
  rsdInitiatorOutside: "",
  gecSize: "",
  gecMaterial: "",
  gecElectrode: "",
  combinerBusbarA: "",
} satisfies Partial<DesignFormValues["service"]>;

/** A blank design for a project, prefilled from what the project already knows about its service. */
export function newDesignDraft(project: ServiceFacts): DesignFormValues {
  return {
    equipment: {
      moduleId: "",
      inverters: [{ lineId: "inv-1", equipmentId: "", quantity: "1" }],
      deviceId: "",
      listedRapidShutdownSystem: false,
    },
    array: {
      mount: "roof",
      roofPlanes: [
        {
          lineId: "plane-1",
          label: "South roof",
          tiltDeg: "",
          azimuthDeg: "180",
          moduleCount: "",
          attachmentCount: "",
          rackingWeightLb: "",
        },
      ],
      strings: [{ lineId: "S1", inverterLineId: "inv-1", mpptIndex: "1", modulesInSeries: "", parallelCount: "1" }],
    },
    service: {
      voltageV: (str(project.serviceVoltageV) || "240") as DesignFormValues["service"]["voltageV"],
      phase: (str(project.servicePhases) || "1") as DesignFormValues["service"]["phase"],
      busbarA: str(project.busbarA),
      mainBreakerA: str(project.mainBreakerA),
      connection: "load-side",
      pvBreakerA: "",
      pvBreakerAtOppositeEnd: true,
      otherBreakersA: "",
      serviceLocation: "",
      pvDisconnectLocation: "",
      ...BLANK_SERVICE_DETAILS,
    },
    runs: [
      {
        lineId: "run-1",
        label: "Array to junction box",
        circuit: "dc:S1",
        lengthFt: "",
        material: "Cu",
        size: "10",
        stranding: "stranded",
        insulation: "PV wire",
        wireAreaIn2: "",
        insulationTempC: "90",
        terminalTempC: "",
        ambientTempC: "",
        onRoof: true,
        roofClearanceIn: "1",
        currentCarryingConductors: "",
        arrangement: "",
        racewayType: "none",
        tradeSize: "",
        route: "outdoors",
        ocpdA: "",
        egcSize: "6",
      },
      {
        lineId: "run-2",
        label: "Inverter to service panel",
        circuit: "ac:all",
        lengthFt: "",
        material: "Cu",
        size: "8",
        stranding: "stranded",
        insulation: "THWN-2",
        wireAreaIn2: "",
        insulationTempC: "90",
        terminalTempC: "",
        ambientTempC: "",
        onRoof: false,
        roofClearanceIn: "",
        currentCarryingConductors: "",
        arrangement: "",
        racewayType: "EMT",
        tradeSize: "3/4",
        route: "",
        ocpdA: "",
        egcSize: "10",
      },
    ],
    site: { isDwelling: true, peakSunHours: "" },
    storage: { coupling: "none" },
  };
}

/**
 * The editor's starting values from a saved draft. A design saved before storage existed has no battery:
 * the storage step opens on "No battery". The page checks these same values on the server for the first paint.
 */
export function editorValues(draft: DesignDraft): DesignFormValues {
  return { ...draft, storage: draft.storage ?? { coupling: "none" } } as DesignFormValues;
}
