import { fmt } from "./check-result";
import { type ClauseId, clause, clauseInEdition } from "./clauses";
import type { LoadSideRule } from "./checks/busbar-rules";
import type { RapidShutdownMethod } from "./checks/rapid-shutdown";
import type { NecEdition } from "./types";

export interface WarningLabel {
  id: string;
  title: string;
  clause: string;
  edition: NecEdition;
  placement: string;
  text: string;
  values: Record<string, number>;
}

/** The computed facts a label set needs; the review fills them in from the design. */
export interface LabelFacts {
  edition: NecEdition;
  onBuilding: boolean;
  maxDcVoltageV: number | null; // null when no DC wiring leaves the modules
  maxDcCircuitCurrentA: number | null;
  rapidShutdown: RapidShutdownMethod;
  connection: "load-side" | "supply-side";
  loadSideRule: LoadSideRule | null;
  busbarA: number;
  pvBreakerA: number;
  inverterOutputA: number;
  acVoltageV: number;
  serviceLocation?: string;
  pvDisconnectLocation?: string;
}

/** The warning labels a design needs, in our own plain words, with the computed values filled in. */
export function requiredLabels(f: LabelFacts): WarningLabel[] {
  const labels: WarningLabel[] = [];
  const addCited = (id: string, title: string, citation: string, placement: string, text: string, values: Record<string, number> = {}) =>
    labels.push({ id, title, clause: citation, edition: f.edition, placement, text, values });
  const add = (id: string, title: string, clauseId: ClauseId, placement: string, text: string, values: Record<string, number> = {}) =>
    addCited(id, title, clause(clauseId, f.edition), placement, text, values);

  if (f.maxDcVoltageV !== null) {
    // 2017 also asked for the maximum circuit current on this label; later editions ask for the voltage only (from memory).
    const withCurrent = f.edition === 2017 && f.maxDcCircuitCurrentA !== null;
    const values: Record<string, number> = { maxDcVoltageV: f.maxDcVoltageV };
    if (withCurrent) values.maxDcCircuitCurrentA = f.maxDcCircuitCurrentA!;
    add("dc-max-voltage", "Solar DC circuit ratings", "dcVoltageLabel", "On the DC disconnect or the inverter",
      `SOLAR DC CIRCUIT. Highest voltage: ${fmt(f.maxDcVoltageV, 1)} V DC.${withCurrent ? ` Highest circuit current: ${fmt(f.maxDcCircuitCurrentA!)} A.` : ""}`, values);
  }
  add("pv-disconnect", "Solar system disconnect", "disconnectLabel", "On each PV system disconnect",
    `SOLAR PV SYSTEM DISCONNECT.${f.maxDcVoltageV !== null ? " Shock risk: the wires on both sides of this switch can stay live while it is off." : ""}`);
  // The point of interconnection is marked as a power source with its rated AC output current and
  // nominal operating AC voltage, on both load-side and supply-side connections. Only the editions
  // that have the clause get the label (2017; see EDITION_ONLY_CLAUSES, from memory for 2020/2023).
  const interactivePoint = clauseInEdition("interactivePointLabel", f.edition);
  if (interactivePoint !== null) {
    addCited("interactive-point", "Solar connection ratings", interactivePoint,
      "At the disconnecting means where the solar system connects: the PV breaker, or the supply-side disconnect",
      `SOLAR POWER SOURCE CONNECTED HERE. Rated output: ${fmt(f.inverterOutputA)} A AC at a nominal ${fmt(f.acVoltageV)} V.`,
      { inverterOutputA: f.inverterOutputA, acVoltageV: f.acVoltageV });
  }
  if (f.onBuilding && f.rapidShutdown !== "none") {
    add("rapid-shutdown", "Rapid shutdown", "rapidShutdownLabel", "At the service disconnect, or where the AHJ directs",
      "THIS SOLAR SYSTEM HAS RAPID SHUTDOWN. Turn the rapid shutdown switch OFF to shut down the solar wiring and lower the shock risk in the array.");
    add("rapid-shutdown-switch", "Rapid shutdown switch", "rapidShutdownLabel", "On or next to the rapid shutdown switch",
      "SOLAR RAPID SHUTDOWN SWITCH.");
  }
  if (f.connection === "load-side") {
    const values = { inverterOutputA: f.inverterOutputA, acVoltageV: f.acVoltageV, pvBreakerA: f.pvBreakerA };
    add("multiple-sources", "Panel fed by more than one source", "multipleSourcesMarking", "On the panel the solar system feeds",
      `THIS PANEL IS ALSO FED BY A SOLAR SYSTEM: ${fmt(f.inverterOutputA)} A at ${f.acVoltageV} V AC through the ${f.pvBreakerA} A solar breaker.`, values);
  }
  if (f.loadSideRule === "120%") {
    add("pv-breaker-position", "Solar breaker position", "loadSide120", "Next to the solar breaker",
      "SOLAR BREAKER. DO NOT MOVE: it must stay at the end of the bus away from the main breaker.", { pvBreakerA: f.pvBreakerA });
  }
  if (f.loadSideRule === "sum") {
    add("breaker-sum", "Breaker total limit", "loadSideSum", "On the panel the solar system feeds",
      `THIS PANEL IS FED BY THE UTILITY AND A SOLAR SYSTEM. The breakers on this bus, not counting a main, must add up to no more than ${f.busbarA} A.`, { busbarA: f.busbarA });
  }
  add("power-source-directory", "Power sources at this building", "directory", "At the service equipment",
    `POWER SOURCES AT THIS BUILDING: the utility service (${f.serviceLocation ?? "see the site plan"}) and a solar PV system (disconnect: ${f.pvDisconnectLocation ?? "see the site plan"}).`);
  return labels;
}
