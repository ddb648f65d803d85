import { describe, expect, test } from "vitest";
import { requiredLabels } from "@/lib/engineering";
import type { LabelFacts } from "@/lib/engineering";

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
