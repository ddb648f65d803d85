import { describe, expect, it } from "vitest";
import { conductorSchedule } from "@/lib/design/conductor-schedule";
import { toEngineInput } from "@/lib/design/to-engine";
import { DesignInput } from "@/lib/schemas/design";
import { CATALOG, CONDITIONS, completeDraft } from "./fixtures";

const schedule = (draft = completeDraft()) => {
  const input = DesignInput.parse(draft);
  const engine = toEngineInput(input, CATALOG, CONDITIONS);
  if (!engine.ok) throw new Error(JSON.stringify(engine.problems));
  return conductorSchedule(input, engine.design, [{ lineId: "inv-1", quantity: 1, model: "NM-7600" }]);
};

// Table 310.15(C)(1) counts what the raceway carries: two strings in one conduit are one run with two
// circuits and four current-carrying conductors (issue 11, design editor).
describe("conductor schedule", () => {
  it("prints two strings in one raceway as one run with 4 current-carrying conductors", () => {
    // completeDraft: string line S1 with 2 in parallel, carried by run-1
    const [dc, ac] = schedule();
    expect(dc).toMatchObject({
      label: "Array to junction box",
      carries: "String S1 (2 circuits)",
      circuits: 2,
      currentCarrying: 4,
      conductors: "4 × 10 AWG Cu PV wire, 90 °C",
    });
    expect(ac).toMatchObject({
      carries: "Inverter output",
      circuits: 1,
      currentCarrying: 2,
      conductors: "2 × 8 AWG Cu THWN-2, 90 °C",
      raceway: "3/4 in EMT",
      ocpd: "PV breaker",
    });
  });

  it("strings joined before the run are one circuit of two conductors", () => {
    const draft = completeDraft();
    draft.runs[0].arrangement = "combined";
    expect(schedule(draft)[0]).toMatchObject({ carries: "String S1", circuits: 1, currentCarrying: 2 });
  });

  it("an entered count above the circuits' own is kept (other circuits share the raceway); Type MC cable is named", () => {
    const draft = completeDraft();
    Object.assign(draft.runs[1], { currentCarryingConductors: "6", racewayType: "MC", tradeSize: "" });
    expect(schedule(draft)[1]).toMatchObject({ currentCarrying: 6, conductors: "6 × 8 AWG Cu THWN-2, 90 °C", raceway: "Type MC cable" });
  });
});
