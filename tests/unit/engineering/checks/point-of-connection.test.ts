import { describe, expect, test } from "vitest";
import { checkAcCombiner, checkFeederConnection, checkPointOfConnection, checkSupplySideConductors } from "@/lib/engineering";
import type { Design, NecEdition } from "@/lib/engineering";
import { acRun, coldSite, halvardMicro, microDesign, northmereString, stringDesign } from "../fixtures";

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

// Center-fed panelboards: the 120 % rule with the PV breaker at either end (not both), at dwellings only
// (2017 705.12(B)(2)(3)(d), 2020 705.12(B)(3)(4), 2023 705.12(B)(4); from memory).
describe("center-fed panels", () => {
  const centerFed = (pvBreakerAtOppositeEnd: boolean) => withInverter(32, 40, { panelFeed: "center", pvBreakerAtOppositeEnd });

  test.each([
    [2017, "NEC 2017 705.12(B)(2)(3)(d)"],
    [2020, "NEC 2020 705.12(B)(3)(4)"],
    [2023, "NEC 2023 705.12(B)(4)"],
  ] as const)("NEC %d: a breaker at one end of a center-fed bus at a dwelling passes the 120 %% test, cited as %s", (edition, clause) => {
    expect(poc(centerFed(true), edition)).toMatchObject({ status: "pass", value: 240, limit: 240, clause });
  });

  test("not at a dwelling, a center-fed bus does not get the 120 % allowance", () => {
    const r = checkPointOfConnection(centerFed(true), { ...coldSite, isDwelling: false }).find((c) => c.id === "point-of-connection")!;
    expect(r.status).toBe("fail");
  });

  test("away from an end, the fix says to move it to one end", () => {
    expect(poc(centerFed(false)).fix).toMatch(/^Move the PV breaker to one end of the center-fed bus/);
  });
});

// Feeders and taps on the load side (2017 705.12(B)(2)(1)–(2), 2020 705.12(B)(1)–(2), 2023 705.12(A); from memory):
// away from the feeder's far end, its ampacity must cover its device plus 125 % of the inverter current, or a
// load-side device no larger than its ampacity protects it. Taps are sized from the same sum (240.21(B)).
describe("connections on a feeder", () => {
  const onFeeder = (feeder: Design["service"]["feeder"]) => withInverter(32, 40, { loadSideAt: "feeder", feeder });
  const feederCheck = (d: Design, edition: NecEdition = 2020) => checkFeederConnection(d, { ...coldSite, necEdition: edition });

  test.each([
    // 100 A feeder device + 1.25 × 32 = 140 A
    [{ ampacityA: 130, ocpdA: 100 }, "fail", 140],
    [{ ampacityA: 140, ocpdA: 100 }, "pass", 140],
    [{ ampacityA: 130, ocpdA: 100, loadSideOcpdA: 125 }, "pass", 130], // a 125 A device protects the 130 A feeder
    [{ ampacityA: 130, ocpdA: 100, loadSideOcpdA: 150 }, "fail", 130],
    [{ ampacityA: 100, ocpdA: 100, atOppositeEnd: true }, "pass", 100],
  ] as const)("%j → %s", (feeder, status, limit) => {
    expect(feederCheck(onFeeder(feeder))[0]).toMatchObject({ id: "feeder-connection", status, limit });
  });

  test.each([
    [2017, "NEC 2017 705.12(B)(2)(1)"],
    [2020, "NEC 2020 705.12(B)(1)"],
    [2023, "NEC 2023 705.12(A)"],
  ] as const)("NEC %d cites %s", (edition, clause) => {
    expect(feederCheck(onFeeder({ ampacityA: 140, ocpdA: 100 }), edition)[0]!.clause).toBe(clause);
  });

  test("a feeder tap must carry a third of (feeder device + 1.25 × inverter current) for a 25 ft tap", () => {
    // (100 + 40) / 3 = 46.67 A
    const [, taps] = feederCheck(onFeeder({ ampacityA: 140, ocpdA: 100, tapAmpacityA: 40 }));
    expect(taps).toMatchObject({ id: "feeder-taps", status: "fail", limit: 46.67 });
    expect(feederCheck(onFeeder({ ampacityA: 140, ocpdA: 100, tapAmpacityA: 55 }))[1]!.status).toBe("pass");
  });

  test("unknown feeder figures warn and name the field; the busbar is not checked for a feeder connection", () => {
    expect(feederCheck(onFeeder(undefined))[0]).toMatchObject({ status: "warn", field: "service.feeder.ampacityA" });
    expect(checkPointOfConnection(onFeeder({ ampacityA: 140, ocpdA: 100 }), coldSite).some((c) => c.id === "point-of-connection")).toBe(
      false,
    );
  });
});

// Busbars that feed feed-through lugs: the feed-through conductors are sized as a feeder; without a device at
// either end the busbar gets only its full rating (2020 705.12(B)(3)(6), 2023 705.12(B)(6); from memory).
describe("feed-through lugs", () => {
  const feedThrough = (feeder: Design["service"]["feeder"]) => withInverter(32, 40, { loadSideAt: "feed-through", feeder, busbarA: 225 });

  test("the feed-through conductors need the main plus 1.25 × inverter current: 200 + 40 = 240 A", () => {
    const results = checkPointOfConnection(feedThrough({ ampacityA: 200 }), coldSite);
    expect(results.find((c) => c.id === "feeder-connection")).toMatchObject({
      status: "fail",
      limit: 240,
      clause: "NEC 2020 705.12(B)(3)(6)",
    });
  });

  test("with no device at either end of the feed-through conductors only the 100 % rule applies to the busbar", () => {
    // 240 A > 225 A busbar (100 %) though 240 ≤ 270 (120 %)
    const r = checkPointOfConnection(feedThrough({ ampacityA: 250 }), coldSite).find((c) => c.id === "point-of-connection")!;
    expect(r.status).toBe("fail");
    const protectedEnd = checkPointOfConnection(feedThrough({ ampacityA: 250, loadSideOcpdA: 225 }), coldSite).find(
      (c) => c.id === "point-of-connection",
    )!;
    expect(protectedEnd).toMatchObject({ status: "pass", clause: "NEC 2020 705.12(B)(3)(2), 705.12(B)(3)(6)" });
  });

  test("2017 has no feed-through item: the feeder rule is cited", () => {
    const r = checkPointOfConnection(feedThrough({ ampacityA: 250 }), { ...coldSite, necEdition: 2017 }).find(
      (c) => c.id === "feeder-connection",
    )!;
    expect(r.clause).toBe("NEC 2017 705.12(B)(2)(1)");
  });
});

// Supply-side conductors from the tap to the PV device: 125 % of the inverter output and the device's rating,
// not smaller than 6 AWG Cu / 4 AWG Al, and the device within 10 ft of the tap (2020/2023 705.11; from memory).
describe("supply-side conductors and overcurrent device location", () => {
  const supply = (c: Design["service"]["supplySideConductors"]) =>
    withInverter(32, 40, { connection: "supply-side", supplySideConductors: c });
  const checks = (d: Design, edition: NecEdition = 2020) =>
    Object.fromEntries(checkSupplySideConductors(d, { ...coldSite, necEdition: edition }).map((c) => [c.id, c]));

  test.each([
    [2020, "8", "Cu", "fail"], // 50 A ≥ 40 A but smaller than 6 AWG
    [2020, "6", "Cu", "pass"], // 65 A at 75 °C
    [2020, "6", "Al", "fail"], // smaller than 4 AWG Al
    [2020, "4", "Al", "pass"],
    [2017, "8", "Cu", "pass"], // 2017 sets no minimum size (from memory); 50 A ≥ 40 A
    [2017, "10", "Cu", "fail"], // 35 A < 40 A
  ] as const)("NEC %d, %s AWG %s → %s", (edition, size, material, status) => {
    expect(checks(supply({ size, material, lengthToOcpdFt: 6 }), edition)["supply-side-conductors"]).toMatchObject({ status });
  });

  test.each([
    [6, "pass"],
    [10, "pass"],
    [14, "fail"],
    [undefined, "warn"],
  ] as const)("device %s ft from the tap → %s (2020)", (lengthToOcpdFt, status) => {
    expect(checks(supply({ size: "6", material: "Cu", lengthToOcpdFt }))["supply-side-ocpd-location"]).toMatchObject({ status });
  });

  test("2017 has no 10 ft rule; missing conductors warn and name the field", () => {
    expect(checks(supply({ size: "6", material: "Cu" }), 2017)["supply-side-ocpd-location"]).toBeUndefined();
    expect(checks(supply(undefined))["supply-side-conductors"]).toMatchObject({ status: "warn", field: "service.supplySideConductors" });
  });
});

// Micro-inverter branch circuits joined in an AC combiner: its busbar carries only sources, so the sum rule
// applies to it (705.12, REFERENCE.md).
describe("AC combiner busbar for micro-inverters", () => {
  const branches = (ocpdA?: number) => {
    const two = [
      { ...halvardMicro, id: "m1", quantity: 10 },
      { ...halvardMicro, id: "m2", quantity: 10 },
    ];
    const branch = (id: string) => ({
      ...acRun,
      id: `b-${id}`,
      label: `Branch ${id}`,
      ocpdA,
      raceway: undefined,
      circuit: { kind: "ac-output" as const, sources: [{ inverterId: id }] },
    });
    const home = { ...acRun, circuit: { kind: "ac-output" as const, sources: [{ inverterId: "m1" }, { inverterId: "m2" }] } };
    return microDesign({ inverters: two, runs: [branch("m1"), branch("m2"), home] });
  };

  test.each([
    [{ busbarA: 125 }, 20, "pass", 40], // 2 × 20 A ≤ 125 A
    [{ busbarA: 30 }, 20, "fail", 40],
    [{ busbarA: 125, breakersA: [20, 20, 15] }, 20, "pass", 55], // the listed breakers win over the branch runs
  ] as const)("%j with %d A branch breakers → %s (%d A)", (combiner, ocpdA, status, sumA) => {
    const d = { ...branches(ocpdA), acCombiner: combiner };
    expect(checkAcCombiner(d, coldSite)[0]).toMatchObject({ status, value: sumA, limit: combiner.busbarA });
  });

  test("an unknown busbar warns and names the field; a single branch has no combiner", () => {
    expect(checkAcCombiner(branches(20), coldSite)[0]).toMatchObject({ status: "warn", field: "acCombiner.busbarA" });
    expect(checkAcCombiner(microDesign(), coldSite)).toEqual([]);
  });
});
