import { describe, expect, test } from "vitest";
import { requiredLabels, reviewDesign } from "@/lib/engineering";
import type { LabelFacts } from "@/lib/engineering";
import { coldSite, microDesign, stringDesign } from "./fixtures";

const facts: LabelFacts = {
  edition: 2020,
  onBuilding: true,
  maxDcVoltageV: 450.4,
  maxDcCircuitCurrentA: 15.25,
  rapidShutdown: "module-level-devices",
  connection: "load-side",
  loadSideRule: "120%",
  busbarA: 200,
  pvBreakerA: 40,
  inverterOutputA: 32,
  acVoltageV: 240,
  serviceLocation: "east wall",
  pvDisconnectLocation: "beside the meter",
};
const ids = (f: LabelFacts) => requiredLabels(f).map((l) => l.id);
const label = (f: LabelFacts, id: string) => requiredLabels(f).find((l) => l.id === id)!;

describe("required warning labels with computed values", () => {
  test("a string system on a 120 % connection needs seven labels", () => {
    expect(ids(facts)).toEqual([
      "dc-max-voltage",
      "pv-disconnect",
      "rapid-shutdown",
      "rapid-shutdown-switch",
      "multiple-sources",
      "pv-breaker-position",
      "power-source-directory",
    ]);
  });

  // 690.53: 2017 lists maximum voltage and maximum circuit current; 2020/2023 the voltage only (from memory).
  test.each([
    [2017, "SOLAR DC CIRCUIT. Highest voltage: 450.4 V DC. Highest circuit current: 15.25 A."],
    [2020, "SOLAR DC CIRCUIT. Highest voltage: 450.4 V DC."],
    [2023, "SOLAR DC CIRCUIT. Highest voltage: 450.4 V DC."],
  ] as const)("NEC %d 690.53 label reads %j", (edition, text) => {
    const l = label({ ...facts, edition }, "dc-max-voltage");
    expect(l.text).toBe(text);
    expect(l.clause).toBe(`NEC ${edition} 690.53`);
    expect(l.values.maxDcVoltageV).toBe(450.4);
  });

  test("the panel label carries the inverter current, voltage and breaker (2020 705.12(C), from memory)", () => {
    const l = label(facts, "multiple-sources");
    expect(l.text).toContain("32 A at 240 V AC through the 40 A solar breaker");
    expect(l.clause).toBe("NEC 2020 705.12(C)");
    expect(l.values).toEqual({ inverterOutputA: 32, acVoltageV: 240, pvBreakerA: 40 });
  });

  test("sum rule: the label states the busbar limit instead of the position warning", () => {
    const f = { ...facts, loadSideRule: "sum" as const };
    expect(ids(f)).not.toContain("pv-breaker-position");
    expect(label(f, "breaker-sum").text).toContain("no more than 200 A");
  });

  test("micro-inverters: no DC label and no two-sides-live warning", () => {
    const f = { ...facts, maxDcVoltageV: null, maxDcCircuitCurrentA: null, rapidShutdown: "micro-inverters" as const };
    expect(ids(f)).not.toContain("dc-max-voltage");
    expect(label(f, "pv-disconnect").text).toBe("SOLAR PV SYSTEM DISCONNECT.");
  });

  test("supply side: no panel-busbar labels; ground mount: no rapid shutdown labels", () => {
    const f = { ...facts, connection: "supply-side" as const, loadSideRule: null, onBuilding: false };
    expect(ids(f)).toEqual(["dc-max-voltage", "pv-disconnect", "power-source-directory"]);
  });

  test("the directory falls back to the site plan and never prints 'undefined'", () => {
    const l = label({ ...facts, serviceLocation: undefined, pvDisconnectLocation: undefined }, "power-source-directory");
    expect(l.text).toContain("see the site plan");
    expect(l.text).not.toMatch(/undefined|NaN/);
  });
});

// Point of interconnection marked with the rated AC output current and nominal operating AC voltage:
// NEC 2017 690.54. The 2020 and 2023 editions have no 690.54 (from memory, not confirmed); there the
// load-side values ride on the 705.12(C) panel label above.
describe("690.54 point-of-interconnection label", () => {
  test.each([
    [2017, "load-side", "NEC 2017 690.54"],
    [2017, "supply-side", "NEC 2017 690.54"],
    [2020, "load-side", null], // from memory
    [2023, "supply-side", null], // from memory
  ] as const)("NEC %d, %s connection → %s", (edition, connection, citation) => {
    const f = { ...facts, edition, connection, loadSideRule: connection === "load-side" ? facts.loadSideRule : null };
    const l = requiredLabels(f).find((x) => x.id === "interactive-point");
    if (citation === null) {
      expect(l).toBeUndefined();
      return;
    }
    expect(l).toMatchObject({
      clause: citation,
      edition,
      text: "SOLAR POWER SOURCE CONNECTED HERE. Rated output: 32 A AC at a nominal 240 V.",
      values: { inverterOutputA: 32, acVoltageV: 240 },
    });
  });

  test.each([
    // one 32 A string inverter at 240 V
    ["string inverter", stringDesign(), 32, 240, "32 A AC at a nominal 240 V"],
    // 20 micro-inverters × 1.25 A = 25 A at 240 V
    ["micro-inverters", microDesign(), 25, 240, "25 A AC at a nominal 240 V"],
  ] as const)("a 2017 review of the %s design fills in %d A at %d V", (_what, design, currentA, voltageV, text) => {
    const l = reviewDesign(design, { ...coldSite, necEdition: 2017 }).labels.find((x) => x.id === "interactive-point")!;
    expect(l.values).toEqual({ inverterOutputA: currentA, acVoltageV: voltageV });
    expect(l.text).toContain(text);
    expect(l.placement).toMatch(/disconnecting means/);
  });
});
