import { describe, expect, test } from "vitest";
import { describeCheck } from "@/lib/documents/packets/check-methods";
import { equipmentSchedule, labelValueLines, listingText, scopeOfWork, structuralRows } from "@/lib/documents/packets/facts";
import { formatQuantity, printable, printableDeep } from "@/lib/documents/text";
import { packetFixture } from "@/tests/support/packet-fixture";

const FIXTURES = [
  ["string inverter", packetFixture()],
  ["optimizer strings", packetFixture({ variant: 1 })],
  ["microinverters", packetFixture({ busbarA: 150, mainBreakerA: 150 })],
] as const;

describe("figures as the sheets print them", () => {
  test.each([
    [463.34, "V", "463.34 V"],
    [15090, "kWh", "15,090 kWh"],
    [1.17, "", "1.17"],
    [0, "A", "0 A"],
    [null, "A", "—"],
    [2.55, "lb/ft²", "2.55 lb/ft²"],
  ] as const)("%s %s → %s", (value, unit, printed) => {
    expect(formatQuantity(value, unit)).toBe(printed);
  });

  test("characters the shipped fonts lack are spelled out, everywhere in the input", () => {
    expect(printable("PV breaker: 35 A → 40 A, Vd ≤ 2 %")).toBe("PV breaker: 35 A to 40 A, Vd <= 2 %");
    expect(printableDeep({ changes: ["8 AWG → 6 AWG"], n: 3, none: null, nested: { ok: "αVoc" } })).toEqual({
      changes: ["8 AWG to 6 AWG"],
      n: 3,
      none: null,
      nested: { ok: "αVoc" },
    });
  });

  test("listing and certification are joined with each standard once", () => {
    expect(listingText("UL 1741 SB", "UL 1741 SB; IEEE 1547-2018 Category B")).toBe("UL 1741 SB; IEEE 1547-2018 Category B");
    expect(listingText("", undefined)).toBe("—");
  });
});

describe("scope of work", () => {
  test("opens with the DC and AC ratings, with the article the number takes", () => {
    expect(scopeOfWork(FIXTURES[0][1])[0]).toBe(
      "Install an 8.91 kW DC / 7.6 kW AC grid-tied PV system at 120 Larkin Mill Rd, Brackenford, CO 80913.",
    );
    expect(scopeOfWork(FIXTURES[1][1])[0]).toMatch(/^Install a 7\.6 kW DC \/ 6 kW AC grid-tied PV system/);
  });

  test("names storage and export", () => {
    for (const [, input] of FIXTURES) expect(scopeOfWork(input).at(-1)).toMatch(/^No energy storage\. The system exports surplus energy/);
  });
});

describe("schedules", () => {
  test("the equipment schedule counts modules and one device per module", () => {
    const rows = equipmentSchedule(FIXTURES[0][1]);
    expect(rows.map((r) => [r.item, r.quantity, r.model])).toEqual([
      ["PV module", 22, "LK-405M-54H"],
      ["Inverter", 1, "QS-7600"],
      ["Rapid shutdown device", 22, "SR-1 Shutdown Unit"],
    ]);
  });

  test("structural rows take their loads from the review's roof checks", () => {
    const [row] = structuralRows(FIXTURES[0][1]);
    expect(row).toMatchObject({ label: "South roof", moduleCount: 22, tilt: "23°", azimuth: "185°", attachmentCount: 28 });
    expect(row!.deadLoad?.value).toBe(2.55);
    expect(row!.perAttachment?.value).toBe(42.09);
  });

  test("label values get names and units", () => {
    const label = FIXTURES[0][1].review.labels.find((l) => l.id === "multiple-sources")!;
    expect(labelValueLines(label)).toEqual([
      { name: "Rated AC output current", value: "32 A" },
      { name: "Nominal AC voltage", value: "240 V" },
      { name: "PV breaker", value: "40 A" },
    ]);
  });
});

describe("calculation methods", () => {
  test.each(FIXTURES)("every check of the %s design has a method of its own and the inputs it read", (_, input) => {
    for (const check of input.review.checks) {
      const { inputs, method } = describeCheck(check, input.design, input.site, input.review.figures);
      expect(method, check.id).not.toBe("See the finding");
      if (check.id !== "rapid-shutdown") expect(inputs.length, check.id).toBeGreaterThan(0);
    }
  });

  test("the string voltage check shows the coefficient method with this design's numbers", () => {
    const input = FIXTURES[0][1];
    const check = input.review.checks.find((c) => c.id === "string-voltage:S1")!;
    expect(describeCheck(check, input.design, input.site, input.review.figures)).toEqual({
      inputs: ["N = 11 modules in series", "Voc = 37.2 V (STC)", "Tmin = -24 °C record low", "αVoc = -0.27 %/°C"],
      method:
        "N × Voc × [1 + (Tmin − 25) × αVoc / 100]; limit: the lower of the inverter's maximum input and the 690.7 limit for the building",
    });
  });
});
