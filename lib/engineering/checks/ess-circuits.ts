import { atLeast, atMost, fmt, makeCheck } from "../check-result";
import { clauses } from "../clauses";
import { requirePositive } from "../errors";
import { type StoredDesign, circuitBanks, storageConverter } from "../storage";
import { tableAmpacityA } from "../tables/ampacity";
import { isStandardRatingA } from "../tables/standard-ocpd-ratings";
import type { CheckResult, Site, StorageCircuit, TerminalTempC } from "../types";
import { CONTINUOUS_MULTIPLIER, conductorName } from "./conductor-ampacity";
import { maxProtectiveOcpdA } from "./conductor-protection";
import { requiredOcpdA } from "./ocpd";

// Equipment of this size is usually marked for 75 °C terminals (110.14(C), common practice); a circuit may say otherwise.
const DEFAULT_TERMINAL_C: TerminalTempC = 75;

/**
 * The maximum continuous current of a battery circuit (706.30(A)): between the batteries and the hybrid
 * inverter, the larger of the charge and discharge currents of every unit it joins; on an AC-coupled
 * battery inverter's output, that inverter's continuous output current.
 */
export function storageCircuitCurrentA(design: StoredDesign, circuit: StorageCircuit): number {
  if (circuit.kind === "battery-inverter-output") return storageConverter(design).continuousA;
  return circuitBanks(design.storage, circuit).reduce(
    (sum, b) => sum + b.quantity * Math.max(b.unit.maxContinuousChargeA, b.unit.maxContinuousDischargeA),
    0,
  );
}

export interface StorageCircuitFigures {
  id: string;
  continuousA: number;
  requiredAmpacityA: number; // 125 % of the continuous current
  minOcpdA: number;
  terminalC: TerminalTempC;
  ampacityA: number; // the conductor's table ampacity at the terminal column
}

export function storageCircuitFigures(design: StoredDesign, site: Site, circuit: StorageCircuit): StorageCircuitFigures {
  const continuousA = storageCircuitCurrentA(design, circuit);
  const terminalC = circuit.terminalTempC ?? DEFAULT_TERMINAL_C;
  const column = Math.min(terminalC, circuit.conductor.insulationTempC) as TerminalTempC;
  return {
    id: circuit.id,
    continuousA,
    requiredAmpacityA: CONTINUOUS_MULTIPLIER * continuousA,
    minOcpdA: requiredOcpdA(continuousA, { edition: site.necEdition }),
    terminalC,
    ampacityA: tableAmpacityA(circuit.conductor.size, circuit.conductor.material, column, site.necEdition),
  };
}

/**
 * 706.30(B) and the overcurrent device of 706.31 (2017: 706.21): conductors and device at 125 % of the
 * circuit's maximum continuous current, the device a standard rating that protects the conductor (240.4).
 * Conditions of use (ambient, bundling) are not applied here: the figure is the table's at the terminals.
 */
export function checkStorageCircuit(design: StoredDesign, site: Site, circuit: StorageCircuit): CheckResult[] {
  const edition = site.necEdition;
  const at = `storage.circuits.${circuit.id}`;
  const f = storageCircuitFigures(design, site, circuit);
  requirePositive(f.continuousA, at, "The battery circuit's current");
  const conductor = conductorName(circuit.conductor);
  const ampOk = atLeast(f.ampacityA, f.requiredAmpacityA);
  const results = [
    makeCheck({
      id: `ess-conductor:${circuit.id}`,
      title: `Battery circuit "${circuit.label}" conductors`,
      status: ampOk ? "pass" : "fail",
      value: f.ampacityA,
      limit: f.requiredAmpacityA,
      unit: "A",
      clause: clauses(edition, "essCircuitSizing", "terminals"),
      edition,
      message: `The circuit carries up to ${fmt(f.continuousA)} A continuous, so its conductors need 1.25 × ${fmt(f.continuousA)} A = ${fmt(f.requiredAmpacityA)} A; ${conductor} is good for ${fmt(f.ampacityA)} A at ${f.terminalC} °C terminals.`,
      fix: ampOk ? undefined : "Use a larger conductor.",
    }),
  ];
  if (circuit.ocpdA === undefined) {
    results.push(
      makeCheck({
        id: `ess-ocpd:${circuit.id}`,
        title: `Battery circuit "${circuit.label}" overcurrent device`,
        status: "warn",
        value: null,
        limit: f.requiredAmpacityA,
        unit: "A",
        clause: ocpdCitation(edition),
        edition,
        message: `No overcurrent device is entered for this circuit; it needs one of at least ${f.minOcpdA} A, unless the listed equipment provides it.`,
        fix: "Enter the circuit's breaker or fuse, or the device built into the listed equipment.",
        field: `${at}.ocpdA`,
      }),
    );
    return results;
  }
  const ocpdA = requirePositive(circuit.ocpdA, `${at}.ocpdA`, "The battery circuit's overcurrent device");
  const bigEnough = atLeast(ocpdA, f.requiredAmpacityA);
  const standard = isStandardRatingA(ocpdA, { edition });
  const protectsA = maxProtectiveOcpdA(f.ampacityA, circuit.conductor.size, circuit.conductor.material, edition);
  const protects = atMost(ocpdA, protectsA);
  const faults = [
    bigEnough ? "" : `it must be at least 1.25 × ${fmt(f.continuousA)} A = ${fmt(f.requiredAmpacityA)} A`,
    standard ? "" : `${ocpdA} A is not a standard rating`,
    protects ? "" : `it is larger than the ${protectsA} A that protects ${conductor}`,
  ].filter(Boolean);
  results.push(
    makeCheck({
      id: `ess-ocpd:${circuit.id}`,
      title: `Battery circuit "${circuit.label}" overcurrent device`,
      status: !bigEnough || !protects ? "fail" : standard ? "pass" : "warn",
      value: ocpdA,
      limit: f.requiredAmpacityA,
      unit: "A",
      clause: ocpdCitation(edition),
      edition,
      message:
        faults.length === 0
          ? `The ${ocpdA} A device is at least 1.25 × ${fmt(f.continuousA)} A = ${fmt(f.requiredAmpacityA)} A and protects ${conductor}.`
          : `The ${ocpdA} A device does not fit: ${faults.join("; ")}.`,
      fix: faults.length === 0 ? undefined : `Use a ${f.minOcpdA} A device on a conductor good for at least ${f.minOcpdA} A.`,
    }),
  );
  return results;
}

function ocpdCitation(edition: Site["necEdition"]): string {
  return clauses(edition, "essOcpd", "standardRatings", "conductorProtection");
}
