// Designs for diagram tests beyond the packet fixture: more strings, more
// branches, two inverters, a supply-side connection. Demo (invented) equipment only.
import type { ConductorRun, Design } from "@/lib/engineering";
import { packetFixture } from "@/tests/support/packet-fixture";

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
  const strings = Array.from({ length: n }, (_, i) => ({ id: `S${i + 1}`, inverterId: base.inverters[0].id, mpptIndex: (i % 2) + 1, modulesInSeries: modules }));
  const ids = strings.map((s) => s.id);
  const groups = n >= 6 ? [...ids.slice(0, 4).map((id) => [id]), ids.slice(4, 6), ...ids.slice(6).map((id) => [id])] : ids.map((id) => [id]);
  const runs = groups.map((g, i) => dcRun(`dc-${i + 1}`, g, 40 + 5 * i));
  return { ...base, strings, runs: [...runs, ...base.runs.filter((r) => r.circuit.kind === "ac-output")], roofPlanes: [{ ...base.roofPlanes[0], moduleCount: n * modules }] };
}

/** Microinverters on 1..n branch circuits of 7 units, joined in a combiner, one home run. */
export function microBranches(n: number): Design {
  const base = microFixture();
  const micro = base.inverters[0];
  const inverters = Array.from({ length: n }, (_, i) => ({ ...micro, id: `inv-${i + 1}`, quantity: 7 }));
  const branch = base.runs[0];
  const home = base.runs[base.runs.length - 1];
  const runs: ConductorRun[] = [
    ...inverters.map((inv, i) => ({ ...branch, id: `branch-${i + 1}`, label: `Branch ${i + 1} on the roof`, circuit: { kind: "ac-output" as const, sources: [{ inverterId: inv.id }] } })),
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
  const output = (inverterId: string, n: number): ConductorRun => ({ ...home, id: `out-${n}`, label: `Inverter ${n} to combiner`, lengthFt: 6, circuit: { kind: "ac-output", sources: [{ inverterId }] } });
  const runs: ConductorRun[] = [
    ...strings.map((s, i) => dcRun(`dc-${i + 1}`, [s.id], 50 + i)),
    output("inv-1", 1),
    output("inv-2", 2),
    { ...home, label: "Combiner to service panel", conductor: { ...home.conductor, size: "4" }, circuit: { kind: "ac-output", sources: [{ inverterId: "inv-1" }, { inverterId: "inv-2" }] } },
  ];
  return { ...base, inverters, strings, runs, roofPlanes: [{ ...base.roofPlanes[0], moduleCount: 34 }] };
}
