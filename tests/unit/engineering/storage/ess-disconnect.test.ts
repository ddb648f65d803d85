import { describe, expect, test } from "vitest";
import { type EssDisconnect, reviewDesign } from "@/lib/engineering";
import { coldSite } from "../fixtures";
import { acStorage, dcStorage, storedDesign } from "./fixtures";

const check = (r: ReturnType<typeof reviewDesign>, id: string) => r.checks.find((c) => c.id === id);
const withDisconnect = (disconnect: EssDisconnect | undefined, edition: 2017 | 2020 | 2023 = 2020, isDwelling = true) =>
  reviewDesign(storedDesign(dcStorage({ disconnect })), { ...coldSite, necEdition: edition, isDwelling });

// The ESS disconnecting means: within the ESS, within sight, or lockable open where out of sight (2023 706.15(B), per a
// trade summary of the 2023 changes; 2020 706.15(A) and 2017 706.7(A) from memory).
describe("energy storage disconnect (706.15; 2017 706.7)", () => {
  test.each([
    [{ kind: "integral" }, "pass"],
    [{ kind: "separate", withinSight: true }, "pass"],
    [{ kind: "separate", withinSight: false, lockable: true }, "pass"],
    [{ kind: "separate", withinSight: false, lockable: false }, "fail"],
    [{ kind: "separate", withinSight: false }, "warn"],
    [undefined, "warn"],
  ] as const)("%j → %s", (disconnect, status) => {
    expect(check(withDisconnect(disconnect), "ess-disconnect")).toMatchObject({ status });
  });

  test.each([
    [2017, "NEC 2017 706.7(A)"], // from memory
    [2020, "NEC 2020 706.15(A)"], // from memory
    [2023, "NEC 2023 706.15(B)"], // trade summary of the 2023 changes
  ] as const)("in %d it cites %s", (edition, citation) => {
    expect(check(withDisconnect({ kind: "integral" }, edition), "ess-disconnect")!.clause).toBe(citation);
  });

  test("an unknown entry names the field to fill", () => {
    expect(check(withDisconnect(undefined), "ess-disconnect")!.field).toBe("storage.disconnect.kind");
    expect(check(withDisconnect({ kind: "separate", lockable: false }), "ess-disconnect")!.field).toBe("storage.disconnect.withinSight");
  });

  // 706.15(C) marking: available fault current is not required at one- and two-family dwellings (exception, from memory).
  test.each([
    [true, false],
    [false, true],
  ])("dwelling %s → asks for the fault current: %s", (isDwelling, asks) => {
    expect(check(withDisconnect({ kind: "integral" }, 2020, isDwelling), "ess-disconnect-marking") !== undefined).toBe(asks);
  });
});

// An AC-coupled battery inverter's own breaker: 125 % of its continuous output (2020 705.30(B); REFERENCE.md example 32 A → 40 A).
describe("battery inverter breaker (705.30(B); 2017 690.9(B))", () => {
  test.each([
    [30, "pass"], // 1.25 × 24 A = 30 A
    [25, "fail"],
  ] as const)("a %d A breaker for a 24 A battery inverter → %s", (breakerA, status) => {
    const storage = acStorage();
    const r = reviewDesign(storedDesign(acStorage({ batteryInverter: { ...storage.batteryInverter!, breakerA } })), coldSite);
    expect(check(r, "battery-inverter-breaker")).toMatchObject({
      status,
      value: breakerA,
      limit: 30,
      clause: "NEC 2020 705.30(B), 240.6(A)",
    });
  });

  test("DC-coupled storage has no battery inverter breaker to check", () => {
    expect(check(withDisconnect({ kind: "integral" }), "battery-inverter-breaker")).toBeUndefined();
  });
});
