import { describe, expect, test } from "vitest";
import { checkOcpd, maxProtectiveOcpdA, requiredOcpdA } from "@/lib/engineering";
import type { ConductorRun, Design } from "@/lib/engineering";
import { acRun, coldSite, larkspurModule, microDesign, stringDesign, stringRun } from "../fixtures";

const byId = (design: Design, run: ConductorRun, prefix: string) => checkOcpd(design, coldSite, run).find((c) => c.id.startsWith(prefix))!;

describe("690.9(B) / 705.30(B): OCPD ≥ 1.25 × maximum current, next 240.6(A) rating", () => {
  test.each([
    [15.25, 20], // string: 1.25 × 15.25 = 19.06 → 20 A
    [32, 40], // inverter 32 A → 40 A (REFERENCE.md example)
    [25, 35], // 20 micro-inverters × 1.25 A: 31.25 → 35 A
    [30.5, 40], // two strings: 38.1 → 40 A
  ])("%d A → %d A", (currentA, ratingA) => {
    expect(requiredOcpdA(currentA)).toBe(ratingA);
  });

  test.each([
    [40, "pass", undefined],
    [35, "fail", "Use a 40 A breaker (the next standard rating)."],
    [42, "warn", "Use a 40 A breaker (the next standard rating)."], // not a 240.6(A) rating
  ])("inverter output breaker %d A → %s", (ocpdA, status, fix) => {
    const r = byId(stringDesign(), { ...acRun, ocpdA }, "ocpd-rating");
    expect(r).toMatchObject({ status, value: ocpdA, limit: 40, clause: "NEC 2020 705.30(B), 240.6(A)" });
    expect(r.fix).toBe(fix);
  });
});

describe("240.4(B) and 240.4(D): the device must protect the conductor", () => {
  test.each([
    [38.4, "10", "Cu", 30], // 240.4(B) would allow 40 A, 240.4(D) caps 10 AWG Cu at 30 A
    [50, "8", "Cu", 50], // a standard rating: exactly the ampacity
    [52.8, "8", "Cu", 60], // next standard rating above the ampacity (240.4(B))
    [30, "10", "Al", 25], // 240.4(D): 10 AWG Al ≤ 25 A
    [0, "10", "Cu", 0], // no usable ampacity: nothing protects it
  ] as const)("usable %d A on %s AWG %s → at most %d A", (usableA, size, material, maxA) => {
    expect(maxProtectiveOcpdA(usableA, size, material)).toBe(maxA);
  });

  // 8 AWG Cu at 75 °C terminals: usable min(50, 55 × 0.96) = 50 A → 60 A breaker fails; 6 AWG (65 A → 70 A) would do.
  test("a 60 A breaker on 8 AWG copper fails and the fix offers 6 AWG", () => {
    const r = byId(stringDesign(), { ...acRun, ocpdA: 60, terminalTempC: 75 }, "ocpd-protects");
    expect(r).toMatchObject({ status: "fail", value: 60, limit: 50 });
    expect(r.fix).toBe("Use a device of at most 50 A, or 6 AWG conductors.");
  });

  // Micro-inverter branch: 25 A → 35 A breaker needed; 10 AWG Cu usable 35 A but 240.4(D) caps it at 30 A.
  test("10 AWG copper cannot take the 35 A breaker a 25 A micro-inverter branch needs (240.4(D))", () => {
    const design = microDesign();
    const run = { ...design.runs[0]!, ocpdA: 35, conductor: { ...design.runs[0]!.conductor, size: "10" as const } };
    const r = byId(design, run, "ocpd-protects");
    expect(r).toMatchObject({ status: "fail", value: 35, limit: 30, clause: "NEC 2020 240.4(B), 240.4(D)" });
    expect(r.fix).toMatch(/8 AWG/);
  });

  test("an AC run without its own device is checked against the PV breaker", () => {
    const checks = checkOcpd(stringDesign(), coldSite, { ...acRun, ocpdA: undefined });
    expect(checks.map((c) => [c.id, c.value])).toEqual([["ocpd-protects:r2", 40]]);
  });

  test("a string fuse may not exceed the module's 25 A maximum series fuse", () => {
    const r = byId(stringDesign(), { ...stringRun, ocpdA: 30, ocpdIsFuse: true }, "ocpd-protects");
    expect(r).toMatchObject({ status: "fail", limit: 25 });
    expect(r.message).toMatch(/25 A maximum series fuse/);
  });
});

// Strings are in parallel where they join at one inverter input (MPPT), whether or not they share a raceway.
describe("690.9(A): strings without fuses (from memory)", () => {
  const parallel = (ids: string[]) => ({
    ...stringRun,
    terminalTempC: 75 as const,
    circuit: { kind: "dc-strings" as const, stringIds: ids },
  });
  const onOneInput = (count: number) =>
    stringDesign({
      strings: ["S1", "S2", "S3"].slice(0, count).map((id) => ({ id, inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 10 })),
    });
  const threeStrings = onOneInput(3);

  test("one string: no other source, no fuse needed, and no '0 A' result", () => {
    const r = byId(stringDesign(), stringRun, "ocpd-rating");
    expect(r).toMatchObject({ status: "pass", value: null });
    expect(r.message).toContain("alone on its inverter input");
  });

  test("two strings in one raceway but on separate inverter inputs: neither feeds the other, no fuse needed", () => {
    // stringDesign puts S1 on MPPT 1 and S2 on MPPT 2
    expect(byId(stringDesign(), parallel(["S1", "S2"]), "ocpd-rating")).toMatchObject({ status: "pass", value: null });
  });

  // Two strings on one input: a fault sees 1 × 15.25 A from the other string ≤ 25 A series fuse rating.
  test("two strings in parallel on one input: 15.25 A back-feed ≤ 25 A, no fuse needed", () => {
    expect(byId(onOneInput(2), parallel(["S1", "S2"]), "ocpd-rating")).toMatchObject({ status: "pass", value: 15.25, limit: 25 });
    // the same holds for a run carrying only one of them: the other still feeds a fault at the input
    expect(byId(onOneInput(2), parallel(["S1"]), "ocpd-rating")).toMatchObject({ status: "pass", value: 15.25 });
  });

  // Three strings: 2 × 15.25 = 30.5 A > 25 A → fuse each at the next fuse rating above 19.06 A = 20 A.
  test("three strings in parallel need fuses", () => {
    const r = byId(threeStrings, parallel(["S1", "S2", "S3"]), "ocpd-rating");
    expect(r).toMatchObject({ status: "fail", value: 30.5, limit: 25, fix: "Fuse each string at 20 A." });
  });

  test("without the module's series fuse rating the check warns", () => {
    const design = { ...onOneInput(2), module: { ...larkspurModule, maxSeriesFuseA: undefined } };
    expect(byId(design, parallel(["S1", "S2"]), "ocpd-rating")).toMatchObject({ status: "warn", field: "module.maxSeriesFuseA" });
  });
});
