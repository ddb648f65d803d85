import type { DesignDocumentInput } from "@/lib/design/document";

/**
 * A design document with only the fields the issue lists: 20 invented Larkspur modules
 * in two strings of 10 on one invented Northmere string inverter, each module behind a
 * shutdown device, on a 200 A busbar with a 200 A main. No roof planes, no EGCs.
 */
export function exampleDocument(): DesignDocumentInput {
  const dcRun = (id: string, stringId: string) => ({
    id,
    circuit: "dc-string" as const,
    stringId,
    lengthFt: 100,
    material: "Cu" as const,
    size: "10 AWG",
    stranded: true,
    insulation: "PV wire",
    insulationC: 90 as const,
    terminalC: 75 as const,
    ambientC: 33,
    aboveRoofIn: 1,
    currentCarrying: 2,
  });
  return {
    codeEdition: "2020",
    site: { recordLowC: -20, highAmbientC: 33 },
    modules: [
      {
        id: "lk-400",
        pmaxW: 400,
        vocV: 40,
        vmpV: 33.6,
        iscA: 12.2,
        impA: 11.9,
        vocTempCoeffPctPerC: -0.28,
        pmaxTempCoeffPctPerC: -0.35,
        weightLb: 48.5,
        areaFt2: 21.4,
      },
    ],
    inverters: [
      {
        id: "inv-1",
        kind: "string",
        acRatedW: 7600,
        acMaxContinuousA: 32,
        acNominalV: 240,
        phases: 1,
        maxDcInputV: 600,
        mpptMinV: 200,
        mpptMaxV: 480,
        maxInputCurrentA: 26,
      },
    ],
    optimizers: [
      {
        id: "rsd-1",
        ratedInputW: 500,
        maxInputV: 80,
        maxInputCurrentA: 15,
        maxOutputCurrentA: 15,
        shutdownOutputV: 1,
        kind: "shutdown-device",
      },
    ],
    strings: [
      { id: "S1", inverterId: "inv-1", moduleId: "lk-400", optimizerId: "rsd-1", modulesInSeries: 10, parallel: 1 },
      { id: "S2", inverterId: "inv-1", moduleId: "lk-400", optimizerId: "rsd-1", modulesInSeries: 10, parallel: 1 },
    ],
    service: {
      nominalV: 240,
      phases: 1,
      busbarA: 200,
      mainBreakerA: 200,
      connection: "load-side",
      pvBreakerA: 40,
      pvBreakerOppositeEnd: true,
    },
    runs: [
      dcRun("r1", "S1"),
      dcRun("r2", "S2"),
      {
        id: "r3",
        circuit: "ac-output",
        inverterId: "inv-1",
        lengthFt: 50,
        material: "Cu",
        size: "8 AWG",
        stranded: true,
        insulation: "THWN-2",
        insulationC: 90,
        terminalC: 75,
        ambientC: 33,
        currentCarrying: 2,
        conduit: { type: "EMT", tradeSize: "3/4" },
      },
    ],
  };
}
