import { describe, expect, test } from "vitest";
import { checkActivation } from "@/lib/engineering";
import { inverterUnit } from "./fixtures";

// Basis: the inverter maker's activation card; a unit is activated with its key once the card's serial
// matches the unit's (our rule; invented serials).
describe("inverter activated", () => {
  test.each([
    [true, "pass", "recorded"],
    [false, "warn", "missing"],
  ])("activated %j → %s", (activated, status, state) => {
    expect(checkActivation(inverterUnit("QN0730411", "QN0730411", activated), 2023)).toMatchObject({
      status,
      reading: state,
      kind: "inverter-activation",
    });
  });
});
