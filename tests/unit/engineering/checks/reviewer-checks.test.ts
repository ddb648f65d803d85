import { describe, expect, test } from "vitest";
import {
  checkEquipmentDisconnects,
  checkGroundingElectrodeConductor,
  checkProtectionFunctions,
  checkPvSystemDisconnect,
  checkRapidShutdownInitiator,
  checkStringsHaveRuns,
  checkSystemVoltageRatings,
  checkWiringMethods,
  reviewDesign,
} from "@/lib/engineering";
import type { ConductorRun, Design, NecEdition } from "@/lib/engineering";
import {
  acRun,
  coldSite,
  halvardMicro,
  larkspurModule,
  microDesign,
  northmereString,
  quillonShutdown,
  stringDesign,
  stringRun,
} from "../fixtures";

const at = (edition: NecEdition, more: Partial<typeof coldSite> = {}) => ({ ...coldSite, necEdition: edition, ...more });

// 690.7 and 110.3(B): the highest string voltage against the module's and the device's listed maximum
// system voltage. The fixture string reaches 10 × 45.04 = 450.4 V at −20 °C (coefficient method).
describe("maximum system voltage of modules and module-level devices (690.7, 110.3(B))", () => {
  test.each([
    [1000, 600, "pass", "pass"],
    [600, 600, "pass", "pass"],
    [400, 600, "fail", "pass"], // 450.4 V > 400 V
    [1000, 450, "pass", "fail"],
    [undefined, 600, "warn", "pass"], // not entered: names the field
  ] as const)("module %s V, device %s V → %s / %s", (moduleV, deviceV, moduleStatus, deviceStatus) => {
    const d = stringDesign({
      module: { ...larkspurModule, maxSystemVoltageV: moduleV },
      moduleLevelDevice: { ...quillonShutdown, maxSystemVoltageV: deviceV },
    });
    const [m, dev] = checkSystemVoltageRatings(d, coldSite);
    expect(m).toMatchObject({ id: "system-voltage:module", status: moduleStatus, value: 450.4 });
    expect(dev).toMatchObject({ id: "system-voltage:device", status: deviceStatus });
    if (moduleV === undefined) expect(m!.field).toBe("module.maxSystemVoltageV");
  });

  test("a module at its listed maximum exactly passes (the limit is inclusive)", () => {
    const d = stringDesign({ module: { ...larkspurModule, maxSystemVoltageV: 450.4 } });
    expect(checkSystemVoltageRatings(d, coldSite)[0]!.status).toBe("pass");
  });
});

// 690.11: DC circuits of 80 V or more on a building need listed arc-fault protection; 690.41(B): DC circuits
// above 30 V or 8 A need ground-fault protection (from memory). From the inverter's catalog data.
describe("690.11 arc-fault and 690.41(B) ground-fault protection from the inverter's data", () => {
  const cold = 45.04;
  test.each([
    [true, "pass"],
    [false, "fail"],
    [undefined, "warn"],
  ] as const)("string inverter arc-fault protection %s → %s", (afci, status) => {
    const d = stringDesign({ inverters: [{ ...northmereString, dcArcFaultProtection: afci }] });
    const r = checkProtectionFunctions(d, coldSite, cold).find((c) => c.id === "arc-fault:inv-1")!;
    expect(r).toMatchObject({ status, value: 450.4, limit: null });
    if (afci === undefined) expect(r.field).toBe("inverters.inv-1.dcArcFaultProtection");
  });

  test("ground-mounted arrays are not on a building: no arc-fault result", () => {
    const d = stringDesign({ mount: "ground", inverters: [{ ...northmereString, dcArcFaultProtection: undefined }] });
    expect(checkProtectionFunctions(d, coldSite, cold).some((c) => c.id.startsWith("arc-fault"))).toBe(false);
  });

  test("micro-inverters: one module below 80 V needs no arc-fault result, but 45 V > 30 V needs ground-fault protection", () => {
    const d = microDesign({ inverters: [{ ...halvardMicro, dcGroundFaultProtection: undefined }] });
    const results = checkProtectionFunctions(d, coldSite, cold);
    expect(results.some((c) => c.id.startsWith("arc-fault"))).toBe(false);
    expect(results.find((c) => c.id === "ground-fault:micro")).toMatchObject({
      status: "warn",
      field: "inverters.micro.dcGroundFaultProtection",
    });
  });

  test.each([
    [true, "pass"],
    [false, "fail"],
  ] as const)("ground-fault protection %s → %s", (gfp, status) => {
    const d = stringDesign({ inverters: [{ ...northmereString, dcGroundFaultProtection: gfp }] });
    expect(checkProtectionFunctions(d, coldSite, cold).find((c) => c.id === "ground-fault:inv-1")!.status).toBe(status);
  });
});

// 690.13: the PV system disconnect, readily accessible, rated for the circuit (ratings 2017 690.13(E),
// 2020 on 690.13(D); from memory). 690.15: isolating the inverter's DC inputs.
describe("disconnecting means (690.13, 690.15)", () => {
  const run = (d: Partial<Design>, edition: NecEdition = 2020) => checkPvSystemDisconnect(stringDesign(d), at(edition));

  test("not entered: a warning naming the field", () => {
    expect(run({ pvDisconnect: undefined })[0]).toMatchObject({ status: "warn", field: "pvDisconnect.kind" });
  });

  test("the PV breaker serves on a load-side connection, not on a supply-side one", () => {
    expect(run({ pvDisconnect: { kind: "pv-breaker" } })[0]!.status).toBe("pass");
    const supply = stringDesign({ pvDisconnect: { kind: "pv-breaker" } });
    supply.service = { ...supply.service, connection: "supply-side" };
    expect(checkPvSystemDisconnect(supply, coldSite)[0]).toMatchObject({ status: "fail", field: "pvDisconnect.kind" });
  });

  test.each([
    // 32 A inverter output at 240 V; a fused switch holds the 40 A PV fuses
    ["switch", 30, 240, "fail"],
    ["switch", 60, 240, "pass"],
    ["switch", 60, 120, "fail"],
    ["fused-switch", 30, 240, "fail"], // below the 40 A fuses it holds
    ["fused-switch", 60, 240, "pass"],
  ] as const)("a %s rated %d A, %d V → %s", (kind, ratingA, voltageRatingV, status) => {
    const [rating] = run({ pvDisconnect: { kind, ratingA, voltageRatingV, readilyAccessible: true } });
    expect(rating).toMatchObject({ id: "pv-disconnect-rating", status });
  });

  test.each([
    [2017, "NEC 2017 690.13(E)"],
    [2020, "NEC 2020 690.13(D)"],
    [2023, "NEC 2023 690.13(D)"],
  ] as const)("NEC %d cites the ratings as %s", (edition, clause) => {
    expect(run({ pvDisconnect: { kind: "switch", ratingA: 60, voltageRatingV: 240, readilyAccessible: true } }, edition)[0]!.clause).toBe(
      clause,
    );
  });

  test.each([
    [true, "pass"],
    [false, "fail"],
    [undefined, "warn"],
  ] as const)("readily accessible %s → %s (690.13(A))", (access, status) => {
    const results = run({ pvDisconnect: { kind: "switch", ratingA: 60, voltageRatingV: 240, readilyAccessible: access } });
    expect(results.find((c) => c.id === "pv-disconnect-location")).toMatchObject({ status, clause: "NEC 2020 690.13(A)" });
  });

  test("missing ratings of a separate switch warn and name the field", () => {
    expect(run({ pvDisconnect: { kind: "switch", readilyAccessible: true } })[0]).toMatchObject({
      status: "warn",
      field: "pvDisconnect.ratingA",
    });
  });

  test.each([
    [true, "pass", undefined],
    [false, "warn", undefined],
    [undefined, "warn", "inverters.inv-1.dcDisconnect"],
  ] as const)("string inverter with an integrated DC disconnect %s → %s (690.15(A))", (known, status, field) => {
    const [r] = checkEquipmentDisconnects(stringDesign({ inverters: [{ ...northmereString, dcDisconnect: known }] }), coldSite);
    expect(r).toMatchObject({ status, clause: "NEC 2020 690.15(A)" });
    expect(r!.field).toBe(field);
  });

  test("micro-inverters need no separate DC disconnect result", () => {
    expect(checkEquipmentDisconnects(microDesign(), coldSite)).toEqual([]);
  });
});

// 690.12(C): from 2020 on, the initiator at one- and two-family dwellings is outside at a readily
// accessible location; 2017 only names what may serve (from memory).
describe("rapid shutdown initiator (690.12(C))", () => {
  test.each([
    [2017, true, false, "pass"],
    [2020, true, false, "fail"],
    [2023, true, false, "fail"],
    [2020, true, undefined, "warn"],
    [2020, true, true, "pass"],
    [2020, false, false, "pass"], // not a dwelling
  ] as const)("NEC %d, dwelling %s, outside %s → %s", (edition, isDwelling, outside, status) => {
    const d = stringDesign({ rapidShutdownInitiator: { kind: "switch", outsideReadilyAccessible: outside } });
    expect(checkRapidShutdownInitiator(d, at(edition, { isDwelling }))[0]).toMatchObject({ status, clause: `NEC ${edition} 690.12(C)` });
  });

  test("not entered: a warning naming the field; ground mounts need none", () => {
    expect(checkRapidShutdownInitiator(stringDesign({ rapidShutdownInitiator: undefined }), coldSite)[0]).toMatchObject({
      status: "warn",
      field: "rapidShutdownInitiator.kind",
    });
    expect(checkRapidShutdownInitiator(stringDesign({ mount: "ground", rapidShutdownInitiator: undefined }), coldSite)).toEqual([]);
  });
});

// 690.31: exposed array conductors PV wire or USE-2 (690.31(C)(1)); DC inside a building in metal raceway or
// Type MC cable (2017 690.31(G), 2020 on 690.31(D)); 690.46 / 250.120(C): EGCs smaller than 6 AWG protected.
// All from memory.
describe("wiring methods of DC runs (690.31, 690.46)", () => {
  const ids = (run: ConductorRun, edition: NecEdition = 2020) =>
    Object.fromEntries(checkWiringMethods(at(edition), run).map((c) => [c.id.split(":")[0], c]));

  test.each([
    ["PV wire", "pass"],
    ["USE-2", "pass"],
    ["RHW-2/USE-2", "pass"],
    ["THWN-2", "fail"],
    [undefined, "warn"],
  ] as const)("exposed array wiring in %s → %s", (insulation, status) => {
    expect(ids({ ...stringRun, conductor: { ...stringRun.conductor, insulation } })["wiring-exposed"]).toMatchObject({ status });
  });

  test.each([
    [2017, { raceway: undefined }, "fail", "NEC 2017 690.31(G)"],
    [2020, { raceway: { type: "PVC-40", tradeSize: "3/4", wires: [] } }, "fail", "NEC 2020 690.31(D)"],
    [2020, { raceway: { type: "EMT", tradeSize: "3/4", wires: [] } }, "pass", "NEC 2020 690.31(D)"],
    [2023, { raceway: undefined, mcCable: true }, "pass", "NEC 2023 690.31(D)"],
  ] as const)("NEC %d: a DC run inside the building in %j → %s", (edition, patch, status, clause) => {
    const run = { ...stringRun, ...patch, insideBuilding: true } as ConductorRun;
    expect(ids(run, edition)["wiring-inside"]).toMatchObject({ status, clause });
  });

  test("whether a DC run enters the building must be said unless its wiring method serves anywhere", () => {
    expect(ids({ ...stringRun, insideBuilding: undefined })["wiring-inside"]).toMatchObject({
      status: "warn",
      field: "runs.r1.insideBuilding",
    });
    expect(ids({ ...stringRun, insideBuilding: undefined, mcCable: true })["wiring-inside"]).toMatchObject({ status: "pass" });
  });

  test.each([
    ["6", undefined],
    ["8", "fail"],
    ["10", "fail"],
  ] as const)("an exposed %s AWG array EGC → %s", (size, status) => {
    const r = ids({ ...stringRun, egc: { size, material: "Cu" } })["egc-protection"];
    if (status === undefined) expect(r).toBeUndefined();
    else expect(r).toMatchObject({ status, clause: "NEC 2020 690.46, 250.120(C)" });
  });

  test("a 10 AWG EGC inside the raceway needs no extra protection, and AC runs have no DC wiring results", () => {
    expect(
      ids({ ...stringRun, egc: { size: "10", material: "Cu" }, raceway: { type: "EMT", tradeSize: "3/4", wires: [] } })["egc-protection"],
    ).toBeUndefined();
    expect(checkWiringMethods(coldSite, acRun)).toEqual([]);
  });
});

// 690.47 and Table 250.66 where the design adds a GEC; 250.66(A) caps a rod electrode's GEC at 6 AWG Cu.
describe("grounding electrode conductor (690.47, Table 250.66)", () => {
  const withGec = (gec: Design["groundingElectrodeConductor"], serviceConductor?: Design["service"]["serviceConductor"]) => {
    const d = stringDesign({ groundingElectrodeConductor: gec });
    d.service = { ...d.service, serviceConductor };
    return checkGroundingElectrodeConductor(d, coldSite);
  };

  test("no GEC added: nothing to check", () => {
    expect(withGec(undefined)).toEqual([]);
  });

  test.each([
    // 4/0 Al service (Table 250.66: 4 Cu); other electrode
    ["6", "other", { size: "4/0", material: "Al" }, "fail"],
    ["4", "other", { size: "4/0", material: "Al" }, "pass"],
    // the same service to a rod: capped at 6 AWG Cu (250.66(A))
    ["6", "rod-pipe-plate", { size: "4/0", material: "Al" }, "pass"],
    // 2/0 Cu service → 4 Cu
    ["6", "other", { size: "2/0", material: "Cu" }, "fail"],
    ["8", "other", { size: "2", material: "Cu" }, "pass"],
  ] as const)("%s AWG Cu to %s, service %j → %s", (size, electrode, service, status) => {
    expect(withGec({ size, material: "Cu", electrode }, service)[0]).toMatchObject({ id: "gec", status });
  });

  test("without the service conductor size a rod GEC of 6 AWG still passes; any other warns naming the field", () => {
    expect(withGec({ size: "6", material: "Cu", electrode: "rod-pipe-plate" })[0]!.status).toBe("pass");
    expect(withGec({ size: "6", material: "Cu", electrode: "other" })[0]).toMatchObject({
      status: "warn",
      field: "service.serviceConductor",
    });
  });

  test("an 8 AWG GEC must be in raceway or armor (250.64(B), from memory)", () => {
    expect(withGec({ size: "8", material: "Cu", electrode: "other" }, { size: "2", material: "Cu" }).map((c) => c.id)).toEqual([
      "gec",
      "gec-protection",
    ]);
  });
});

// Issue 11: two strings with a run for one passed with nothing said about the other.
describe("every string has a DC run", () => {
  test("a string no run carries is flagged by name", () => {
    const d = stringDesign({ runs: [stringRun, acRun] });
    expect(checkStringsHaveRuns(d, coldSite)).toEqual([
      expect.objectContaining({ id: "string-run:S2", status: "warn", field: "strings.S2" }),
    ]);
    expect(reviewDesign(d, coldSite).summary.status).not.toBe("pass");
  });

  test("strings sharing one run are both covered", () => {
    const shared = { ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"] } };
    expect(checkStringsHaveRuns(stringDesign({ runs: [shared, acRun] }), coldSite)).toEqual([]);
  });
});
