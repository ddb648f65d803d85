import { sizeLabel, type Design, type ReviewFigures, type Site } from "@/lib/engineering";
import { formatNumber as num } from "../text";

// How each storage check was worked out, for the calculation sheet: the inputs it read and the method in
// our own notation, with the figures the review computed (figures.storage). The check's own clause prints beside it.

type Context = { design: Design; site: Site; subject: string; figures: ReviewFigures };
type Method = { inputs: string[]; method: string };

const circuitOf = (design: Design, id: string) => design.storage?.circuits?.find((c) => c.id === id);
const circuitFigure = (figures: ReviewFigures, id: string) => figures.storage?.circuits.find((c) => c.id === id);
const bankOf = (design: Design, id: string) => design.storage?.banks.find((b) => b.id === id);
const amps = (value: number | null | undefined) => (value === null || value === undefined ? "—" : `${num(value)} A`);

function circuitInputs({ design, figures, subject }: Context): string[] {
  const c = circuitOf(design, subject);
  const f = circuitFigure(figures, subject);
  return [
    `maximum continuous current ${amps(f?.continuousA)}`,
    c ? `${sizeLabel(c.conductor.size)} ${c.conductor.material}${c.conductor.insulation ? ` ${c.conductor.insulation}` : ""}` : "",
    f?.ampacityA !== null && f?.ampacityA !== undefined ? `ampacity ${amps(f.ampacityA)} at ${f.terminalC ?? 75} °C terminals` : "",
    c?.ocpdA ? `OCPD ${c.ocpdA} A` : "",
  ].filter(Boolean);
}

const BACKUP_RULE: Record<string, string> = {
  "100%": "1.25 × inverter source current + main, at most the backup panel's busbar rating",
  "120%": "1.25 × inverter source current + main, at most 1.2 × the busbar rating (inverter breaker at the far end)",
  sum: "All breakers on the backup panel except the main, at most the busbar rating",
};

export const STORAGE_METHODS: Record<string, (ctx: Context) => Method> = {
  "ess-siting": ({ design }) => ({
    inputs: (design.storage?.banks ?? []).map((b) => `${b.quantity} × ${num(b.unit.nameplateKwh)} kWh, ${b.location}`),
    method: "Residential ESS limits of the adopted code: listing, kWh per unit, kWh per location, forbidden rooms",
  }),
  "ess-listing": ({ design, subject }) => ({
    inputs: [bankOf(design, subject)?.unit.listings?.join(", ") || "listing not entered"],
    method: "Each unit listed to UL 9540",
  }),
  "ess-unit-size": ({ design, subject }) => ({
    inputs: [`${num(bankOf(design, subject)?.unit.nameplateKwh ?? 0)} kWh nameplate per unit`],
    method: "Each unit's nameplate energy at most the per-unit limit",
  }),
  "ess-location": ({ figures, subject }) => {
    const f = figures.storage?.locations.find((l) => l.location === subject);
    return {
      inputs: f
        ? [
            `${num(f.nameplateKwh)} kWh nameplate in the ${subject}`,
            f.limitKwh === null ? "no limit named" : `limit ${num(f.limitKwh)} kWh`,
          ]
        : [],
      method: "Sum of the nameplate kWh of every unit in the location, at most the aggregate limit; none where the code forbids",
    };
  },
  "ess-units-parallel": ({ design }) => ({
    inputs: (design.storage?.banks ?? []).map((b) => `${b.quantity} units, maker's limit ${b.unit.maxUnitsInParallel ?? "not entered"}`),
    method: "Units joined on one system at most the maker's limit",
  }),
  "ess-disconnect": ({ design }) => ({
    inputs: [design.storage?.disconnect ? `${design.storage.disconnect.kind} disconnect` : "disconnect not entered"],
    method: "A disconnecting means for the ESS, lockable open, within sight of it or its location marked",
  }),
  "ess-disconnect-marking": () => ({ inputs: ["the ESS disconnect label"], method: "Nominal ESS voltage (and fault current) marked" }),
  "battery-inverter-breaker": ({ design }) => ({
    inputs: [
      `battery inverter output ${amps(design.storage?.batteryInverter?.acOutputCurrentA)}`,
      `breaker ${amps(design.storage?.batteryInverter?.breakerA)}`,
    ],
    method: "Breaker at least 1.25 × the battery inverter's continuous output, standard ratings of 240.6(A)",
  }),
  "ess-conductor": (ctx) => ({
    inputs: circuitInputs(ctx),
    method: "Conductor ampacity at least 1.25 × the maximum continuous current, at the terminals' temperature rating",
  }),
  "ess-ocpd": (ctx) => ({
    inputs: circuitInputs(ctx),
    method: "Overcurrent device at least 1.25 × the maximum continuous current, next standard rating",
  }),
  "backup-panel-busbar": ({ design, figures }) => {
    const p = design.storage?.backupPanel;
    const f = figures.storage?.backupPanel;
    return {
      inputs: p
        ? [
            `busbar ${p.busbarA} A`,
            `main ${p.mainBreakerA === null ? "none (main lugs)" : `${p.mainBreakerA} A`}`,
            `inverter source ${amps(f?.sourceA)}`,
            `inverter breaker ${p.inverterBreakerA} A${p.inverterBreakerAtOppositeEnd ? " at the far end" : ""}`,
          ]
        : [],
      method: BACKUP_RULE[f?.rule ?? "100%"]!,
    };
  },
  "backup-inverter-breaker": ({ design, figures }) => ({
    inputs: [
      `inverter source ${amps(figures.storage?.backupPanel?.sourceA)}`,
      `breaker ${amps(design.storage?.backupPanel?.inverterBreakerA)}`,
    ],
    method: "Inverter breaker in the backup panel at least 1.25 × the inverter's continuous current",
  }),
  "backup-supply": ({ design }) => ({
    inputs: [
      `stand-alone output ${amps(design.storage?.backupOutput?.continuousA)}`,
      `largest backup load ${amps(Math.max(0, ...(design.storage?.backupPanel?.loads ?? []).map((l) => l.currentA)))}`,
    ],
    method: "The stand-alone supply's rating at least the largest single load it carries",
  }),
  "backup-single-120": ({ design }) => ({
    inputs: [`${design.storage?.backupOutput?.voltageV ?? "—"} V supply`, `${design.storage?.backupPanel?.voltageV ?? "—"} V panel`],
    method: "A single 120 V supply to a 120/240 V panel only with no multiwire branch circuits, and marked",
  }),
};

/** The point-of-connection line for a design with storage: what 705.12 counts there. */
export function countedSourceInput(figures: ReviewFigures): string | null {
  const poc = figures.storage?.pointOfConnection;
  if (!poc) return null;
  return poc.by === "power-control-system"
    ? `power control setting ${num(poc.currentA)} A (705.13) in place of ${num(poc.inverterOutputsA)} A of outputs`
    : `inverter outputs ${num(poc.inverterOutputsA)} A, the storage's included`;
}
