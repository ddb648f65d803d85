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
    expect(out.design.runs[0].circuit).toEqual({ kind: "dc-strings", stringIds: ["S1.1", "S1.2"] });
    expect(out.design.runs[0].roofClearanceIn).toBe(1);
    expect(out.design.runs[1].circuit).toEqual({ kind: "ac-output", sources: [{ inverterId: "inv-1" }] });
    expect(out.design.runs[1].raceway).toEqual({ type: "EMT", tradeSize: "3/4", wires: [{ size: "8", count: 2 }, { size: "10", count: 1 }] });
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
});
