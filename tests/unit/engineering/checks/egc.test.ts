import { describe, expect, test } from "vitest";
import { checkEgc, requiredEgcSize } from "@/lib/engineering";
import { acRun, coldSite, stringDesign, stringRun } from "../fixtures";

describe("equipment grounding conductor (NEC Table 250.122, REFERENCE.md)", () => {
  test.each([
    ["10", "Cu", "pass"], // 40 A → 10 AWG Cu
    ["12", "Cu", "fail"],
    ["8", "Al", "pass"], // 40 A → 8 AWG Al
    ["10", "Al", "fail"],
  ] as const)("40 A breaker with a %s AWG %s EGC → %s", (size, material, status) => {
    const [r] = checkEgc(stringDesign(), coldSite, { ...acRun, egc: { size, material } });
    expect(r!.status).toBe(status);
    expect(r!.clause).toBe("NEC 2020 Table 250.122");
  });

  // No fuse on a one-string run: 690.45 assumes a 15.25 A device; 15.25 A > 15 A, so the 20 A row applies → 12 AWG Cu.
  test("a DC run without OCPD is sized from an assumed device at the circuit current (690.45, from memory)", () => {
    const [r] = checkEgc(stringDesign(), coldSite, { ...stringRun, egc: { size: "12", material: "Cu" } });
    expect(r).toMatchObject({ status: "pass", clause: "NEC 2020 690.45, Table 250.122" });
    expect(r!.message).toMatch(/assumed 15.25 A device/);
    const [small] = checkEgc(stringDesign(), coldSite, { ...stringRun, egc: { size: "14", material: "Cu" } });
    expect(small!.status).toBe("fail");
  });

  test("a missing EGC warns and names the size to add", () => {
    const [r] = checkEgc(stringDesign(), coldSite, { ...acRun, egc: undefined });
    expect(r).toMatchObject({ status: "warn", fix: "Add a 10 AWG copper equipment grounding conductor." });
  });

  test("250.122(A): never larger than the circuit conductors of the same material", () => {
    expect(requiredEgcSize(100, "Cu", "10", "Cu")).toBe("10");
    expect(requiredEgcSize(100, "Cu", "4", "Cu")).toBe("8");
  });

  test("an unknown EGC size is a readable input error", () => {
    expect(() => checkEgc(stringDesign(), coldSite, { ...acRun, egc: { size: "7" as never, material: "Cu" } })).toThrow(/grounding conductor size "7"/);
  });
});
