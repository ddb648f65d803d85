import { circuitConductorCount, runCircuits, sizeLabel, unlessInputError as counted, type Design } from "@/lib/engineering";
import type { DesignInput } from "@/lib/schemas/design";

// The conductor schedule as the plans print it and the review step shows it: one row per run, each
// run one raceway or cable, with the circuits it holds and the current-carrying conductors counted
// from them (two strings in one conduit: one run, 2 circuits, 4 conductors).

export type ConductorRow = {
  /** The run's place in the design's list, as the single-line diagram tags it. */
  number: string;
  runId: string;
  label: string;
  carries: string;
  circuits: number | null;
  currentCarrying: number | null;
  conductors: string;
  raceway: string;
  egc: string;
  lengthFt: string;
  ocpd: string;
};

const NUMBER = new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 });
const RACEWAY_NAMES: Record<string, string> = { EMT: "EMT", "PVC-40": "PVC Sch 40" };

/** What a run carries, in the schedule's words. */
function carriesText(
  circuit: string,
  inverterLines: { lineId: string; quantity: number; model: string }[],
  circuits: number | null,
): string {
  const [kind, ref] = circuit.split(":");
  const count = circuits && circuits > 1 ? ` (${circuits} circuits)` : "";
  if (kind === "dc") return `${ref === "all" ? "Every DC string" : `String ${ref}`}${count}`;
  if (ref === "all") return `${inverterLines.length > 1 ? "All inverter outputs" : "Inverter output"}${count}`;
  const line = inverterLines.find((l) => l.lineId === ref);
  return line ? `Output of ${line.quantity} × ${line.model}` : `Output of ${ref}`;
}

/** One row per conductor run, its conductor count taken from the circuits it holds (or the entered count when higher). */
export function conductorSchedule(
  designInput: DesignInput,
  design: Design,
  inverterLines: { lineId: string; quantity: number; model: string }[],
): ConductorRow[] {
  return designInput.runs.map((r, index) => {
    const run = design.runs.find((x) => x.id === r.lineId);
    const circuits = run ? counted(() => runCircuits(design, run).length) : null;
    const own = run ? counted(() => circuitConductorCount(design, run)) : null;
    const currentCarrying = own === null ? (r.currentCarryingConductors ?? null) : Math.max(own, r.currentCarryingConductors ?? 0);
    const [kind] = r.circuit.split(":");
    const enclosure =
      r.racewayType === "none"
        ? r.onRoof
          ? "Free air on the roof"
          : "None"
        : r.racewayType === "MC"
          ? "Type MC cable"
          : `${r.tradeSize || "?"} in ${RACEWAY_NAMES[r.racewayType] ?? r.racewayType}`;
    return {
      number: String(index + 1),
      runId: r.lineId,
      label: r.label,
      carries: carriesText(r.circuit, inverterLines, circuits),
      circuits,
      currentCarrying,
      conductors: `${currentCarrying ?? "?"} × ${sizeLabel(r.size)} ${r.material}${r.insulation ? ` ${r.insulation}` : ""}, ${r.insulationTempC} °C`,
      raceway: enclosure,
      egc: r.egcSize ? `${sizeLabel(r.egcSize)} ${r.material}` : "—",
      lengthFt: `${NUMBER.format(r.lengthFt)} ft`,
      ocpd: r.ocpdA ? `${r.ocpdA} A` : kind === "ac" ? "PV breaker" : "—",
    };
  });
}
