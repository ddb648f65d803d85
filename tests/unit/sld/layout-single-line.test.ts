import { describe, expect, test } from "vitest";
import type { Design } from "@/lib/engineering";
import { layoutSingleLine, type SldScene, type SldText } from "@/lib/sld";
import { runTitle } from "@/lib/sld/conductor-label";
import {
  acStorageFixture,
  dcStorageFixture,
  manyRuns,
  manyStrings,
  microBranches,
  microFixture,
  microThroughBoxes,
  optimizerFixture,
  strayRun,
  stringFixture,
  supplySideFixture,
  throughJunctionBox,
  twoInverters,
} from "./sld-designs";

const texts = (scene: SldScene) => scene.items.filter((i): i is SldText => i.kind === "text").map((t) => t.text);
const moduleSymbols = (scene: SldScene) => scene.items.filter((i) => i.kind === "rect" && i.width === 22 && i.height === 16).length;

// The agreed estimate: chars × size × 0.55 wide, from the cap line to the descenders.
function estimatedBox(t: SldText) {
  const width = t.text.length * t.size * 0.55;
  const minX = t.anchor === "start" ? t.x : t.anchor === "middle" ? t.x - width / 2 : t.x - width;
  return { minX, maxX: minX + width, minY: t.y - t.size * 0.75, maxY: t.y + t.size * 0.25 };
}

function overlappingTexts(scene: SldScene): string[] {
  const boxes = scene.items.filter((i): i is SldText => i.kind === "text").map((t) => ({ t, box: estimatedBox(t) }));
  const clashes: string[] = [];
  boxes.forEach((a, i) =>
    boxes.slice(i + 1).forEach((b) => {
      const apart = a.box.maxX <= b.box.minX || b.box.maxX <= a.box.minX || a.box.maxY <= b.box.minY || b.box.maxY <= a.box.minY;
      if (!apart) clashes.push(`"${a.t.text}" × "${b.t.text}"`);
    }),
  );
  return clashes;
}

function textsOutside(scene: SldScene): string[] {
  return scene.items
    .filter((i): i is SldText => i.kind === "text")
    .filter((t) => {
      const b = estimatedBox(t);
      return b.minX < 0 || b.minY < 0 || b.maxX > scene.width || b.maxY > scene.height;
    })
    .map((t) => t.text);
}

describe("single-line layout: what it says", () => {
  test("string inverter with shutdown devices: ratings, counts and conductor labels from the design", () => {
    const scene = layoutSingleLine(stringFixture(), { necEdition: 2023 });
    const all = texts(scene);
    expect(scene.unit).toBe("pt");
    expect(all).toEqual(
      expect.arrayContaining([
        "40 A PV breaker",
        "200 A",
        "busbar",
        "main",
        "× 11",
        "INVERTER",
        "RAPID SHUTDOWN INITIATOR",
        "AC DISCONNECT",
        "UTILITY METER",
        "kWh",
        "UTILITY GRID",
      ]),
    );
    expect(all.filter((t) => t === "200 A")).toHaveLength(2); // busbar and main
    expect(all.filter((t) => t === "× 11")).toHaveLength(2);
    expect(all).toEqual(expect.arrayContaining(["String S1 to inverter, 62 ft", "2 × 10 AWG Cu PV wire", "free air; EGC 6 AWG Cu"]));
    expect(all).toEqual(
      expect.arrayContaining(["Inverter to service panel, 28 ft", "2 × 8 AWG Cu THWN-2", "in 3/4 in EMT; EGC 10 AWG Cu"]),
    );
    expect(all).toContain("Stavemoor SR-1 Shutdown Unit");
    expect(all).toContain("DC disconnect integral (dashed)");
    expect(all.join(" ")).toMatch(/NEC 2023/);
    expect(all.join(" ")).toMatch(/690\.12/);
    expect(scene.description).toMatch(/40 A PV breaker on a 200 A busbar/);
  });

  test("optimizer strings: the optimizer is named and the fixed string voltage shown", () => {
    const all = texts(layoutSingleLine(optimizerFixture()));
    expect(all).toEqual(
      expect.arrayContaining([
        "× 10",
        "35 A PV breaker",
        "DC optimizer on each module:",
        "Calderby CB-P450 Optimizer",
        "Fixed string voltage 380 V",
      ]),
    );
  });

  test("microinverters: branch circuits with unit counts and breakers meet in a combiner", () => {
    const all = texts(layoutSingleLine(microFixture()));
    expect(all).toEqual(
      expect.arrayContaining([
        "Branch 1: 8 microinverters",
        "Branch 2: 8 microinverters",
        "× 8",
        "AC COMBINER",
        "Joins 2 branch circuits",
        "30 A PV breaker",
        "150 A",
      ]),
    );
    expect(all.filter((t) => t === "20 A")).toHaveLength(2);
    expect(all).toEqual(
      expect.arrayContaining([
        "Branch 1 on the roof, 35 ft, 20 A breaker",
        "2 × 12 AWG Cu THWN-2",
        "free air; EGC 12 AWG Cu",
        "2 × 10 AWG Cu THWN-2",
      ]),
    );
    // The AC disconnect is the initiator; there is no separate one.
    expect(all).not.toContain("RAPID SHUTDOWN INITIATOR");
    expect(all).toContain("Also the rapid shutdown");
  });

  test("supply-side connection: a fused disconnect tapped ahead of the main, no PV breaker", () => {
    const all = texts(layoutSingleLine(supplySideFixture()));
    expect(all).toEqual(expect.arrayContaining(["FUSED PV DISCONNECT", "40 A fuses", "Supply-side connection (705.11)", "100 A"]));
    expect(all.some((t) => t.includes("PV breaker"))).toBe(false);
  });

  test("a 14-module string is drawn as three module symbols marked × 14", () => {
    const scene = layoutSingleLine(manyStrings(stringFixture(), 4, 14));
    expect(moduleSymbols(scene)).toBe(4 * 3);
    expect(texts(scene).filter((t) => t === "× 14")).toHaveLength(4);
  });

  test("strings sharing a run get one label with four conductors", () => {
    const all = texts(layoutSingleLine(manyStrings(stringFixture(), 6)));
    expect(all).toEqual(expect.arrayContaining(["Strings S5 + S6 to inverter, 60 ft", "4 × 10 AWG Cu PV wire"]));
  });

  test("heading and notes can be left to the page around the diagram", () => {
    const scene = layoutSingleLine(stringFixture(), { heading: false, notes: false });
    expect(texts(scene)).not.toContain("NOTES");
    expect(texts(scene)).not.toContain("SINGLE-LINE DIAGRAM");
  });
});

/** The run's title on the drawing, and the number tag on the wire in front of it (runTitle's words). */
function numberedTitles(scene: SldScene): { number: string; title: string }[] {
  const all = scene.items.filter((i): i is SldText => i.kind === "text");
  return all
    .filter((t) => /, \d+(\.\d)? ft/.test(t.text))
    .map((title) => {
      // drawRunLabel: tag centre 10 pt left of the words, its number 25.3 pt below the title's baseline.
      const tag = all.find(
        (t) => t.anchor === "middle" && Math.abs(t.x - (title.x - 10)) < 0.02 && Math.abs(t.y - (title.y + 25.3)) < 0.02,
      );
      return { number: tag?.text ?? "", title: title.text };
    });
}

// Designs whose circuits pass through more than one run, or that name a run the drawing cannot connect.
const MULTI_RUN: [string, Design][] = [
  ["two runs per string through a junction box", throughJunctionBox()],
  ["ten runs, three junction boxes on the DC side", manyRuns()],
  ["microinverter branches through roof boxes", microThroughBoxes()],
  ["a run naming a string that is gone", strayRun()],
];

describe("single-line layout: every run of the conductor schedule, numbered as the schedule numbers it", () => {
  const cases: [string, Design][] = [
    ["one run per string", stringFixture()],
    ["two inverters into a combiner", twoInverters()],
    ["optimizer strings", optimizerFixture()],
    ["supply-side connection", supplySideFixture()],
    ...MULTI_RUN,
  ];

  test.each(cases)("%s: each run appears once with its schedule number", (_, design) => {
    const scene = layoutSingleLine(design, { necEdition: 2023 });
    const expected = design.runs.map((run, i) => ({ number: String(i + 1), title: runTitle(run) }));
    expect(numberedTitles(scene).sort((a, b) => Number(a.number) - Number(b.number))).toEqual(expected);
  });

  test("two runs per string: both strings enter one junction box, then share one conduit to the inverter", () => {
    const scene = layoutSingleLine(throughJunctionBox());
    const all = texts(scene);
    expect(all.filter((t) => /^JB\d+$/.test(t))).toEqual(["JB1"]);
    expect(all).toEqual(
      expect.arrayContaining(["Junction box to inverter, 48 ft", "4 × 10 AWG Cu THWN-2", "in 3/4 in EMT; EGC 10 AWG Cu"]),
    );
    // The shared conduit carries two separate circuits: no junction dot joins the strings on the DC side.
    const inverterLeft = scene.items.find((i) => i.kind === "rect" && i.dash?.join() === "4,2.5")!;
    const dots = scene.items.filter(
      (i) => i.kind === "circle" && i.fill === "ink" && inverterLeft.kind === "rect" && i.cx < inverterLeft.x,
    );
    expect(dots).toEqual([]);
    expect(scene.items.filter((i) => i.kind === "path" && / A 4 4 /.test(i.d))).toHaveLength(1); // the raceway outline
  });

  test("many runs: a junction box wherever a run meets the next, on both sides of the inverter", () => {
    const all = texts(layoutSingleLine(manyRuns()));
    expect(all.filter((t) => /^JB\d+$/.test(t))).toEqual(["JB1", "JB2", "JB3", "JB4"]);
  });

  test("a run the drawing cannot connect is listed under it with its number, not dropped", () => {
    const all = texts(layoutSingleLine(strayRun()));
    expect(all).toContain("RUNS NOT CONNECTED ON THIS DRAWING");
    expect(all).toContain("String S9 to inverter, 20 ft");
  });

  test("the notes explain the numbers and the boxes", () => {
    expect(texts(layoutSingleLine(throughJunctionBox())).join(" ")).toMatch(
      /Circled numbers are the run numbers of the conductor schedule/,
    );
  });
});

describe("single-line layout: readable at every size", () => {
  const cases: [string, Design][] = [
    ...[1, 2, 3, 4, 5, 6].map((n): [string, Design] => [`${n} string(s), shutdown devices`, manyStrings(stringFixture(), n, 14)]),
    ...[1, 2, 3, 4, 5, 6].map((n): [string, Design] => [`${n} optimizer string(s)`, manyStrings(optimizerFixture(), n, 10)]),
    ...[1, 2, 3].map((n): [string, Design] => [`${n} microinverter branch(es)`, microBranches(n)]),
    ["two inverters into a combiner", twoInverters()],
    ["supply-side connection", supplySideFixture()],
    ["the microinverter fixture", microFixture()],
    ...MULTI_RUN,
    ...[1, 2, 3, 4, 5, 6].map((n): [string, Design] => [
      `${n} string(s) on a hybrid inverter with batteries and a backup panel`,
      dcStorageFixture(n),
    ]),
    ["microinverters with an AC-coupled battery and a power control system", acStorageFixture()],
  ];

  test.each(cases)("%s: no text overlaps another, all inside the scene", (_, design) => {
    for (const scene of [layoutSingleLine(design, { necEdition: 2020 }), layoutSingleLine(design, { heading: false, notes: false })]) {
      expect(overlappingTexts(scene)).toEqual([]);
      expect(textsOutside(scene)).toEqual([]);
    }
  });

  test("the overlap check itself catches a label dropped onto another", () => {
    const scene = layoutSingleLine(stringFixture());
    const label = scene.items.find((i): i is SldText => i.kind === "text" && i.text === "40 A PV breaker")!;
    const clash = { ...scene, items: [...scene.items, { ...label, text: "stray", x: label.x + 3, y: label.y + 2 }] };
    expect(overlappingTexts(clash)).toEqual(['"40 A PV breaker" × "stray"']);
  });

  test("the diagram grows downward with more strings, not sideways", () => {
    const one = layoutSingleLine(manyStrings(stringFixture(), 1));
    const six = layoutSingleLine(manyStrings(stringFixture(), 6));
    expect(six.height).toBeGreaterThan(one.height + 200);
    expect(six.width).toBeLessThan(one.width * 1.1);
  });
});

describe("single-line layout: energy storage", () => {
  const noEdition = (d: Design) => layoutSingleLine(d);

  test("DC-coupled: the batteries, the ESS disconnect, the numbered battery circuit, the backup panel and its transfer", () => {
    const all = texts(layoutSingleLine(dcStorageFixture(), { necEdition: 2023 }));
    expect(all).toEqual(
      expect.arrayContaining([
        "ENERGY STORAGE SYSTEM",
        "2 × Brindle BX-13",
        "13.5 kWh each (12.6 usable)",
        "400 V DC · garage",
        "Listed UL 9540, UL 9540A",
        "ESS DISCONNECT",
        "Integral to the ESS",
        "B1",
        "Batteries to inverter, 125 A OCPD",
        "1/0 AWG Cu THWN-2",
        "Backup output (710.15)",
        "32 A at 240 V, 7.6 kW",
        "TRANSFER",
        "Transfer time 0.02 s (data sheet)",
        "BACKUP LOADS PANEL",
        "125 A busbar, 100 A main",
        "40 A inverter breaker, far end",
        "well pump: 10 A at 240 V",
        "POINT OF CONNECTION",
        "Operating mode: self-consumption",
      ]),
    );
    expect(all).not.toContain("BATTERY INVERTER");
  });

  test("AC-coupled: the battery inverter, its output circuit on its own breaker, and the PCS setting counted where 705.13 exists", () => {
    const scene = layoutSingleLine(acStorageFixture(), { necEdition: 2023 });
    const all = texts(scene);
    expect(all).toEqual(
      expect.arrayContaining([
        "BATTERY INVERTER",
        "Brindle BI-5",
        "5.76 kW, 240 V, 24 A out",
        "B1",
        "Battery inverter to service panel, 30 A OCPD",
        "30 A ESS",
        "Power control system set to 40 A",
        "counted at the busbar (705.13, NEC 2023)",
        "Operating mode: non-export",
        "Export limited to 0 kW by the PCS",
      ]),
    );
    expect(all).not.toContain("BACKUP LOADS PANEL");
    expect(scene.description).toContain("AC-coupled through a battery inverter");
  });

  // 705.13 (power control systems) first appears in NEC 2020; NFPA 70-2017 has no such section (issue 17's reference, checked in clauses.ts).
  test("NEC 2017: the PCS setting is shown but not counted, and every inverter output is", () => {
    const d = acStorageFixture();
    const all = texts(layoutSingleLine(d, { necEdition: 2017 }));
    expect(all).toContain("not counted: NEC 2017 has no 705.13");
    // 705.12(B) counts every source's continuous output: the microinverters' and the battery inverter's 24 A.
    const pvA = d.inverters.reduce((t, i) => t + i.quantity * i.acOutputCurrentA, 0);
    expect(all).toContain(`Sources counted: ${Math.round((pvA + 24) * 100) / 100} A of inverter output`);
  });

  test("battery circuits are tagged B1, B2, … in the design's order, and a missing one is said so", () => {
    const d = dcStorageFixture();
    const storage = d.storage!;
    const second = { ...storage.circuits![0], id: "c2", label: "Second bank to inverter" };
    expect(texts(noEdition({ ...d, storage: { ...storage, circuits: [storage.circuits![0], second] } }))).toEqual(
      expect.arrayContaining(["B1", "B2", "Second bank to inverter, 125 A OCPD"]),
    );
    expect(texts(noEdition({ ...d, storage: { ...storage, circuits: [] } }))).toContain("No battery circuit entered");
  });

  test("the notes carry the storage cautions; a PV-only diagram has no storage at all", () => {
    const notes = texts(layoutSingleLine(dcStorageFixture(), { necEdition: 2023 })).join(" ");
    expect(notes).toContain("A battery stays energized when the array and the grid are off.");
    expect(notes).toContain("706.15");
    const pvOnly = texts(layoutSingleLine(stringFixture(), { necEdition: 2023 })).join(" ");
    for (const word of ["ENERGY STORAGE", "ESS", "BACKUP", "POINT OF CONNECTION", "battery"]) expect(pvOnly).not.toContain(word);
  });
});
