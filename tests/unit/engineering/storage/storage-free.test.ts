import { describe, expect, test } from "vitest";
import { NEC_EDITIONS, reviewDesign } from "@/lib/engineering";
import { coldSite, fenwickOptimizer, microDesign, northmereOptimizerInverter, stringDesign } from "../fixtures";

// The reviews of storage-free designs, recorded before storage entered the engine: a design without
// a battery must review exactly as it did, in every edition (the recording is the proof, not a copy of today's output).
const designs = {
  string: stringDesign(),
  micro: microDesign(),
  optimizer: stringDesign({
    inverters: [northmereOptimizerInverter],
    moduleLevelDevice: fenwickOptimizer,
    strings: [
      { id: "S1", inverterId: "inv-opt", modulesInSeries: 10 },
      { id: "S2", inverterId: "inv-opt", modulesInSeries: 10 },
    ],
    runs: stringDesign().runs.map((r) =>
      r.circuit.kind === "ac-output" ? { ...r, circuit: { kind: "ac-output" as const, sources: [{ inverterId: "inv-opt" }] } } : r,
    ),
  }),
  supplySide: stringDesign({ service: { ...stringDesign().service, connection: "supply-side", pvBreakerA: 40 } }),
  overloadedBus: stringDesign({ service: { ...stringDesign().service, busbarA: 200, mainBreakerA: 200, pvBreakerAtOppositeEnd: false } }),
};

describe("a design without storage reviews as it did before storage existed", () => {
  test("every check, label, summary and figure is unchanged in every edition", async () => {
    const reviews = Object.fromEntries(
      Object.entries(designs).flatMap(([name, design]) =>
        NEC_EDITIONS.map((edition) => [`${name} ${edition}`, reviewDesign(design, { ...coldSite, necEdition: edition })]),
      ),
    );
    await expect(JSON.stringify(reviews, null, 2) + "\n").toMatchFileSnapshot("./storage-free-reviews.json");
  });
});
