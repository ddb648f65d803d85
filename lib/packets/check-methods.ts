import {
  DEFAULT_SHUTDOWN_V_PER_DEVICE,
  cellTempC,
  evaluateLoadSideRules,
  sizeLabel,
  type CheckResult,
  type ConductorRun,
  type Design,
  type Site,
} from "@/lib/engineering";
import { governingLoadSideRule } from "@/lib/engineering/checks/point-of-connection";
import { totalInverterOutputA } from "@/lib/engineering/design-lookup";
import { formatNumber } from "./pdf-facts";

// How each check was worked out, for the calculation sheet: the inputs it read from the
// design and the method in our own notation. Keyed by the check id's prefix
// ("string-voltage:S1" → "string-voltage"); the engine's message states the finding.

export type CheckMethod = { inputs: string[]; method: string };

type Context = { design: Design; site: Site; subject: string };
type Describe = (ctx: Context) => CheckMethod;

const num = formatNumber;
const runOf = (design: Design, id: string): ConductorRun | undefined => design.runs.find((r) => r.id === id);
const conductorText = (r: ConductorRun) =>
  `${sizeLabel(r.conductor.size)} ${r.conductor.material}${r.conductor.insulation ? ` ${r.conductor.insulation}` : ""}, ${r.conductor.insulationTempC} °C insulation`;

function coldVocInputs(design: Design, site: Site): { inputs: string[]; formula: string } {
  const m = design.module;
  const c = m.vocTempCoeff;
  const inputs = [`Voc = ${num(m.vocV)} V (STC)`, `Tmin = ${num(site.recordLowTempC)} °C record low`];
  if (!c) return { inputs: [...inputs, "no maker's coefficient: Table 690.7(A) factor"], formula: "Voc × Table 690.7(A) factor for Tmin" };
  if (c.unit === "%/C") return { inputs: [...inputs, `αVoc = ${num(c.value)} %/°C`], formula: "Voc × [1 + (Tmin − 25) × αVoc / 100]" };
  return { inputs: [...inputs, `βVoc = ${num(c.value)} V/°C`], formula: "Voc + (Tmin − 25) × βVoc" };
}

function vmpInputs(design: Design, site: Site): string[] {
  const m = design.module;
  const coeff = m.vmpTempCoeff
    ? `Vmp coefficient ${num(m.vmpTempCoeff.value)} ${m.vmpTempCoeff.unit === "%/C" ? "%/°C" : "V/°C"}`
    : m.pmaxTempCoeffPctPerC !== undefined
      ? `Pmax coefficient ${num(m.pmaxTempCoeffPctPerC)} %/°C (stands in for Vmp)`
      : "no Vmp or Pmax coefficient";
  return [`Vmp = ${num(m.vmpV)} V (STC)`, `Tcell = ${num(cellTempC(design, site))} °C (${num(site.highDesignTempC)} °C air plus the usual rise)`, coeff];
}

const modulesIn = (design: Design, subject: string) => design.strings.find((s) => s.id === subject)?.modulesInSeries ?? 1;

const DESCRIBE: Record<string, Describe> = {
  "string-voltage": ({ design, site, subject }) => {
    const inverter = design.inverters.find((i) => i.id === design.strings.find((s) => s.id === subject)?.inverterId);
    if (inverter?.regulatedStringV !== undefined) {
      return { inputs: [`regulated string voltage ${num(inverter.regulatedStringV)} V`, `${inverter.model} maximum input ${num(inverter.maxDcInputV)} V`], method: "Optimizers hold the string at the inverter's regulated voltage; that voltage against the inverter's maximum input" };
    }
    const cold = coldVocInputs(design, site);
    return {
      inputs: [`N = ${modulesIn(design, subject)} modules in series`, ...cold.inputs],
      method: `N × ${cold.formula}; limit: the lower of the inverter's maximum input and the 690.7 limit for the building`,
    };
  },
  "string-power": ({ design, subject }) => ({
    inputs: [`N = ${modulesIn(design, subject)} modules`, `Pmax = ${num(design.module.powerW)} W (STC)`],
    method: "N × Pmax, against the inverter's power limit per optimizer string",
  }),
  "mppt-min": ({ design, site, subject }) => ({
    inputs: [`N = ${modulesIn(design, subject)} modules in series`, ...vmpInputs(design, site)],
    method: "N × Vmp × [1 + (Tcell − 25) × coefficient / 100], at or above the MPPT minimum",
  }),
  "mppt-max": ({ design, subject }) => ({
    inputs: [`N = ${modulesIn(design, subject)} modules in series`, `Vmp = ${num(design.module.vmpV)} V (STC)`],
    method: "N × Vmp at STC, at or below the MPPT maximum",
  }),
  "device-input-voltage": ({ design, site }) => {
    const cold = coldVocInputs(design, site);
    return { inputs: cold.inputs, method: `${cold.formula}, against the device's maximum input voltage` };
  },
  "device-input-current": ({ design }) => ({ inputs: [`Isc = ${num(design.module.iscA)} A`], method: "Module Isc against the device's maximum input current" }),
  "inverter-input-current": ({ design, subject }) => {
    const [inverterId, mppt] = subject.split(":");
    const count = design.strings.filter((s) => s.inverterId === inverterId && String(s.mpptIndex ?? 1) === mppt).length;
    return { inputs: [`Isc = ${num(design.module.iscA)} A`, `${count} ${count === 1 ? "string" : "strings"} on input ${mppt}`], method: "Strings in parallel × Isc, against the input's maximum short-circuit current" };
  },
  "ampacity-terminal": ({ design, subject }) => {
    const r = runOf(design, subject);
    return {
      inputs: r ? [conductorText(r), `terminals ${r.terminalTempC ?? 75} °C`] : [],
      method: "Table 310.16 ampacity in the terminal's temperature column, at least 1.25 × the circuit's maximum current",
    };
  },
  "ampacity-conditions": ({ design, site, subject }) => {
    const r = runOf(design, subject);
    const inputs = r
      ? [
          conductorText(r),
          `ambient ${num(r.ambientTempC ?? site.highDesignTempC)} °C${r.roofClearanceIn !== undefined ? `, ${num(r.roofClearanceIn)} in above the roof` : ""}`,
          ...(r.currentCarryingConductors ? [`${r.currentCarryingConductors} current-carrying conductors`] : []),
        ]
      : [];
    return { inputs, method: "Table 310.16 ampacity (insulation column) × temperature correction × fill adjustment, at least the circuit's maximum current" };
  },
  "ocpd-rating": ({ design, subject }) => {
    const r = runOf(design, subject);
    return {
      inputs: [r?.ocpdA ? `${r.ocpdIsFuse ? "fuse" : "breaker"} ${r.ocpdA} A` : "no overcurrent device on this run"],
      method: "Needed where parallel sources can feed a fault; then at least 1.25 × the maximum current, next standard rating (240.6(A))",
    };
  },
  "ocpd-protects": ({ design, subject }) => {
    const r = runOf(design, subject);
    return {
      inputs: r ? [`device ${num(r.ocpdA ?? design.service.pvBreakerA)} A`, conductorText(r)] : [],
      method: "Device rating at most the conductor's usable ampacity (next size up where 240.4(B) allows) and the small-conductor limits of 240.4(D)",
    };
  },
  egc: ({ design, subject }) => {
    const r = runOf(design, subject);
    return {
      inputs: r ? [r.egc ? `EGC ${sizeLabel(r.egc.size)} ${r.egc.material}` : "no EGC entered", r.ocpdA ? `device ${r.ocpdA} A` : "device: the circuit's protection"] : [],
      method: "Smallest EGC in Table 250.122 for the overcurrent device rating",
    };
  },
  "voltage-drop": ({ design, subject }) => {
    const r = runOf(design, subject);
    const threePhase = r?.circuit.kind === "ac-output" && design.inverters.some((i) => i.phase === 3);
    return {
      inputs: r ? [`L = ${num(r.lengthFt)} ft one way`, `${sizeLabel(r.conductor.size)} ${r.conductor.material} ${r.conductor.stranding ?? "stranded"}, R from Chapter 9 Table 8`] : [],
      method: `Vd = ${threePhase ? "1.732" : "2"} × L × R × I / 1000; Vd as a percentage of the working voltage`,
    };
  },
  "voltage-drop-path": ({ design, subject }) => {
    const path = design.paths?.find((p) => p.id === subject);
    return { inputs: path ? [`runs: ${path.runIds.join(", ")}`] : [], method: "Sum of the runs' drops along the path, as a percentage of the working voltage" };
  },
  "conduit-fill": ({ design, subject }) => {
    const rw = runOf(design, subject)?.raceway;
    return {
      inputs: rw ? [`${rw.tradeSize} in ${rw.type === "PVC-40" ? "PVC Sch 40" : rw.type}`, `wires: ${rw.wires.map((w) => `${w.count} × ${sizeLabel(w.size)}`).join(", ")}`] : [],
      method: "Sum of wire areas (Chapter 9 Table 5) / raceway area (Table 4), against the Table 1 percentage",
    };
  },
  "pv-breaker-size": ({ design }) => ({
    inputs: [`inverter output ${num(totalInverterOutputA(design))} A continuous`, `PV breaker ${design.service.pvBreakerA} A`],
    method: "PV breaker at least 1.25 × the inverters' continuous output current, standard ratings of 240.6(A)",
  }),
  "point-of-connection": ({ design }) => {
    const s = design.service;
    const outputA = totalInverterOutputA(design);
    if (s.connection === "supply-side") {
      return { inputs: [`PV disconnect ${s.pvBreakerA} A`, `service conductors ${num(s.serviceConductorAmpacityA ?? s.mainBreakerA ?? s.busbarA)} A`], method: "Supply-side disconnect rating, at most the ampacity of the service conductors it taps" };
    }
    const inputs = [`busbar ${s.busbarA} A`, `main ${s.mainBreakerA === null ? "none (main lugs)" : `${s.mainBreakerA} A`}`, `inverter output ${num(outputA)} A`, `PV breaker ${s.pvBreakerA} A${s.pvBreakerAtOppositeEnd ? " at the end away from the main" : ""}`];
    const rule = governingLoadSideRule(evaluateLoadSideRules(s, outputA))?.rule ?? (s.pvBreakerAtOppositeEnd ? "120%" : "100%");
    const method = {
      "100%": "1.25 × inverter output current + main breaker, at most the busbar rating",
      "120%": "1.25 × inverter output current + main breaker, at most 1.2 × the busbar rating",
      sum: "All breakers on the bus except the main, at most the busbar rating",
    }[rule];
    return { inputs, method };
  },
  "rapid-shutdown": ({ design, subject }) => {
    if (!subject) return { inputs: [], method: "How the design meets 690.12 (the finding says which way)" };
    const perDeviceV = design.moduleLevelDevice?.shutdownOutputV ?? DEFAULT_SHUTDOWN_V_PER_DEVICE;
    return {
      inputs: [`${modulesIn(design, subject)} devices in series`, `${num(perDeviceV)} V held by each device while shut down`],
      method: "Devices in series × held voltage, within 30 V outside the array boundary",
    };
  },
  "module-count": ({ design }) => ({
    inputs: [`${design.roofPlanes.reduce((n, p) => n + p.moduleCount, 0)} modules on the planes`, `${design.strings.reduce((n, s) => n + s.modulesInSeries, 0)} modules in strings`],
    method: "Modules in strings equal the modules on the roof planes",
  }),
  "dc-ac-ratio": ({ design }) => ({
    inputs: [`module ${num(design.module.powerW)} W`, `inverters ${num(design.inverters.reduce((w, i) => w + i.quantity * i.acPowerW, 0))} W AC`],
    method: "kW DC at STC / kW AC of the inverters",
  }),
  "roof-dead-load": ({ design, subject }) => {
    const p = design.roofPlanes.find((r) => r.id === subject);
    const m = design.module;
    return {
      inputs: p ? [`${p.moduleCount} modules × ${num(m.weightLb)} lb`, `racking ${num(p.rackingWeightLb)} lb`, `module ${num(m.lengthIn)} × ${num(m.widthIn)} in`] : [],
      method: "(modules × module weight + racking) / (modules × module area)",
    };
  },
  "roof-attachment-load": ({ design, subject }) => {
    const p = design.roofPlanes.find((r) => r.id === subject);
    return {
      inputs: p ? [`${p.moduleCount} modules × ${num(design.module.weightLb)} lb`, `racking ${num(p.rackingWeightLb)} lb`, `${p.attachmentCount} attachments`] : [],
      method: "(modules × module weight + racking) / attachments",
    };
  },
  input: () => ({ inputs: [], method: "Could not be computed from the entries; see the finding" }),
};

/** The inputs and method of one check, for the calculation sheet. */
export function describeCheck(check: CheckResult, design: Design, site: Site): CheckMethod {
  const at = check.id.indexOf(":");
  const prefix = at === -1 ? check.id : check.id.slice(0, at);
  const subject = at === -1 ? "" : check.id.slice(at + 1);
  const describe = DESCRIBE[prefix];
  return describe ? describe({ design, site, subject }) : { inputs: [], method: "See the finding" };
}
