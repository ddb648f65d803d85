// Designs for diagram tests beyond the packet fixture: more strings, more
// branches, two inverters, a supply-side connection. Demo (invented) equipment only.
import type { ConductorRun, Design } from "@/lib/engineering";
import { packetFixture } from "@/tests/support/packet-fixture";
import { acStorage, dcStorage } from "../engineering/storage/fixtures";

export const stringFixture = () => packetFixture({ variant: 0 }).design;
export const optimizerFixture = () => packetFixture({ variant: 1 }).design;
export const microFixture = () => packetFixture({ busbarA: 150, mainBreakerA: 150 }).design;
export const supplySideFixture = () => packetFixture({ busbarA: 100, mainBreakerA: 100 }).design;

const dcRun = (id: string, stringIds: string[], lengthFt: number): ConductorRun => ({
  id,
  label: `String${stringIds.length > 1 ? "s" : ""} ${stringIds.join(" + ")} to inverter`,
  circuit: { kind: "dc-strings", stringIds },
  lengthFt,
  conductor: { size: "10", material: "Cu", insulationTempC: 90, insulation: "PV wire" },
  roofClearanceIn: 1,
  egc: { size: "10", material: "Cu" },
});

/** n strings of `modules` on one inverter; the fifth and sixth share a run, as paralleled strings do. */
export function manyStrings(base: Design, n: number, modules = 14): Design {
  const strings = Array.from({ length: n }, (_, i) => ({
    id: `S${i + 1}`,
    inverterId: base.inverters[0].id,
    mpptIndex: (i % 2) + 1,
    modulesInSeries: modules,
  }));
  const ids = strings.map((s) => s.id);
  const groups =
    n >= 6 ? [...ids.slice(0, 4).map((id) => [id]), ids.slice(4, 6), ...ids.slice(6).map((id) => [id])] : ids.map((id) => [id]);
  const runs = groups.map((g, i) => dcRun(`dc-${i + 1}`, g, 40 + 5 * i));
  return {
    ...base,
    strings,
    runs: [...runs, ...base.runs.filter((r) => r.circuit.kind === "ac-output")],
    roofPlanes: [{ ...base.roofPlanes[0], moduleCount: n * modules }],
  };
}

/** Microinverters on 1..n branch circuits of 7 units, joined in a combiner, one home run. */
export function microBranches(n: number): Design {
  const base = microFixture();
  const micro = base.inverters[0];
  const inverters = Array.from({ length: n }, (_, i) => ({ ...micro, id: `inv-${i + 1}`, quantity: 7 }));
  const branch = base.runs[0];
  const home = base.runs[base.runs.length - 1];
  const runs: ConductorRun[] = [
    ...inverters.map((inv, i) => ({
      ...branch,
      id: `branch-${i + 1}`,
      label: `Branch ${i + 1} on the roof`,
      circuit: { kind: "ac-output" as const, sources: [{ inverterId: inv.id }] },
    })),
    { ...home, circuit: { kind: "ac-output", sources: inverters.map((inv) => ({ inverterId: inv.id })) } },
  ];
  return { ...base, inverters, runs, roofPlanes: [{ ...base.roofPlanes[0], moduleCount: 7 * n }] };
}

/** Two string inverters, each with its own output run into a combiner, then one home run. */
export function twoInverters(): Design {
  const base = stringFixture();
  const inverters = [base.inverters[0], { ...base.inverters[0], id: "inv-2" }];
  const strings = [
    { id: "S1", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 11 },
    { id: "S2", inverterId: "inv-1", mpptIndex: 2, modulesInSeries: 11 },
    { id: "S3", inverterId: "inv-2", mpptIndex: 1, modulesInSeries: 12 },
  ];
  const home = base.runs[base.runs.length - 1];
  const output = (inverterId: string, n: number): ConductorRun => ({
    ...home,
    id: `out-${n}`,
    label: `Inverter ${n} to combiner`,
    lengthFt: 6,
    circuit: { kind: "ac-output", sources: [{ inverterId }] },
  });
  const runs: ConductorRun[] = [
    ...strings.map((s, i) => dcRun(`dc-${i + 1}`, [s.id], 50 + i)),
    output("inv-1", 1),
    output("inv-2", 2),
    {
      ...home,
      label: "Combiner to service panel",
      conductor: { ...home.conductor, size: "4" },
      circuit: { kind: "ac-output", sources: [{ inverterId: "inv-1" }, { inverterId: "inv-2" }] },
    },
  ];
  return { ...base, inverters, strings, runs, roofPlanes: [{ ...base.roofPlanes[0], moduleCount: 34 }] };
}

const conduitRun = (id: string, label: string, stringIds: string[], lengthFt: number): ConductorRun => ({
  ...dcRun(id, stringIds, lengthFt),
  label,
  conductor: { size: "10", material: "Cu", insulationTempC: 90, insulation: "THWN-2" },
  roofClearanceIn: undefined,
  raceway: {
    type: "EMT",
    tradeSize: "3/4",
    wires: [
      { size: "10", count: 2 * stringIds.length },
      { size: "10", count: 1 },
    ],
  },
});

/**
 * Two runs per string: each string in PV wire to a roof junction box, then both in one
 * conduit to the inverter; on the AC side the inverter to the disconnect, then on to the panel.
 */
export function throughJunctionBox(): Design {
  const base = stringFixture();
  const home = base.runs[base.runs.length - 1];
  const runs: ConductorRun[] = [
    { ...dcRun("dc-1", ["S1"], 30), label: "String S1 to roof junction box" },
    { ...dcRun("dc-2", ["S2"], 34), label: "String S2 to roof junction box" },
    conduitRun("dc-3", "Junction box to inverter", ["S1", "S2"], 48),
    { ...home, id: "ac-1", label: "Inverter to AC disconnect", lengthFt: 6 },
    { ...home, id: "ac-2", label: "AC disconnect to service panel", lengthFt: 22 },
  ];
  return { ...base, runs };
}

/**
 * Many runs: four strings, the first two through a roof junction box into a shared conduit,
 * the other two each in its own conduit after a box; three AC runs in series.
 */
export function manyRuns(): Design {
  const base = manyStrings(stringFixture(), 4, 12);
  const home = base.runs[base.runs.length - 1];
  const runs: ConductorRun[] = [
    ...["S1", "S2", "S3", "S4"].map((id, i) => ({ ...dcRun(`roof-${i + 1}`, [id], 25 + i), label: `String ${id} on the roof` })),
    conduitRun("attic-1", "Box 1 to inverter", ["S1", "S2"], 52),
    conduitRun("attic-2", "Box 2 to inverter, S3", ["S3"], 55),
    conduitRun("attic-3", "Box 2 to inverter, S4", ["S4"], 56),
    { ...home, id: "ac-1", label: "Inverter to junction box", lengthFt: 4 },
    { ...home, id: "ac-2", label: "Junction box to AC disconnect", lengthFt: 12 },
    { ...home, id: "ac-3", label: "AC disconnect to service panel", lengthFt: 18 },
  ];
  return { ...base, runs };
}

/** Microinverter branches that each run to a roof junction box, then on to the combiner. */
export function microThroughBoxes(): Design {
  const base = microBranches(2);
  const [b1, b2, home] = base.runs;
  const onward = (run: ConductorRun, n: number): ConductorRun => ({
    ...run,
    id: `${run.id}-on`,
    label: `Box to combiner, branch ${n}`,
    lengthFt: 30,
    ocpdA: undefined,
    roofClearanceIn: undefined,
  });
  return { ...base, runs: [b1, b2, onward(b1, 1), onward(b2, 2), home] };
}

/** A run naming a string the design no longer has, as a design under edit may. */
export function strayRun(): Design {
  const base = stringFixture();
  return { ...base, runs: [...base.runs, { ...dcRun("dc-9", ["S9"], 20), label: "String S9 to inverter" }] };
}

/** The string fixture's inverter as a hybrid with two batteries in the garage and a backup loads panel. */
export function dcStorageFixture(n = 2): Design {
  const base = manyStrings(stringFixture(), n, 14);
  return { ...base, storage: dcStorage({ multimodeInverterId: base.inverters[0].id }) };
}

/** Microinverters with an AC-coupled battery on its own breaker, limited by a listed power control system. */
export function acStorageFixture(): Design {
  const base = microFixture();
  return {
    ...base,
    storage: acStorage({
      operatingMode: "non-export",
      exportLimitKw: 0,
      pcs: { listed: true, currentSettingA: 40 },
      circuits: [
        {
          id: "c1",
          label: "Battery inverter to service panel",
          kind: "battery-inverter-output",
          conductor: { size: "10", material: "Cu", insulationTempC: 90, insulation: "THWN-2" },
          ocpdA: 30,
        },
      ],
    }),
  };
}
