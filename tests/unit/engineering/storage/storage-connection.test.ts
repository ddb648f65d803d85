import { describe, expect, test } from "vitest";
import { NEC_EDITIONS, reviewDesign } from "@/lib/engineering";
import { coldSite, stringDesign } from "../fixtures";
import { acStorage, dcStorage, storedDesign } from "./fixtures";

const check = (r: ReturnType<typeof reviewDesign>, id: string) => r.checks.find((c) => c.id === id)!;
const site = (edition: (typeof NEC_EDITIONS)[number]) => ({ ...coldSite, necEdition: edition });

// 705.12 load side (REFERENCE.md, code arithmetic): 1.25 × source current + main ≤ 1.2 × busbar with the source breaker at
// the far end. 200 A busbar, 200 A main: 240 A allowed. PV 32 A alone: 40 + 200 = 240 A (the 200/200 → 40 A example).
describe("705.12 at the main panel counts the storage inverter's output", () => {
  test.each(NEC_EDITIONS)(
    "%d: an AC-coupled 24 A battery inverter beside the 32 A PV inverter: 1.25 × 56 + 200 = 270 A > 240 A",
    (edition) => {
      const c = check(reviewDesign(storedDesign(acStorage()), site(edition)), "point-of-connection");
      expect(c).toMatchObject({ status: "fail", value: 270, limit: 240 });
      expect(c.message).toContain("1.25 × 56 A of inverter current");
    },
  );

  test.each(NEC_EDITIONS)(
    "%d: DC-coupled storage discharges through the hybrid inverter, already counted: 240 A, as without storage",
    (edition) => {
      const withStorage = check(reviewDesign(storedDesign(dcStorage()), site(edition)), "point-of-connection");
      const without = check(reviewDesign(stringDesign(), site(edition)), "point-of-connection");
      expect(withStorage).toEqual(without);
      expect(withStorage).toMatchObject({ status: "pass", value: 240, limit: 240 });
    },
  );
});

// 705.13 (2020 and later, REFERENCE.md from memory): a listed power control system's current setting replaces the sum
// of the sources in the busbar arithmetic. 2017 has no such clause, so the setting is not counted.
describe("a listed power control system's setting (705.13, 2020 on)", () => {
  const pcsDesign = (listed: boolean, currentSettingA?: number) =>
    storedDesign(acStorage({ operatingMode: "non-export", pcs: { listed, currentSettingA } }));

  test.each([
    [2017, "fail", 270, "NEC 2017 705.12(B)(2)(3)(a), 705.12(B)(2)(3)(b), 705.12(B)(2)(3)(c)"],
    [2020, "pass", 240, "NEC 2020 705.12(B)(3)(2), 705.13"],
    [2023, "pass", 240, "NEC 2023 705.12(B)(2), 705.13"],
  ] as const)("%d: a 32 A setting → %s at %d A, citing %s", (edition, status, value, citation) => {
    const c = check(reviewDesign(pcsDesign(true, 32), site(edition)), "point-of-connection");
    expect(c).toMatchObject({ status, value, clause: citation });
  });

  test.each([
    [false, 32, 270], // not listed: not counted
    [true, undefined, 270], // listed but not set: not counted
    [true, 80, 270], // a setting above the sources' own output limits nothing
  ] as const)("listed %s, setting %s → counts %d A", (listed, setting, value) => {
    expect(check(reviewDesign(pcsDesign(listed, setting), site(2020)), "point-of-connection").value).toBe(value);
  });

  test("the summary and figures say which current was counted", () => {
    const r = reviewDesign(pcsDesign(true, 32), site(2023));
    expect(r.storage).toMatchObject({ pointOfConnectionA: 32, countedBy: "power-control-system", powerControlSettingA: 32 });
    expect(r.figures.storage!.pointOfConnection).toEqual({ currentA: 32, by: "power-control-system", inverterOutputsA: 56 });
    expect(r.figures.pointOfConnection.rule).toBe("120%");
    const old = reviewDesign(pcsDesign(true, 32), site(2017));
    expect(old.storage).toMatchObject({ pointOfConnectionA: 56, countedBy: "inverter-outputs", powerControlSettingA: null });
  });

  // 2020 on, supply side (REFERENCE.md 705.11): the sources' continuous output against the service rating.
  test("a supply-side connection also counts the battery inverter (2020 705.11)", () => {
    const d = storedDesign(acStorage(), { service: { ...stringDesign().service, connection: "supply-side" } });
    expect(check(reviewDesign(d, site(2020)), "point-of-connection")).toMatchObject({ value: 56, limit: 200, status: "pass" });
  });
});
