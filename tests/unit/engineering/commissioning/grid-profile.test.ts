import { describe, expect, test } from "vitest";
import { checkGridProfile, normalizeProfile } from "@/lib/engineering";

const check = (requiredGridProfile: string | null, gridProfileSet: string | null | undefined) =>
  checkGridProfile({ edition: 2023, requiredGridProfile, gridProfileSet });

// Basis: the utility's interconnection approval names the profile; the text comparison ignores case, spaces and punctuation.
describe("grid profile set on the inverter vs the utility's requirement", () => {
  test.each([
    ["IEEE 1547-2018", "ieee1547 2018", "pass"],
    ["IEEE 1547-2018", "  IEEE_1547.2018 ", "pass"],
    ["Northvale Co-op Cat B", "NORTHVALE CO-OP CAT-B", "pass"],
    ["IEEE 1547-2018", "IEEE 1547-2003", "fail"],
    ["Northvale Co-op Cat B", "Northvale Co-op Cat A", "fail"],
  ])("required %j, set %j → %s", (required, set, status) => {
    const r = check(required, set);
    expect(r).toMatchObject({ status, kind: "grid-profile", reading: "recorded", clause: "utility interconnection requirement" });
    if (status === "fail") expect(r.fix).toContain(required);
  });

  test.each([[null], [undefined], [""], ["  - "]])("inverter setting %j missing → warn (not taken yet) with a clear message", (set) => {
    const r = check("IEEE 1547-2018", set);
    expect(r).toMatchObject({ status: "warn", reading: "missing" });
    expect(r.message).toMatch(/not recorded/);
  });

  test("utility profile not on file → fail", () => {
    const r = check(null, "IEEE 1547-2018");
    expect(r.status).toBe("fail");
    expect(r.message).toMatch(/not on file/);
  });

  test("normalization keeps letters and digits only", () => {
    expect(normalizeProfile(" Rule-21 (Cat. B) ")).toBe("rule21catb");
  });
});
