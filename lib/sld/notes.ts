// The short notes a plan reviewer looks for beside the diagram, in our own
// words, filled with the design's own numbers.
import { clause, hasStorage, type Design, type NecEdition, type StoredDesign } from "@/lib/engineering";

export function diagramNotes(design: Design, necEdition?: NecEdition): string[] {
  const s = design.service;
  const nec = necEdition ? `NEC ${necEdition}` : "the NEC edition the AHJ has adopted";
  const opposite = s.pvBreakerAtOppositeEnd ? " at the far end of the busbar from the main," : "";
  const main = s.mainBreakerA === null ? "main lugs only" : `a ${s.mainBreakerA} A main breaker`;
  const connection =
    s.connection === "supply-side"
      ? `Point of connection on the supply side (705.11): fused PV disconnect with ${s.pvBreakerA} A fuses, tapped between the meter and ${main}.`
      : `Point of connection on the load side (705.12): ${s.pvBreakerA} A PV breaker${opposite} on a ${s.busbarA} A busbar with ${main}.`;
  const where = s.pvDisconnectLocation ? ` Location: ${s.pvDisconnectLocation}.` : "";
  return [
    `Conductors, overcurrent devices and grounding sized per ${nec} (Articles 310, 690, 705, 250); every value is on the calculation sheet.`,
    rapidShutdownNote(design),
    connection,
    `The PV disconnect opens all ungrounded AC conductors, is lockable in the open position and shows a visible open blade.${where}`,
    "Module frames and racking are bonded; the equipment grounding conductor runs with the circuit conductors.",
    "Warning labels and placards per the label sheet, with the values computed there.",
    "PV source circuits are energized whenever light reaches the modules, and the inverter holds a charge after it stops. Work on them only as local codes and licensed practice allow.",
    "Circled numbers are the run numbers of the conductor schedule. JB1, JB2, …: junction boxes where one run meets the next. A slim outline around several wires: separate circuits in one raceway.",
    "Not to scale. Conductor counts exclude the equipment grounding conductor.",
    ...(hasStorage(design) ? storageNotes(design, necEdition) : []),
  ];
}

function storageNotes(design: StoredDesign, edition: NecEdition | undefined): string[] {
  const s = design.storage;
  const disconnect = edition ? ` (${clause("essDisconnect", edition)})` : "";
  return [
    `Energy storage system per Article 706: the ESS disconnect opens every ungrounded conductor to the batteries${disconnect}. Battery circuits B1, B2, … are sized at 125 % of the maximum continuous current; the values are on the calculation sheet.`,
    ...(s.backupPanel
      ? [
          "Backup loads panel: fed by the inverter's stand-alone output (710.15) and checked as a second busbar under 705.12. The inverter separates from the grid before it carries the panel.",
        ]
      : []),
    ...(s.pcs?.listed && s.pcs.currentSettingA !== undefined
      ? [
          "Power control system: its current setting, shown at the point of connection, limits the current the sources put on the busbar (705.13).",
        ]
      : []),
    "A battery stays energized when the array and the grid are off. Open the ESS disconnect and follow the manufacturer's instructions and licensed practice before working on battery circuits.",
  ];
}

function rapidShutdownNote(design: Design): string {
  const head = "Rapid shutdown per 690.12:";
  if (design.inverters.some((i) => i.kind === "micro"))
    return `${head} the microinverters stop exporting when the PV disconnect or the PV breaker opens.`;
  const device = design.moduleLevelDevice;
  if (device?.kind === "optimizer") return `${head} the optimizer on each module drops to a safe output when the initiator is operated.`;
  if (device) return `${head} the shutdown device on each module opens when the initiator is operated.`;
  if (design.listedRapidShutdownSystem) return `${head} listed PV hazard control system, operated from the initiator.`;
  return `${head} see the calculation sheet for the method this design relies on.`;
}
