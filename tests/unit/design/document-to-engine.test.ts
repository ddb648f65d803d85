import { describe, expect, it } from "vitest";
import { DesignDocument, type DesignDocumentInput } from "@/lib/design/document";
import { WHOLE_ARRAY_PLANE_ID, documentToEngine, parallelStringIds } from "@/lib/design/document-to-engine";
import { exampleDocument } from "./document-fixtures";

type Edit = (doc: DesignDocumentInput & Record<string, any>) => void;

const convert = (edit: Edit = () => {}) => {
  const doc = exampleDocument();
  edit(doc);
  return documentToEngine(DesignDocument.parse(doc));
};
const engine = (edit?: Edit) => {
  const out = convert(edit);
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return out;
};

describe("documentToEngine", () => {
  it("maps the document's names and units onto the engine's", () => {
    const { design, site } = engine();
    expect(site).toEqual({ recordLowTempC: -20, highDesignTempC: 33, necEdition: 2020, isDwelling: true, peakSunHours: undefined });
    expect(design.module).toMatchObject({ powerW: 400, vocV: 40, vocTempCoeff: { value: -0.28, unit: "%/C" }, weightLb: 48.5 });
    // A square of the same area stands in for the outline: the roof load reads only the area.
    expect((design.module.lengthIn * design.module.widthIn) / 144).toBeCloseTo(21.4, 9);
    expect(design.inverters[0]).toMatchObject({
      id: "inv-1",
      quantity: 1,
      acPowerW: 7600,
      acOutputCurrentA: 32,
      acVoltageV: 240,
      phase: 1,
      maxInputIscA: 26,
    });
    expect(design.moduleLevelDevice).toMatchObject({ kind: "shutdown-device", maxInputV: 80, maxInputIscA: 15, shutdownOutputV: 1 });
    expect(design.runs[0]).toMatchObject({
      circuit: { kind: "dc-strings", stringIds: ["S1"], combined: false },
      conductor: { size: "10", material: "Cu", stranding: "stranded", insulationTempC: 90 },
      terminalTempC: 75,
      ambientTempC: 33,
      roofClearanceIn: 1,
      currentCarryingConductors: 2,
    });
    expect(design.runs[2].circuit).toEqual({ kind: "ac-output", sources: [{ inverterId: "inv-1" }], combined: true });
    // Without a wires list the engine fills the raceway from the run's circuits (see runRacewayWires).
    expect(design.runs[2].raceway).toEqual({ type: "EMT", tradeSize: "3/4", wires: undefined });
  });

  it("takes the Voc coefficient in V/°C too", () => {
    const { design } = engine((d) => {
      delete d.modules[0].vocTempCoeffPctPerC;
      d.modules[0].vocTempCoeffVPerC = -0.112;
    });
    expect(design.module.vocTempCoeff).toEqual({ value: -0.112, unit: "V/C" });
  });

  it("numbers parallel copies of a string as the design editor does, and a dc-output run carries an inverter's strings", () => {
    expect(parallelStringIds("S1", 1)).toEqual(["S1"]);
    expect(parallelStringIds("S1", 3)).toEqual(["S1.1", "S1.2", "S1.3"]);
    const { design } = engine((d) => {
      d.strings = [{ ...d.strings![0], parallel: 2 }];
      d.inverters[0].maxInputCurrentA = 30;
      d.runs = [{ ...d.runs![0], circuit: "dc-output", stringId: undefined, inverterId: "inv-1" }];
    });
    expect(design.strings.map((s) => s.id)).toEqual(["S1.1", "S1.2"]);
    // a dc-output run is the inverter's input circuit: its strings joined, unless the document says otherwise
    expect(design.runs[0].circuit).toEqual({ kind: "dc-strings", stringIds: ["S1.1", "S1.2"], combined: true });
  });

  it("fills the defaults a short document leaves out: dwelling, one unit, the smallest PV breaker that fits", () => {
    const { design, site } = engine((d) => {
      delete d.service.pvBreakerA;
      delete d.inverters[0].maxDcInputV;
    });
    expect(site.isDwelling).toBe(true);
    // 705.30(B) and 240.6(A): 1.25 × 32 A = 40 A, itself a standard rating.
    expect(design.service.pvBreakerA).toBe(40);
    // Without the inverter's own limit, the 690.7 limit for a dwelling applies.
    expect(design.inverters[0].maxDcInputV).toBe(600);
  });

  it("counts modules from the strings when the document gives no roof planes, and takes given planes as they are", () => {
    expect(engine().design.roofPlanes).toEqual([
      { id: WHOLE_ARRAY_PLANE_ID, label: "Whole array", moduleCount: 20, attachmentCount: 1, rackingWeightLb: 0 },
    ]);
    const { design, sources } = engine((d) => {
      d.roofPlanes = [{ id: "south", moduleCount: 20, attachmentCount: 24, rackingWeightLb: 180 }];
    });
    expect(design.roofPlanes).toEqual([{ id: "south", label: "south", moduleCount: 20, attachmentCount: 24, rackingWeightLb: 180 }]);
    expect(sources.roofPlanesGiven).toBe(true);
  });

  it("counts micro-inverter units as modules when there are no strings", () => {
    const { design } = engine((d) => {
      d.inverters = [
        { id: "micro", kind: "micro", quantity: 16, acRatedW: 320, acMaxContinuousA: 1.33, acNominalV: 240, phases: 1, maxDcInputV: 60 },
      ];
      d.optimizers = [];
      d.strings = [];
      d.runs = [{ ...d.runs![2], inverterId: "micro" }];
    });
    expect(design.strings).toEqual([]);
    expect(design.roofPlanes[0].moduleCount).toBe(16);
  });

  const micro = {
    id: "micro",
    kind: "micro" as const,
    acRatedW: 320,
    acMaxContinuousA: 1.33,
    acNominalV: 240,
    phases: 1 as const,
    maxDcInputV: 60,
  };
  const second = { id: "nm-380", pmaxW: 380, vocV: 41.6, vmpV: 34.5, iscA: 11.62, impA: 11.02 };

  it.each<[string, Edit, string, RegExp]>([
    [
      "a string names an unknown inverter",
      (d) => {
        d.strings![0].inverterId = "inv-9";
      },
      "strings[0].inverterId",
      /No inverter with id "inv-9"/,
    ],
    [
      "two module models are mixed",
      (d) => {
        d.modules.push(second);
        d.strings![1].moduleId = "nm-380";
      },
      "strings[1].moduleId",
      /one module model per design/,
    ],
    [
      "one string has no device and the other has one",
      (d) => {
        delete d.strings![1].optimizerId;
      },
      "strings[1].optimizerId",
      /one module-level device, or none/,
    ],
    [
      "a string is wired to a micro-inverter",
      (d) => {
        d.inverters.push(micro);
        d.strings![1].inverterId = "micro";
      },
      "strings[1].inverterId",
      /micro-inverter/,
    ],
    [
      "a micro-inverter has no input limit",
      (d) => {
        d.inverters.push({ ...micro, maxDcInputV: undefined });
      },
      "inverters[1].maxDcInputV",
      /cold Voc/,
    ],
    [
      "two strings share an id",
      (d) => {
        d.strings![1].id = "S1";
      },
      "strings[1].id",
      /already uses the id "S1"/,
    ],
    [
      "two runs share an id",
      (d) => {
        d.runs![1].id = "r1";
      },
      "runs[1].id",
      /already uses the id "r1"/,
    ],
    [
      "a dc-string run names no string",
      (d) => {
        delete d.runs![0].stringId;
      },
      "runs[0].stringId",
      /Name the string/,
    ],
    [
      "a run names an unknown string",
      (d) => {
        d.runs![0].stringId = "S7";
      },
      "runs[0].stringId",
      /No string with id "S7"/,
    ],
    [
      "an AC run names a string",
      (d) => {
        d.runs![2].stringId = "S1";
      },
      "runs[2].stringId",
      /Only dc-string runs/,
    ],
    [
      "a run uses 60 °C insulation",
      (d) => {
        d.runs![1].insulationC = 60;
      },
      "runs[1].insulationC",
      /75 °C and 90 °C/,
    ],
    [
      "both Voc coefficient units are given",
      (d) => {
        d.modules[0].vocTempCoeffVPerC = -0.11;
      },
      "modules[0].vocTempCoeffVPerC",
      /not both/,
    ],
    [
      "Vmp is above Voc",
      (d) => {
        d.modules[0].vmpV = 41;
      },
      "modules[0].vmpV",
      /Vmp must not exceed Voc/,
    ],
    [
      "roof planes need the module weight",
      (d) => {
        d.roofPlanes = [{ id: "p", moduleCount: 20, attachmentCount: 20, rackingWeightLb: 100 }];
        delete d.modules[0].weightLb;
      },
      "modules[0].weightLb",
      /weight/,
    ],
    [
      "the record low is above the high ambient",
      (d) => {
        d.site.recordLowC = 40;
      },
      "site.recordLowC",
      /above the high ambient/,
    ],
    [
      "a voltage-drop path names an unknown run",
      (d) => {
        d.paths = [{ id: "p1", runIds: ["r1", "r9"] }];
      },
      "paths[0].runIds[1]",
      /No run with id "r9"/,
    ],
  ])("names the field when %s", (_what, edit, path, message) => {
    const out = convert(edit);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems).toContainEqual({ path, message: expect.stringMatching(message) });
  });
});
