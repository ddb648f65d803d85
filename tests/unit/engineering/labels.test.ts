import { describe, expect, test } from "vitest";
import { requiredLabels, reviewDesign } from "@/lib/engineering";
import type { LabelFacts, NecEdition } from "@/lib/engineering";
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
  hasDcRuns: true,
};
const ids = (f: LabelFacts) => requiredLabels(f).map((l) => l.id);
const label = (f: LabelFacts, id: string) => requiredLabels(f).find((l) => l.id === id)!;
const flat = (text: string) => text.replace(/\n/g, " ");

describe("required warning labels with computed values", () => {
  test("a string system on a 120 % connection (2020) needs nine labels", () => {
    expect(ids(facts)).toEqual([
      "dc-max-voltage",
      "pv-disconnect",
      "interactive-point",
      "rapid-shutdown",
      "rapid-shutdown-switch",
      "dc-circuit-marking",
      "multiple-sources",
      "pv-breaker-position",
      "power-source-directory",
    ]);
  });

  // 690.53: 2017 lists maximum voltage and maximum circuit current; 2020/2023 the voltage only (from memory).
  // The code sets the content, not the words: the label is not marked as prescribed wording.
  test.each([
    [2017, "PV SYSTEM DC MAXIMUM VOLTAGE: 450.4 V DC MAXIMUM CIRCUIT CURRENT: 15.25 A"],
    [2020, "PV SYSTEM DC MAXIMUM VOLTAGE: 450.4 V DC"],
    [2023, "PV SYSTEM DC MAXIMUM VOLTAGE: 450.4 V DC"],
  ] as const)("NEC %d 690.53 label reads %j", (edition, text) => {
    const l = label({ ...facts, edition }, "dc-max-voltage");
    expect(flat(l.text)).toBe(text);
    expect(l).toMatchObject({ clause: `NEC ${edition} 690.53`, prescribed: false });
    expect(l.values.maxDcVoltageV).toBe(450.4);
  });

  test("every label carries our plain explanation beside the label's own words, never instead of them", () => {
    for (const edition of [2017, 2020, 2023] as const) {
      for (const l of requiredLabels({ ...facts, edition })) {
        expect(l.explanation.length).toBeGreaterThan(20);
        expect(l.explanation).not.toBe(l.text);
        expect(l.text).not.toMatch(/undefined|NaN/);
      }
    }
  });
});

// The code's prescribed wording, edition by edition. All from memory: none of the three editions' text
// was at hand; the 2023 move of the rapid shutdown marking into 690.12(D) agrees with a trade summary.
describe("labels in the code's words, by edition", () => {
  const RSD =
    'SOLAR PV SYSTEM IS EQUIPPED WITH RAPID SHUTDOWN. TURN RAPID SHUTDOWN SWITCH TO THE "OFF" POSITION TO SHUT DOWN PV SYSTEM AND REDUCE SHOCK HAZARD IN THE ARRAY.';
  test.each([
    // [edition, label, clause, text] — 690.13(B)
    [
      2017,
      "pv-disconnect",
      "NEC 2017 690.13(B)",
      "PV SYSTEM DISCONNECT WARNING ELECTRIC SHOCK HAZARD TERMINALS ON THE LINE AND LOAD SIDES MAY BE ENERGIZED IN THE OPEN POSITION",
    ],
    [
      2020,
      "pv-disconnect",
      "NEC 2020 690.13(B)",
      "PV SYSTEM DISCONNECT WARNING ELECTRIC SHOCK HAZARD TERMINALS ON THE LINE AND LOAD SIDES MAY BE ENERGIZED IN THE OPEN POSITION",
    ],
    [
      2023,
      "pv-disconnect",
      "NEC 2023 690.13(B)",
      "PV SYSTEM DISCONNECT WARNING ELECTRIC SHOCK HAZARD TERMINALS ON THE LINE AND LOAD SIDES MAY BE ENERGIZED IN THE OPEN POSITION",
    ],
    // 690.56(C)(1)(a) (2017, 2020); 690.12(D) (2023)
    [2017, "rapid-shutdown", "NEC 2017 690.56(C)(1)(a)", RSD],
    [2020, "rapid-shutdown", "NEC 2020 690.56(C)(1)(a)", RSD],
    [2023, "rapid-shutdown", "NEC 2023 690.12(D)", RSD],
    // the switch: 690.56(C)(3) (2017, 2020); 690.12(D) (2023)
    [2017, "rapid-shutdown-switch", "NEC 2017 690.56(C)(3)", "RAPID SHUTDOWN SWITCH FOR SOLAR PV SYSTEM"],
    [2020, "rapid-shutdown-switch", "NEC 2020 690.56(C)(3)", "RAPID SHUTDOWN SWITCH FOR SOLAR PV SYSTEM"],
    [2023, "rapid-shutdown-switch", "NEC 2023 690.12(D)", "RAPID SHUTDOWN SWITCH FOR SOLAR PV SYSTEM"],
    // 120 % rule: 2017 705.12(B)(2)(3)(b) named the inverter; 2020 705.12(B)(3)(2), 2023 705.12(B)(2) any power source
    [
      2017,
      "pv-breaker-position",
      "NEC 2017 705.12(B)(2)(3)(b)",
      "WARNING: INVERTER OUTPUT CONNECTION DO NOT RELOCATE THIS OVERCURRENT DEVICE",
    ],
    [
      2020,
      "pv-breaker-position",
      "NEC 2020 705.12(B)(3)(2)",
      "WARNING: POWER SOURCE OUTPUT CONNECTION— DO NOT RELOCATE THIS OVERCURRENT DEVICE",
    ],
    [
      2023,
      "pv-breaker-position",
      "NEC 2023 705.12(B)(2)",
      "WARNING: POWER SOURCE OUTPUT CONNECTION— DO NOT RELOCATE THIS OVERCURRENT DEVICE",
    ],
    // DC wiring methods: 2017 690.31(G)(3); 2020/2023 690.31(D)(2)
    [2017, "dc-circuit-marking", "NEC 2017 690.31(G)(3)", "WARNING: PHOTOVOLTAIC POWER SOURCE"],
    [2020, "dc-circuit-marking", "NEC 2020 690.31(D)(2)", "SOLAR PV DC CIRCUIT"],
    [2023, "dc-circuit-marking", "NEC 2023 690.31(D)(2)", "SOLAR PV DC CIRCUIT"],
  ] as const)("NEC %d %s (%s)", (edition, id, clause, text) => {
    const l = label({ ...facts, edition: edition as NecEdition }, id);
    expect(l).toMatchObject({ clause, prescribed: true });
    expect(flat(l.text)).toBe(text);
  });

  test.each([2017, 2020, 2023] as const)(
    "NEC %d sum rule (705.12, from memory): the multiple-sources warning in the code's words",
    (edition) => {
      const l = label({ ...facts, edition, loadSideRule: "sum" }, "breaker-sum");
      expect(l.prescribed).toBe(true);
      expect(flat(l.text)).toBe(
        "WARNING: THIS EQUIPMENT FED BY MULTIPLE SOURCES. TOTAL RATING OF ALL OVERCURRENT DEVICES, EXCLUDING MAIN SUPPLY OVERCURRENT DEVICE, SHALL NOT EXCEED AMPACITY OF BUSBAR.",
      );
      expect(l.explanation).toContain("200 A");
    },
  );

  test("the 705.12(C) panel marking has no set words: our wording carries the current, voltage and breaker (2020, from memory)", () => {
    const l = label(facts, "multiple-sources");
    expect(l.text).toContain("32 A AT 240 V AC THROUGH THE 40 A PV BREAKER");
    expect(l).toMatchObject({ clause: "NEC 2020 705.12(C)", prescribed: false });
    expect(l.values).toEqual({ inverterOutputA: 32, acVoltageV: 240, pvBreakerA: 40 });
  });

  test("sum rule: the label states the busbar limit instead of the position warning", () => {
    const f = { ...facts, loadSideRule: "sum" as const };
    expect(ids(f)).not.toContain("pv-breaker-position");
    expect(ids(f)).toContain("breaker-sum");
  });

  test("micro-inverters: no DC label, no DC wiring marking and no two-sides-live warning", () => {
    const f = { ...facts, maxDcVoltageV: null, maxDcCircuitCurrentA: null, rapidShutdown: "micro-inverters" as const, hasDcRuns: false };
    expect(ids(f)).not.toContain("dc-max-voltage");
    expect(ids(f)).not.toContain("dc-circuit-marking");
    expect(label(f, "pv-disconnect").text).toBe("PV SYSTEM DISCONNECT");
  });

  test("supply side: no panel-busbar labels; ground mount: no rapid shutdown labels or building DC marking", () => {
    const f = { ...facts, connection: "supply-side" as const, loadSideRule: null, onBuilding: false };
    expect(ids(f)).toEqual(["dc-max-voltage", "pv-disconnect", "interactive-point", "power-source-directory"]);
  });

  test("the directory falls back to the site plan and never prints 'undefined'", () => {
    const l = label({ ...facts, serviceLocation: undefined, pvDisconnectLocation: undefined }, "power-source-directory");
    expect(l.text).toContain("SEE THE SITE PLAN");
    expect(l.text).not.toMatch(/undefined|NaN/i);
  });
});

// Point of interconnection marked with the rated AC output current and nominal operating AC voltage:
// 690.54 in 2017 and 2020; a trade-press summary of the 2023 changes reports it deleted in 2023.
describe("690.54 point-of-interconnection label", () => {
  test.each([
    [2017, "load-side", "NEC 2017 690.54"],
    [2017, "supply-side", "NEC 2017 690.54"],
    [2020, "load-side", "NEC 2020 690.54"],
    [2023, "load-side", null],
    [2023, "supply-side", null],
  ] as const)("NEC %d, %s connection → %s", (edition, connection, citation) => {
    const f = { ...facts, edition, connection, loadSideRule: connection === "load-side" ? facts.loadSideRule : null };
    const l = requiredLabels(f).find((x) => x.id === "interactive-point");
    if (citation === null) {
      expect(l).toBeUndefined();
      return;
    }
    expect(l).toMatchObject({ clause: citation, edition, values: { inverterOutputA: 32, acVoltageV: 240 }, prescribed: false });
    expect(flat(l!.text)).toBe("PV POWER SOURCE RATED AC OUTPUT CURRENT: 32 A NOMINAL OPERATING AC VOLTAGE: 240 V");
  });

  test.each([
    // one 32 A string inverter at 240 V
    ["string inverter", stringDesign(), 32, 240, "RATED AC OUTPUT CURRENT: 32 A"],
    // 20 micro-inverters × 1.25 A = 25 A at 240 V
    ["micro-inverters", microDesign(), 25, 240, "RATED AC OUTPUT CURRENT: 25 A"],
  ] as const)("a 2017 review of the %s design fills in %d A at %d V", (_what, design, currentA, voltageV, text) => {
    const l = reviewDesign(design, { ...coldSite, necEdition: 2017 }).labels.find((x) => x.id === "interactive-point")!;
    expect(l.values).toEqual({ inverterOutputA: currentA, acVoltageV: voltageV });
    expect(l.text).toContain(text);
    expect(l.placement).toMatch(/disconnecting means/);
  });
});
