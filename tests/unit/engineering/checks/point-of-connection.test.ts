import { describe, expect, test } from "vitest";
import { checkPointOfConnection } from "@/lib/engineering";
import type { Design, NecEdition } from "@/lib/engineering";
import { coldSite, northmereString, stringDesign } from "../fixtures";

const poc = (design: Design, edition: NecEdition = 2020) =>
  checkPointOfConnection(design, { ...coldSite, necEdition: edition }).find((c) => c.id === "point-of-connection")!;
const withInverter = (acOutputCurrentA: number, pvBreakerA: number, service: Partial<Design["service"]> = {}) =>
  stringDesign({
    inverters: [{ ...northmereString, acOutputCurrentA }],
    service: { ...stringDesign().service, pvBreakerA, ...service },
  });

describe("705.12 load-side connection, clause numbered by edition (REFERENCE.md; 2023 numbering from memory)", () => {
  test.each([
    [2017, "NEC 2017 705.12(B)(2)(3)(b)"],
    [2020, "NEC 2020 705.12(B)(3)(2)"],
    [2023, "NEC 2023 705.12(B)(2)"],
  ] as const)("NEC %d: 32 A inverter on 200/200 passes the 120 %% rule, cited as %s", (edition, clause) => {
    expect(poc(stringDesign(), edition)).toMatchObject({ status: "pass", value: 240, limit: 240, clause });
  });

  test("the 100 % rule is preferred when it passes: 16 A inverter, 20 A breaker on 225/200", () => {
    // 1.25 × 16 + 200 = 220 ≤ 225
    const r = poc(withInverter(16, 20, { busbarA: 225 }));
    expect(r).toMatchObject({ status: "pass", value: 220, limit: 225, clause: "NEC 2020 705.12(B)(3)(1)" });
  });

  // 1.25 × 48 + 200 = 260 > 240. Largest PV breaker 40 A < 60 A needed; 240 − 60 = 180 → a 175 A main.
  test("48 A inverter with a 60 A breaker on 200/200 fails with both fixes", () => {
    const r = poc(withInverter(48, 60));
    expect(r).toMatchObject({ status: "fail", value: 260, limit: 240 });
    expect(r.fix).toContain("The largest PV breaker that fits under the 120 % rule is 40 A, smaller than the 60 A these inverters need.");
    expect(r.fix).toContain("A 175 A main breaker would make room for the 60 A PV breaker");
  });

  // REFERENCE.md example 225/200 → 70 A: a 56 A inverter needs 1.25 × 56 = 70 A; 70 + 200 = 270 = 1.2 × 225.
  test("225/200 busbar takes a 70 A PV breaker exactly", () => {
    expect(poc(withInverter(56, 70, { busbarA: 225 }))).toMatchObject({ status: "pass", value: 270, limit: 270 });
  });

  // Code arithmetic 1.25 × 30 + 200 = 237.5 ≤ 240 passes, but 45 A breaker + 200 = 245 > 240.
  test("passing on inverter current but not on the breaker rating warns", () => {
    const r = poc(withInverter(30, 45));
    expect(r.status).toBe("warn");
    expect(r.fix).toBe("The largest PV breaker that fits under the 120 % rule is 40 A.");
  });

  test("breaker not at the far end: the fix says to move it", () => {
    const r = poc(withInverter(32, 40, { pvBreakerAtOppositeEnd: false }));
    expect(r.status).toBe("fail");
    expect(r.fix).toMatch(/^Move the PV breaker to the end of the bus opposite the main/);
  });

  test("main-lug panel: only the sum rule (100 + 60 + 40 = 200 A on a 200 A bus)", () => {
    const r = poc(withInverter(32, 40, { mainBreakerA: null, otherBreakersA: [100, 60] }));
    expect(r).toMatchObject({ status: "pass", value: 200, limit: 200, clause: "NEC 2020 705.12(B)(3)(3)" });
    expect(poc(withInverter(32, 40, { mainBreakerA: null })).status).toBe("warn");
  });
});

describe("PV breaker size: ≥ 1.25 × inverter continuous output (2020 705.30(B))", () => {
  test.each([
    [40, "pass"],
    [35, "fail"],
  ])("%d A breaker for a 32 A inverter → %s", (pvBreakerA, status) => {
    const r = checkPointOfConnection(withInverter(32, pvBreakerA), coldSite).find((c) => c.id === "pv-breaker-size")!;
    expect(r).toMatchObject({ status, limit: 40 });
    if (status === "fail") expect(r.fix).toBe("Use a 40 A PV breaker.");
  });
});

describe("supply-side connection (2020/2023 705.11; 2017 705.12(A); from memory)", () => {
  const supply = (serviceConductorAmpacityA?: number) => withInverter(32, 40, { connection: "supply-side", serviceConductorAmpacityA });

  test.each([
    [2017, "NEC 2017 705.12(A)", 40], // 2017 compares the PV OCPD rating
    [2020, "NEC 2020 705.11", 32], // 2020 on compares the continuous output current
    [2023, "NEC 2023 705.11", 32],
  ] as const)("NEC %d cites %s and compares %d A with the 200 A service", (edition, clause, valueA) => {
    expect(poc(supply(), edition)).toMatchObject({ status: "pass", clause, value: valueA, limit: 200 });
  });

  test("a 30 A service conductor cannot take 32 A of inverter output", () => {
    expect(poc(supply(30))).toMatchObject({ status: "fail", value: 32, limit: 30 });
  });
});
