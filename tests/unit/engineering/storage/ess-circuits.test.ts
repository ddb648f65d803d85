import { describe, expect, test } from "vitest";
import { type ConductorSize, NEC_EDITIONS, reviewDesign } from "@/lib/engineering";
import { coldSite } from "../fixtures";
import { acStorage, dcStorage, storedDesign } from "./fixtures";

const check = (r: ReturnType<typeof reviewDesign>, id: string) => r.checks.find((c) => c.id === id);

function dcCircuit(size: ConductorSize, ocpdA: number | undefined, edition: (typeof NEC_EDITIONS)[number] = 2020) {
  const storage = dcStorage();
  const circuit = { ...storage.circuits![0]!, conductor: { ...storage.circuits![0]!.conductor, size }, ocpdA };
  return reviewDesign(storedDesign({ ...storage, circuits: [circuit] }), { ...coldSite, necEdition: edition });
}

// Two units of 50 A discharge (40 A charge): 100 A continuous, so 125 A of conductor and device (706.30, 125 % of the
// maximum current; a trade summary of 2023 Article 706 states the 125 % rule; the 2017 and 2020 numbering from memory).
// Ampacities: NEC 2023 Table 310.16, 75 °C copper column (REFERENCE.md, confirmed); 240.6(A) standard ratings (confirmed).
describe("battery circuit conductors at 125 % of the maximum continuous current (706.30)", () => {
  test.each([
    ["1/0", 150, "pass"], // 150 A ≥ 125 A
    ["1", 130, "pass"],
    ["2", 115, "fail"], // 115 A < 125 A
  ] as const)("%s AWG Cu at 75 °C (%d A) → %s", (size, ampacity, status) => {
    expect(check(dcCircuit(size, 125), "ess-conductor:c1")).toMatchObject({ status, value: ampacity, limit: 125 });
  });

  test.each([
    [2017, "NEC 2017 706.30(B), 110.14(C)"],
    [2020, "NEC 2020 706.30(B), 110.14(C)"],
    [2023, "NEC 2023 706.30(B), 110.14(C)"],
  ] as const)("in %d the conductor result cites %s", (edition, citation) => {
    expect(check(dcCircuit("1/0", 125, edition), "ess-conductor:c1")!.clause).toBe(citation);
  });

  test("an AC-coupled battery inverter's output circuit counts its continuous output: 24 A → 30 A", () => {
    const storage = acStorage({
      circuits: [
        {
          id: "c2",
          label: "Battery inverter to panel",
          kind: "battery-inverter-output",
          conductor: { size: "10", material: "Cu", insulationTempC: 90 },
          ocpdA: 30,
        },
      ],
    });
    const r = reviewDesign(storedDesign(storage), coldSite);
    expect(check(r, "ess-conductor:c2")).toMatchObject({ status: "pass", value: 35, limit: 30 });
    expect(check(r, "ess-ocpd:c2")).toMatchObject({ status: "pass", value: 30, limit: 30 });
    expect(r.figures.storage!.circuits[0]).toMatchObject({ continuousA: 24, requiredAmpacityA: 30, minOcpdA: 30, ampacityA: 35 });
  });
});

describe("battery circuit overcurrent device (2017 706.21, 2020 on 706.31; 240.4)", () => {
  test.each([
    ["1/0", 125, "pass"], // ≥ 125 A, standard, protects 150 A conductor
    ["1/0", 150, "pass"], // the conductor's own ampacity
    ["1/0", 110, "fail"], // below 125 % of 100 A
    ["1/0", 175, "fail"], // above what protects a 150 A conductor
    ["1/0", 130, "warn"], // 130 A is not a 240.6(A) standard rating
    ["1", 150, "pass"], // 130 A conductor: the next standard rating up, 150 A, protects it (240.4(B))
  ] as const)("%s AWG Cu with a %d A device → %s", (size, ocpdA, status) => {
    expect(check(dcCircuit(size, ocpdA), "ess-ocpd:c1")).toMatchObject({ status, value: ocpdA, limit: 125 });
  });

  test("no device entered warns and names the field; the minimum is the next standard rating", () => {
    const c = check(dcCircuit("1/0", undefined), "ess-ocpd:c1")!;
    expect(c).toMatchObject({ status: "warn", field: "storage.circuits.c1.ocpdA" });
    expect(c.message).toContain("125 A");
  });

  test.each([
    [2017, "NEC 2017 706.21, 240.6(A), 240.4(B)"],
    [2020, "NEC 2020 706.31, 240.6(A), 240.4(B)"],
    [2023, "NEC 2023 706.31, Table 240.6(A), 240.4(B)"],
  ] as const)("in %d the device result cites %s (from memory for 2017 and 2020)", (edition, citation) => {
    expect(check(dcCircuit("1/0", 125, edition), "ess-ocpd:c1")!.clause).toBe(citation);
  });

  test("a circuit joining only some banks counts only their units", () => {
    const storage = dcStorage();
    const bank2 = { ...storage.banks[0]!, id: "b2", quantity: 1 };
    const circuits = [
      { ...storage.circuits![0]!, bankIds: ["b2"], ocpdA: 70, conductor: { ...storage.circuits![0]!.conductor, size: "4" as const } },
    ];
    const r = reviewDesign(storedDesign({ ...storage, banks: [...storage.banks, bank2], circuits }), coldSite);
    // one unit: 50 A → 62.5 A; 70 A device; 4 AWG Cu 75 °C 85 A
    expect(check(r, "ess-ocpd:c1")).toMatchObject({ status: "pass", limit: 62.5 });
    expect(check(r, "ess-conductor:c1")).toMatchObject({ status: "pass", value: 85 });
  });
});
