import type { DesignFormValues } from "@/lib/schemas/design";

type ServiceFacts = { serviceVoltageV: number | null; servicePhases: number | null; busbarA: number | null; mainBreakerA: number | null };

const str = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));

/** A blank design for a project, prefilled from what the project already knows about its service. */
export function newDesignDraft(project: ServiceFacts): DesignFormValues {
  return {
    equipment: { moduleId: "", inverters: [{ lineId: "inv-1", equipmentId: "", quantity: "1" }], deviceId: "", listedRapidShutdownSystem: false },
    array: {
      mount: "roof",
      roofPlanes: [{ lineId: "plane-1", label: "South roof", tiltDeg: "", azimuthDeg: "180", moduleCount: "", attachmentCount: "", rackingWeightLb: "" }],
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
    },
    runs: [
      {
        lineId: "run-1", label: "Array to junction box", circuit: "dc:S1", lengthFt: "", material: "Cu", size: "10", stranding: "stranded",
        insulation: "PV wire", insulationTempC: "90", terminalTempC: "75", ambientTempC: "", onRoof: true, roofClearanceIn: "1",
        currentCarryingConductors: "2", racewayType: "none", tradeSize: "", ocpdA: "", egcSize: "10",
      },
      {
        lineId: "run-2", label: "Inverter to service panel", circuit: "ac:all", lengthFt: "", material: "Cu", size: "8", stranding: "stranded",
        insulation: "THWN-2", insulationTempC: "90", terminalTempC: "75", ambientTempC: "", onRoof: false, roofClearanceIn: "",
        currentCarryingConductors: "2", racewayType: "EMT", tradeSize: "3/4", ocpdA: "", egcSize: "10",
      },
    ],
    site: { isDwelling: true, peakSunHours: "" },
  };
}
