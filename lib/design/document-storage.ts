import { sizeLabel, type Storage } from "@/lib/engineering";
import { type DesignDocument, sizeFromLabel } from "./document";

// The design document's `storage` part and the engine's Storage, both ways. The document lists batteries
// (a battery bank each: the unit's figures, its quantity and where it stands) where the engine says banks.

type Doc = DesignDocument;
type DocStorage = NonNullable<Doc["storage"]>;
type Report = (path: string, message: string) => void;

/** The document's storage as the engine's; problems zod cannot see come back with their JSON paths. */
export function storageFromDocument(doc: Doc, report: Report): Storage | undefined {
  const s = doc.storage;
  if (!s) return undefined;
  const seen = new Set<string>();
  s.batteries.forEach((b, i) => {
    if (seen.has(b.id)) report(`storage.batteries[${i}].id`, `Another battery already uses the id "${b.id}"`);
    if (b.usableKwh > b.nameplateKwh) report(`storage.batteries[${i}].usableKwh`, "The usable energy cannot exceed the nameplate energy");
    seen.add(b.id);
  });
  if (s.coupling === "dc") {
    if (s.multimodeInverterId === undefined)
      report("storage.multimodeInverterId", "A DC-coupled battery charges through a multimode inverter: give its id from inverters");
    else if (!doc.inverters.some((inv) => inv.id === s.multimodeInverterId))
      report("storage.multimodeInverterId", `No inverter with id "${s.multimodeInverterId}" is in inverters`);
    if (s.batteryInverter) report("storage.batteryInverter", "A DC-coupled battery has no battery inverter of its own; leave it out");
  } else {
    if (!s.batteryInverter) report("storage.batteryInverter", "An AC-coupled battery needs its battery inverter (batteryInverter)");
    if (s.multimodeInverterId !== undefined)
      report("storage.multimodeInverterId", "An AC-coupled battery couples through its battery inverter; leave multimodeInverterId out");
  }
  s.circuits?.forEach((c, i) =>
    c.batteryIds?.forEach(
      (bid, j) => seen.has(bid) || report(`storage.circuits[${i}].batteryIds[${j}]`, `No battery with id "${bid}" is in storage.batteries`),
    ),
  );
  const b = s.batteryInverter;
  const p = s.backupPanel;
  return {
    coupling: s.coupling,
    multimodeInverterId: s.multimodeInverterId,
    batteryInverter: b && {
      maker: b.maker ?? "",
      model: b.model || "battery inverter",
      acPowerW: b.acRatedW,
      acOutputCurrentA: b.acMaxContinuousA,
      acVoltageV: b.acNominalV,
      breakerA: b.breakerA,
    },
    banks: s.batteries.map((bat) => ({
      id: bat.id,
      quantity: bat.quantity,
      location: bat.location,
      unit: {
        maker: bat.maker ?? "",
        model: bat.model || `battery ${bat.id}`,
        usableKwh: bat.usableKwh,
        nameplateKwh: bat.nameplateKwh,
        maxContinuousChargeA: bat.maxContinuousChargeA,
        maxContinuousDischargeA: bat.maxContinuousDischargeA,
        maxChargeKw: bat.maxChargeKw,
        maxDischargeKw: bat.maxDischargeKw,
        nominalVoltageV: bat.nominalV,
        listings: bat.listings,
        maxUnitsInParallel: bat.maxUnitsInParallel,
      },
    })),
    operatingMode: s.operatingMode,
    exportLimitKw: s.exportLimitKw,
    importLimitKw: s.importLimitKw,
    pcs: s.powerControl,
    backupOutput: s.backupOutput,
    backupPanel: p && {
      busbarA: p.busbarA,
      mainBreakerA: p.mainBreakerA,
      inverterBreakerA: p.inverterBreakerA,
      inverterBreakerAtOppositeEnd: p.inverterBreakerOppositeEnd ?? false,
      otherBreakersA: p.otherBreakersA,
      voltageV: p.voltageV,
      multiwireBranchCircuits: p.multiwireBranchCircuits,
      loads: p.loads,
    },
    disconnect: s.disconnect && { ...s.disconnect, location: s.disconnect.location || undefined },
    availableFaultCurrentA: s.availableFaultCurrentA,
    circuits: s.circuits?.map((c) => ({
      id: c.id,
      label: c.label || c.id,
      kind: c.kind,
      bankIds: c.batteryIds,
      conductor: {
        size: sizeFromLabel(c.size),
        material: c.material,
        insulationTempC: c.insulationC,
        insulation: c.insulation || undefined,
      },
      ocpdA: c.ocpdA,
      terminalTempC: c.terminalC,
    })),
  };
}

/** The engine's storage written out as the document's, so a saved design with batteries exports without loss. */
export function storageToDocument(s: Storage): DocStorage {
  const b = s.batteryInverter;
  const p = s.backupPanel;
  return {
    coupling: s.coupling,
    multimodeInverterId: s.multimodeInverterId,
    batteryInverter: b && {
      maker: b.maker,
      model: b.model,
      acRatedW: b.acPowerW,
      acMaxContinuousA: b.acOutputCurrentA,
      acNominalV: b.acVoltageV,
      breakerA: b.breakerA,
    },
    batteries: s.banks.map(({ id, quantity, location, unit: u }) => ({
      id,
      maker: u.maker,
      model: u.model,
      quantity,
      location,
      usableKwh: u.usableKwh,
      nameplateKwh: u.nameplateKwh,
      maxContinuousChargeA: u.maxContinuousChargeA,
      maxContinuousDischargeA: u.maxContinuousDischargeA,
      maxChargeKw: u.maxChargeKw,
      maxDischargeKw: u.maxDischargeKw,
      nominalV: u.nominalVoltageV,
      listings: u.listings && [...u.listings],
      maxUnitsInParallel: u.maxUnitsInParallel,
    })),
    operatingMode: s.operatingMode,
    exportLimitKw: s.exportLimitKw,
    importLimitKw: s.importLimitKw,
    powerControl: s.pcs,
    backupOutput: s.backupOutput && { ...s.backupOutput, voltageV: s.backupOutput.voltageV === 120 ? 120 : 240 },
    backupPanel: p && {
      busbarA: p.busbarA,
      mainBreakerA: p.mainBreakerA,
      inverterBreakerA: p.inverterBreakerA,
      inverterBreakerOppositeEnd: p.inverterBreakerAtOppositeEnd,
      otherBreakersA: p.otherBreakersA,
      voltageV: p.voltageV,
      multiwireBranchCircuits: p.multiwireBranchCircuits,
      loads: p.loads,
    },
    disconnect: s.disconnect,
    availableFaultCurrentA: s.availableFaultCurrentA,
    circuits: s.circuits?.map((c) => ({
      id: c.id,
      label: c.label,
      kind: c.kind,
      batteryIds: c.bankIds,
      material: c.conductor.material,
      size: sizeLabel(c.conductor.size),
      insulationC: c.conductor.insulationTempC,
      insulation: c.conductor.insulation,
      terminalC: c.terminalTempC,
      ocpdA: c.ocpdA,
    })),
  };
}
