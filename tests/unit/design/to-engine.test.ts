import { describe, expect, it } from "vitest";
import { toEngineInput } from "@/lib/design/to-engine";
import { DesignInput } from "@/lib/schemas/design";
import { CATALOG, CONDITIONS, INVERTER, completeDraft } from "./fixtures";

const parse = (draft = completeDraft()) => DesignInput.parse(draft);

describe("toEngineInput", () => {
  it("expands parallel strings and resolves catalog items", () => {
    const out = toEngineInput(parse(), CATALOG, CONDITIONS);
    if (!out.ok) throw new Error(JSON.stringify(out.problems));
    expect(out.design.strings.map((s) => s.id)).toEqual(["S1.1", "S1.2"]);
    expect(out.design.strings.every((s) => s.inverterId === "inv-1" && s.modulesInSeries === 10)).toBe(true);
    expect(out.design.inverters[0]).toMatchObject({ id: "inv-1", model: "NM-7600", kind: "string", acOutputCurrentA: 32, quantity: 1 });
    expect(out.design.moduleLevelDevice).toMatchObject({ kind: "shutdown-device", maxInputV: 80 });
    // Two parallel copies on one run are two circuits unless the run says they were joined before it.
    expect(out.design.runs[0].circuit).toEqual({ kind: "dc-strings", stringIds: ["S1.1", "S1.2"], combined: false });
    expect(out.design.runs[0].roofClearanceIn).toBe(1);
    expect(out.design.runs[0]).toMatchObject({ insideBuilding: false, terminalTempC: undefined, currentCarryingConductors: undefined });
    expect(out.design.runs[1].circuit).toEqual({ kind: "ac-output", sources: [{ inverterId: "inv-1" }], combined: true });
    expect(out.design.runs[1].raceway).toEqual({ type: "EMT", tradeSize: "3/4" });
    expect(out.design.pvDisconnect).toEqual({
      kind: "pv-breaker",
      ratingA: undefined,
      voltageRatingV: undefined,
      readilyAccessible: undefined,
    });
    expect(out.site).toEqual({ ...CONDITIONS, isDwelling: true, peakSunHours: undefined });
  });

  it("names the field when a catalog item is missing or of the wrong kind", () => {
    const draft = completeDraft();
    draft.equipment.moduleId = INVERTER.id;
    const out = toEngineInput(parse(draft), CATALOG, CONDITIONS);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems).toContainEqual({ path: "equipment.moduleId", message: "Choose a PV module from the catalog" });
  });

  it("refuses a run that carries a string no longer in the design", () => {
    const draft = completeDraft();
    draft.runs[0].circuit = "dc:S9";
    const out = toEngineInput(parse(draft), CATALOG, CONDITIONS);
    expect(out.ok ? [] : out.problems.map((p) => p.path)).toEqual(["runs.0.circuit"]);
  });

  it.each([
    ["combined", true],
    ["separate", false],
  ] as const)("the run's arrangement %s sets whether its strings are joined", (arrangement, combined) => {
    const draft = completeDraft();
    draft.runs[0].arrangement = arrangement;
    const out = toEngineInput(parse(draft), CATALOG, CONDITIONS);
    expect(out.ok && out.design.runs[0].circuit).toMatchObject({ combined });
  });

  it("maps Type MC cable, the route into the building and the service details", () => {
    const draft = completeDraft();
    Object.assign(draft.runs[1], {
      racewayType: "MC",
      tradeSize: "",
      route: "inside",
      terminalTempC: "60",
      currentCarryingConductors: "4",
      wireAreaIn2: "0.03",
    });
    Object.assign(draft.service, {
      rsdInitiatorKind: "switch",
      rsdInitiatorOutside: "yes",
      gecSize: "6",
      gecMaterial: "Cu",
      gecElectrode: "rod-pipe-plate",
      serviceConductorSize: "2/0",
      serviceConductorMaterial: "Al",
    });
    const out = toEngineInput(parse(draft), CATALOG, CONDITIONS);
    if (!out.ok) throw new Error(JSON.stringify(out.problems));
    expect(out.design.runs[1]).toMatchObject({
      mcCable: true,
      raceway: undefined,
      insideBuilding: true,
      terminalTempC: 60,
      currentCarryingConductors: 4,
      wireAreaIn2: 0.03,
    });
    expect(out.design.rapidShutdownInitiator).toEqual({ kind: "switch", outsideReadilyAccessible: true });
    expect(out.design.groundingElectrodeConductor).toEqual({ size: "6", material: "Cu", electrode: "rod-pipe-plate" });
    expect(out.design.service.serviceConductor).toEqual({ size: "2/0", material: "Al" });
  });
});
