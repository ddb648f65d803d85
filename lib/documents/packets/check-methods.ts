import {
  DEFAULT_SHUTDOWN_V_PER_DEVICE,
  cellTempC,
  runCircuits,
  runRacewayWires,
  sizeLabel,
  stringsOnSameInput,
  unlessInputError,
  type CheckResult,
  type ConductorRun,
  type Design,
  type ReviewFigures,
  type RunFigures,
  type Site,
} from "@/lib/engineering";
import { reviewFigures } from "@/lib/engineering/figures";
import { totalInverterOutputA } from "@/lib/engineering/design-lookup";
import { formatNumber } from "../text";
import { STORAGE_METHODS, countedSourceInput } from "./storage-methods";

// How each check was worked out, for the calculation sheet: the inputs it read from the
// design and the method in our own notation. Keyed by the check id's prefix
// ("string-voltage:S1" → "string-voltage"); the engine's message states the finding.

export type CheckMethod = { inputs: string[]; method: string };

type Context = { design: Design; site: Site; subject: string; figures: ReviewFigures };
type Describe = (ctx: Context) => CheckMethod;

const num = formatNumber;
const runOf = (design: Design, id: string): ConductorRun | undefined => design.runs.find((r) => r.id === id);
// The review's own figures for a run (ReviewResult.figures), never worked out again here.
const figuresOf = (figures: ReviewFigures, id: string): RunFigures | undefined => figures.runs.find((r) => r.id === id);
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
  return [
    `Vmp = ${num(m.vmpV)} V (STC)`,
    `Tcell = ${num(cellTempC(design, site))} °C (${num(site.highDesignTempC)} °C air plus the usual rise)`,
    coeff,
  ];
}

// A figure for the sheet, or null where the engine cannot compute it (the finding then says why).
const safely = unlessInputError;

const modulesIn = (design: Design, subject: string) => design.strings.find((s) => s.id === subject)?.modulesInSeries ?? 1;

const DESCRIBE: Record<string, Describe> = {
  "string-voltage": ({ design, site, subject }) => {
    const inverter = design.inverters.find((i) => i.id === design.strings.find((s) => s.id === subject)?.inverterId);
    if (inverter?.regulatedStringV !== undefined) {
      return {
        inputs: [
          `regulated string voltage ${num(inverter.regulatedStringV)} V`,
          `${inverter.model} maximum input ${num(inverter.maxDcInputV)} V`,
        ],
        method: "Optimizers hold the string at the inverter's regulated voltage; that voltage against the inverter's maximum input",
      };
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
  "device-input-current": ({ design }) => ({
    inputs: [`Isc = ${num(design.module.iscA)} A`],
    method: "Module Isc against the device's maximum input current",
  }),
  "inverter-input-current": ({ design, subject }) => {
    const [inverterId, mppt] = subject.split(":");
    const count = design.strings.filter((s) => s.inverterId === inverterId && String(s.mpptIndex ?? 1) === mppt).length;
    return {
      inputs: [`Isc = ${num(design.module.iscA)} A`, `${count} ${count === 1 ? "string" : "strings"} on input ${mppt}`],
      method: "Strings in parallel × Isc, against the input's maximum short-circuit current",
    };
  },
  "ampacity-terminal": ({ design, subject, figures }) => {
    const r = runOf(design, subject);
    const f = figuresOf(figures, subject);
    const source =
      f?.terminalSource === "run" ? " (entered)" : f?.terminalSource === "equipment" ? " (inverter's marking)" : " (110.14(C)(1) default)";
    return {
      inputs: r ? [conductorText(r), f?.terminalC ? `terminals ${f.terminalC} °C${source}` : "terminals: see the finding"] : [],
      method: "Table 310.16 ampacity in the terminal's temperature column, at least 1.25 × each circuit's maximum current",
    };
  },
  "current-carrying-count": ({ design, subject, figures }) => {
    const r = runOf(design, subject);
    const circuits = figuresOf(figures, subject)?.circuits ?? null;
    return {
      inputs: r ? [`${r.currentCarryingConductors ?? "—"} entered`, `${circuits ?? "?"} circuits in the raceway`] : [],
      method: "Two conductors per DC or single-phase circuit, three per three-phase circuit: the least the raceway holds",
    };
  },
  "ampacity-conditions": ({ design, site, subject, figures }) => {
    const r = runOf(design, subject);
    const counted = figuresOf(figures, subject)?.currentCarrying ?? null;
    const inputs = r
      ? [
          conductorText(r),
          `ambient ${num(r.ambientTempC ?? site.highDesignTempC)} °C${r.roofClearanceIn !== undefined ? `, ${num(r.roofClearanceIn)} in above the roof` : ""}`,
          ...(counted ? [`${counted} current-carrying conductors`] : []),
        ]
      : [];
    return {
      inputs,
      method:
        "Table 310.16 ampacity (insulation column) × temperature correction × fill adjustment, at least the circuit's maximum current",
    };
  },
  "ocpd-rating": ({ design, subject }) => {
    const r = runOf(design, subject);
    const parallel =
      r && r.circuit.kind === "dc-strings"
        ? safely(() => Math.max(...runCircuits(design, r).flatMap((c) => c.strings.map((s) => stringsOnSameInput(design, s)))))
        : null;
    return {
      inputs: [
        r?.ocpdA ? `${r.ocpdIsFuse ? "fuse" : "breaker"} ${r.ocpdA} A` : "no overcurrent device on this run",
        ...(parallel ? [`${parallel} ${parallel === 1 ? "string" : "strings"} on one inverter input`] : []),
      ],
      method: "Needed where parallel sources can feed a fault; then at least 1.25 × the maximum current, next standard rating (240.6(A))",
    };
  },
  "ocpd-protects": ({ design, subject }) => {
    const r = runOf(design, subject);
    return {
      inputs: r ? [`device ${num(r.ocpdA ?? design.service.pvBreakerA)} A`, conductorText(r)] : [],
      method:
        "Device rating at most the conductor's usable ampacity (next size up where 240.4(B) allows) and the small-conductor limits of 240.4(D)",
    };
  },
  egc: ({ design, subject, figures }) => {
    const r = runOf(design, subject);
    const f = figuresOf(figures, subject);
    return {
      inputs: r
        ? [
            r.egc ? `EGC ${sizeLabel(r.egc.size)} ${r.egc.material}` : "no EGC entered",
            f?.egcDeviceA ? `device ${num(f.egcDeviceA)} A${f.egcDeviceAssumed ? " (assumed, 690.45)" : ""}` : "device: see the finding",
            conductorText(r),
          ]
        : [],
      method:
        "Table 250.122 for the device; grown by the conductors' area ratio where they exceed what ampacity needs (250.122(B)), except PV DC circuits (690.45)",
    };
  },
  "voltage-drop": ({ design, subject }) => {
    const r = runOf(design, subject);
    const threePhase = r?.circuit.kind === "ac-output" && design.inverters.some((i) => i.phase === 3);
    return {
      inputs: r
        ? [
            `L = ${num(r.lengthFt)} ft one way`,
            `${sizeLabel(r.conductor.size)} ${r.conductor.material} ${r.conductor.stranding ?? "stranded"}, R from Chapter 9 Table 8`,
          ]
        : [],
      method: `Vd = ${threePhase ? "1.732" : "2"} × L × R × I / 1000; Vd as a percentage of the working voltage`,
    };
  },
  "voltage-drop-path": ({ design, subject }) => {
    const path = design.paths?.find((p) => p.id === subject);
    return {
      inputs: path ? [`runs: ${path.runIds.join(", ")}`] : [],
      method: "Sum of the runs' drops along the path, as a percentage of the working voltage",
    };
  },
  "conduit-fill": ({ design, subject }) => {
    const r = runOf(design, subject);
    const rw = r?.raceway;
    const wires = r ? safely(() => runRacewayWires(design, r)) : null;
    return {
      inputs: rw
        ? [
            `${rw.tradeSize} in ${rw.type === "PVC-40" ? "PVC Sch 40" : rw.type}`,
            `wires: ${(wires ?? []).map((w) => `${w.count} × ${sizeLabel(w.size)} ${w.insulation ?? ""}`.trim()).join(", ")}`,
          ]
        : [],
      method:
        "Sum of wire areas (Chapter 9 Table 5 for the insulation, or the data sheet) / raceway area (Table 4), against the Table 1 percentage",
    };
  },
  "pv-breaker-size": ({ design }) => ({
    inputs: [`inverter output ${num(totalInverterOutputA(design))} A continuous`, `PV breaker ${design.service.pvBreakerA} A`],
    method: "PV breaker at least 1.25 × the inverters' continuous output current, standard ratings of 240.6(A)",
  }),
  "point-of-connection": ({ design, figures }) => {
    const s = design.service;
    const outputA = totalInverterOutputA(design);
    if (s.connection === "supply-side") {
      return {
        inputs: [
          `PV disconnect ${s.pvBreakerA} A`,
          `service conductors ${num(s.serviceConductorAmpacityA ?? s.mainBreakerA ?? s.busbarA)} A`,
        ],
        method: "Supply-side disconnect rating, at most the ampacity of the service conductors it taps",
      };
    }
    const inputs = [
      `busbar ${s.busbarA} A`,
      `main ${s.mainBreakerA === null ? "none (main lugs)" : `${s.mainBreakerA} A`}`,
      countedSourceInput(figures) ?? `inverter output ${num(outputA)} A`,
      `PV breaker ${s.pvBreakerA} A${s.pvBreakerAtOppositeEnd ? " at the end away from the main" : ""}`,
    ];
    const governing = figures.pointOfConnection.rule;
    const rule =
      governing === "100%" || governing === "120%" || governing === "sum" ? governing : s.pvBreakerAtOppositeEnd ? "120%" : "100%";
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
    inputs: [
      `${design.roofPlanes.reduce((n, p) => n + p.moduleCount, 0)} modules on the planes`,
      `${design.strings.reduce((n, s) => n + s.modulesInSeries, 0)} modules in strings`,
    ],
    method: "Modules in strings equal the modules on the roof planes",
  }),
  "dc-ac-ratio": ({ design }) => ({
    inputs: [
      `module ${num(design.module.powerW)} W`,
      `inverters ${num(design.inverters.reduce((w, i) => w + i.quantity * i.acPowerW, 0))} W AC`,
    ],
    method: "kW DC at STC / kW AC of the inverters",
  }),
  "roof-dead-load": ({ design, subject }) => {
    const p = design.roofPlanes.find((r) => r.id === subject);
    const m = design.module;
    return {
      inputs: p
        ? [
            `${p.moduleCount} modules × ${num(m.weightLb)} lb`,
            `racking ${num(p.rackingWeightLb)} lb`,
            `module ${num(m.lengthIn)} × ${num(m.widthIn)} in`,
          ]
        : [],
      method: "(modules × module weight + racking) / (modules × module area)",
    };
  },
  "roof-attachment-load": ({ design, subject }) => {
    const p = design.roofPlanes.find((r) => r.id === subject);
    return {
      inputs: p
        ? [
            `${p.moduleCount} modules × ${num(design.module.weightLb)} lb`,
            `racking ${num(p.rackingWeightLb)} lb`,
            `${p.attachmentCount} attachments`,
          ]
        : [],
      method: "(modules × module weight + racking) / attachments",
    };
  },
  "data-sheet": () => ({
    inputs: ["the data-sheet figures of the catalog items"],
    method: "Each figure against the range such equipment can have; a coefficient outside it is not trusted to lower the cold voltage",
  }),
  "system-voltage": () => ({
    inputs: ["highest string voltage (690.7)", "listed maximum system voltage"],
    method: "The highest string voltage at or below the equipment's maximum system voltage",
  }),
  "arc-fault": () => ({
    inputs: ["highest DC voltage", "inverter's DC arc-fault protection"],
    method: "DC circuits of 80 V or more on a building need listed arc-fault protection",
  }),
  "ground-fault": () => ({
    inputs: ["DC voltage and current", "inverter's DC ground-fault protection"],
    method: "DC circuits above 30 V or 8 A need ground-fault protection",
  }),
  "pv-disconnect": () => ({
    inputs: ["the PV system disconnect named in the design"],
    method: "A PV breaker on a load-side connection, or a separate switch with its ratings",
  }),
  "pv-disconnect-rating": ({ design }) => ({
    inputs: [
      `switch ${design.pvDisconnect?.ratingA ?? "—"} A, ${design.pvDisconnect?.voltageRatingV ?? "—"} V`,
      `inverter output ${num(totalInverterOutputA(design))} A`,
    ],
    method: "Ampere and voltage ratings at least those of the circuit (and of the fuses it holds)",
  }),
  "pv-disconnect-location": () => ({
    inputs: ["readily accessible, as entered"],
    method: "The PV system disconnect at a readily accessible location",
  }),
  "dc-disconnect": () => ({
    inputs: ["inverter's integrated DC disconnect"],
    method: "A means to isolate the inverter's DC inputs, in it or within sight and 10 ft",
  }),
  "rapid-shutdown-initiator": () => ({
    inputs: ["initiator and its location, as entered"],
    method: "Service disconnect, PV disconnect or a switch; outside and readily accessible at dwellings from 2020 on",
  }),
  "wiring-exposed": ({ design, subject }) => ({
    inputs: runOf(design, subject) ? [conductorText(runOf(design, subject)!)] : [],
    method: "Exposed single conductors in the array: PV wire or USE-2",
  }),
  "wiring-inside": ({ design, subject }) => {
    const r = runOf(design, subject);
    return {
      inputs: r
        ? [
            r.mcCable ? "Type MC cable" : r.raceway ? r.raceway.type : "no raceway",
            r.insideBuilding === undefined ? "route not entered" : r.insideBuilding ? "enters the building" : "outdoors only",
          ]
        : [],
      method: "DC circuits inside a building in metal raceway or Type MC cable",
    };
  },
  "egc-protection": () => ({
    inputs: ["EGC size", "no raceway or armor"],
    method: "An EGC smaller than 6 AWG is protected by a raceway or cable armor",
  }),
  "string-run": () => ({ inputs: ["the runs and the strings each carries"], method: "Every string carried by a DC run" }),
  gec: ({ design }) => {
    const g = design.groundingElectrodeConductor;
    const sc = design.service.serviceConductor;
    return {
      inputs: [
        g ? `GEC ${sizeLabel(g.size)} ${g.material} to ${g.electrode === "rod-pipe-plate" ? "a rod, pipe or plate" : "the electrode"}` : "",
        sc ? `service conductors ${sizeLabel(sc.size)} ${sc.material}` : "service conductors not entered",
      ].filter(Boolean),
      method: "Table 250.66 by the largest service-entrance conductor; 6 AWG Cu at most to a rod, pipe or plate",
    };
  },
  "gec-protection": () => ({ inputs: ["GEC 8 AWG"], method: "An 8 AWG GEC runs in raceway or armor" }),
  "feeder-connection": ({ design }) => {
    const f = design.service.feeder;
    return {
      inputs: [
        `conductors ${f?.ampacityA ?? "—"} A`,
        `device ${f?.ocpdA ?? design.service.mainBreakerA ?? "—"} A`,
        `inverter output ${num(totalInverterOutputA(design))} A`,
      ],
      method: "Ampacity at least the device plus 1.25 × inverter current, or a load-side device no larger than the ampacity",
    };
  },
  "feeder-taps": ({ design }) => ({
    inputs: [`smallest tap ${design.service.feeder?.tapAmpacityA ?? "—"} A`],
    method: "Tap up to 25 ft: a third of (feeder device + 1.25 × inverter current)",
  }),
  "supply-side-conductors": ({ design }) => {
    const c = design.service.supplySideConductors;
    return {
      inputs: [c ? `${sizeLabel(c.size)} ${c.material}` : "not entered", `PV device ${design.service.pvBreakerA} A`],
      method: "Ampacity at 75 °C at least 1.25 × inverter output and the device's rating; at least 6 AWG Cu or 4 AWG Al from 2020 on",
    };
  },
  "supply-side-ocpd-location": ({ design }) => ({
    inputs: [`${design.service.supplySideConductors?.lengthToOcpdFt ?? "—"} ft from the tap`],
    method: "The PV overcurrent device within 10 ft of the connection to the service conductors",
  }),
  "ac-combiner-busbar": ({ design }) => ({
    inputs: [`busbar ${design.acCombiner?.busbarA ?? "—"} A`],
    method: "Sum of the combiner's breakers, other than the one feeding out, at most the busbar rating",
  }),
  input: () => ({ inputs: [], method: "Could not be computed from the entries; see the finding" }),
  ...STORAGE_METHODS,
};

/**
 * The figures a stored packet input carries with its review; a packet stored before reviews kept them
 * gets them from the same engine function the review uses.
 */
export function figuresOfReview(input: {
  design: Design;
  site: Site;
  review: { checks: CheckResult[]; figures?: ReviewFigures };
}): ReviewFigures {
  return input.review.figures ?? reviewFigures(input.design, input.site, input.review.checks);
}

/** The inputs and method of one check, for the calculation sheet; engine figures come from the review's own (`figures`). */
export function describeCheck(check: CheckResult, design: Design, site: Site, figures: ReviewFigures): CheckMethod {
  const at = check.id.indexOf(":");
  const prefix = at === -1 ? check.id : check.id.slice(0, at);
  const subject = at === -1 ? "" : check.id.slice(at + 1);
  const describe = DESCRIBE[prefix];
  return describe ? describe({ design, site, subject, figures }) : { inputs: [], method: "See the finding" };
}
