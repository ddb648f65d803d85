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
  /** The words on the label: the code's own wording where it prescribes one, else the content it asks for. */
  text: string;
  /** Whether `text` is the wording the code prescribes (with the values it asks for filled in). */
  prescribed: boolean;
  /** Our plain explanation of what the label tells the reader, printed beside it, never in its place. */
  explanation: string;
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
  hasDcRuns?: boolean; // DC circuits run in raceways, cables or enclosures on or in the building
  storage?: StorageLabelFacts; // absent for a PV-only design
}

/** What the storage labels print. */
export interface StorageLabelFacts {
  essVoltageV: number; // the batteries' nominal voltage
  faultCurrentA?: number;
  disconnectLocation?: string;
  disconnectOutOfSight: boolean; // the ESS disconnect is not within sight of the batteries
  powerControlSettingA: number | null; // counted at the point of connection (705.13)
  single120Supply: boolean; // a single 120 V backup supply feeds a 120/240 V backup panel
  backupPanel: { inverterBreakerA: number; sourceA: number } | null;
  batteryInverter?: { outputA: number; breakerA: number }; // AC-coupled: a third source on the panel
}

// The wording each edition prescribes, from memory (none of the editions' text was at hand; the tests
// say so row by row). 690.13(B): the disconnect's marking and, where both sides can be live, its warning.
export const PV_DISCONNECT_WORDS = "PV SYSTEM DISCONNECT";
export const BOTH_SIDES_LIVE_WORDS =
  "WARNING\nELECTRIC SHOCK HAZARD\nTERMINALS ON THE LINE AND LOAD SIDES MAY BE ENERGIZED IN THE OPEN POSITION";
// 690.56(C)(1)(a) in 2017 and 2020, 690.12(D) in 2023: a system that shuts down the array and the conductors leaving it.
export const RAPID_SHUTDOWN_WORDS: Readonly<Record<NecEdition, string>> = {
  2017: 'SOLAR PV SYSTEM IS EQUIPPED WITH RAPID SHUTDOWN.\nTURN RAPID SHUTDOWN SWITCH TO THE "OFF" POSITION TO SHUT DOWN PV SYSTEM AND REDUCE SHOCK HAZARD IN THE ARRAY.',
  2020: 'SOLAR PV SYSTEM IS EQUIPPED WITH RAPID SHUTDOWN.\nTURN RAPID SHUTDOWN SWITCH TO THE "OFF" POSITION TO SHUT DOWN PV SYSTEM AND REDUCE SHOCK HAZARD IN THE ARRAY.',
  2023: 'SOLAR PV SYSTEM IS EQUIPPED WITH RAPID SHUTDOWN.\nTURN RAPID SHUTDOWN SWITCH TO THE "OFF" POSITION TO SHUT DOWN PV SYSTEM AND REDUCE SHOCK HAZARD IN THE ARRAY.',
};
export const RAPID_SHUTDOWN_SWITCH_WORDS = "RAPID SHUTDOWN SWITCH FOR SOLAR PV SYSTEM";
// The 120 % rule's marking next to the PV breaker: 2017 named the inverter, 2020 on any power source.
export const DO_NOT_RELOCATE_WORDS: Readonly<Record<NecEdition, string>> = {
  2017: "WARNING:\nINVERTER OUTPUT CONNECTION\nDO NOT RELOCATE THIS OVERCURRENT DEVICE",
  2020: "WARNING:\nPOWER SOURCE OUTPUT CONNECTION—\nDO NOT RELOCATE THIS OVERCURRENT DEVICE",
  2023: "WARNING:\nPOWER SOURCE OUTPUT CONNECTION—\nDO NOT RELOCATE THIS OVERCURRENT DEVICE",
};
// The sum rule's marking on the panel, the same in the three editions.
export const SUM_RULE_WORDS =
  "WARNING:\nTHIS EQUIPMENT FED BY MULTIPLE SOURCES. TOTAL RATING OF ALL OVERCURRENT DEVICES, EXCLUDING MAIN SUPPLY OVERCURRENT DEVICE, SHALL NOT EXCEED AMPACITY OF BUSBAR.";
// DC wiring methods on or in buildings: 2017 690.31(G)(3), 2020 on 690.31(D)(2).
export const DC_CIRCUIT_WORDS: Readonly<Record<NecEdition, string>> = {
  2017: "WARNING: PHOTOVOLTAIC POWER SOURCE",
  2020: "SOLAR PV DC CIRCUIT",
  2023: "SOLAR PV DC CIRCUIT",
};

// 710.15(C): a single 120 V supply feeding a 120/240 V panel is marked with this warning (from memory).
export const SINGLE_120_SUPPLY_WORDS = "WARNING:\nSINGLE 120-VOLT SUPPLY.\nDO NOT CONNECT MULTIWIRE BRANCH CIRCUITS.";

// How the rapid shutdown label is to look, by edition (from memory; 2023 dropped the colour and reflectivity rules per a trade summary).
const RAPID_SHUTDOWN_FORMAT: Readonly<Record<NecEdition, string>> = {
  2017: "Reflective, capital letters at least 3/8 in high, white on red for the title.",
  2020: "Reflective, capital letters at least 3/8 in high, white on red for the title, with a simple diagram of the building and its roof.",
  2023: "Capital letters at least 3/8 in high, with a simple diagram of the building and its roof; colours as the AHJ requires.",
};

type Label = Omit<WarningLabel, "id" | "title" | "clause" | "edition" | "values" | "prescribed"> & {
  values?: Record<string, number>;
  prescribed?: boolean;
};
type AddLabel = (id: string, title: string, clauseId: ClauseId, l: Label) => void;
type AddCitedLabel = (id: string, title: string, citation: string, l: Label) => void;

/** The warning labels a design needs: the code's wording where it prescribes one, and our explanation beside every label. */
export function requiredLabels(f: LabelFacts): WarningLabel[] {
  const labels: WarningLabel[] = [];
  const addCited: AddCitedLabel = (id, title, citation, l) =>
    labels.push({
      id,
      title,
      clause: citation,
      edition: f.edition,
      placement: l.placement,
      text: l.text,
      prescribed: l.prescribed ?? false,
      explanation: l.explanation,
      values: l.values ?? {},
    });
  const add: AddLabel = (id, title, clauseId, l) => addCited(id, title, clause(clauseId, f.edition), l);

  if (f.maxDcVoltageV !== null) {
    // 2017 also asked for the maximum circuit current on this label; later editions ask for the voltage only (from memory).
    const withCurrent = f.edition === 2017 && f.maxDcCircuitCurrentA !== null;
    const values: Record<string, number> = { maxDcVoltageV: f.maxDcVoltageV };
    if (withCurrent) values.maxDcCircuitCurrentA = f.maxDcCircuitCurrentA!;
    add("dc-max-voltage", "Solar DC circuit ratings", "dcVoltageLabel", {
      placement: "On the DC disconnect or the inverter",
      text: `PV SYSTEM DC\nMAXIMUM VOLTAGE: ${fmt(f.maxDcVoltageV, 1)} V DC${withCurrent ? `\nMAXIMUM CIRCUIT CURRENT: ${fmt(f.maxDcCircuitCurrentA!)} A` : ""}`,
      explanation: `The highest voltage the solar DC wiring reaches, on the coldest morning the site records${withCurrent ? ", and the most current a DC circuit carries" : ""}. The code asks for the figure${withCurrent ? "s" : ""}, not for set words.`,
      values,
    });
  }
  const bothSidesLive = f.maxDcVoltageV !== null;
  add("pv-disconnect", "Solar system disconnect", "disconnectLabel", {
    placement: "On each PV system disconnect",
    text: bothSidesLive ? `${PV_DISCONNECT_WORDS}\n${BOTH_SIDES_LIVE_WORDS}` : PV_DISCONNECT_WORDS,
    prescribed: true,
    explanation: bothSidesLive
      ? "This switch turns the solar system off. Turning it off does not make the wires on both sides safe: one side is fed by the utility, the other by the panels in daylight."
      : "This switch turns the solar system off.",
  });
  // The point of interconnection is marked as a power source with its rated AC output current and
  // nominal operating AC voltage, on both load-side and supply-side connections (2017, 2020; see EDITION_ONLY_CLAUSES).
  const interactivePoint = clauseInEdition("interactivePointLabel", f.edition);
  if (interactivePoint !== null) {
    addCited("interactive-point", "Solar connection ratings", interactivePoint, {
      placement: "At the disconnecting means where the solar system connects: the PV breaker, or the supply-side disconnect",
      text: `PV POWER SOURCE\nRATED AC OUTPUT CURRENT: ${fmt(f.inverterOutputA)} A\nNOMINAL OPERATING AC VOLTAGE: ${fmt(f.acVoltageV)} V`,
      explanation: `Marks where the solar system connects and what it delivers: ${fmt(f.inverterOutputA)} A at a nominal ${fmt(f.acVoltageV)} V. The code asks for these figures, not for set words.`,
      values: { inverterOutputA: f.inverterOutputA, acVoltageV: f.acVoltageV },
    });
  }
  if (f.onBuilding && f.rapidShutdown !== "none") {
    add("rapid-shutdown", "Rapid shutdown", "rapidShutdownLabel", {
      placement:
        "At each service equipment location the system connects to, or where the AHJ directs; it says where the rapid shutdown switch is",
      text: RAPID_SHUTDOWN_WORDS[f.edition],
      prescribed: true,
      explanation: `Tells firefighters the array shuts down: turning the rapid shutdown switch off lowers the voltage of the wiring in and leaving the array within 30 seconds. ${RAPID_SHUTDOWN_FORMAT[f.edition]}`,
    });
    add("rapid-shutdown-switch", "Rapid shutdown switch", "rapidShutdownSwitchLabel", {
      placement: "On the rapid shutdown switch or within 3 ft of it",
      text: RAPID_SHUTDOWN_SWITCH_WORDS,
      prescribed: true,
      explanation: "Names the switch that starts rapid shutdown, so it can be found and turned off quickly.",
    });
  }
  if (f.onBuilding && f.hasDcRuns) {
    add("dc-circuit-marking", "Solar DC wiring", "dcCircuitMarking", {
      placement:
        "On DC raceways, cable assemblies, enclosures and junction boxes: every 10 ft, within 1 ft of turns and bends, and above and below walls, floors and roofs they pass through",
      text: DC_CIRCUIT_WORDS[f.edition],
      prescribed: true,
      explanation: "Marks wiring that carries solar DC and stays live in daylight, so nobody cuts into it believing it is off.",
    });
  }
  if (f.connection === "load-side") {
    const storageSource = f.storage?.batteryInverter;
    add("multiple-sources", "Panel fed by more than one source", "multipleSourcesMarking", {
      placement: "On the panel the solar system feeds",
      text: storageSource
        ? `CAUTION: THIS PANEL IS FED BY THREE SOURCES\nUTILITY SERVICE, SOLAR PV SYSTEM (${fmt(f.inverterOutputA)} A AT ${f.acVoltageV} V AC THROUGH THE ${f.pvBreakerA} A PV BREAKER)\nAND ENERGY STORAGE SYSTEM (${fmt(storageSource.outputA)} A THROUGH THE ${storageSource.breakerA} A BREAKER)`
        : `CAUTION: THIS PANEL IS FED BY TWO SOURCES\nUTILITY SERVICE AND SOLAR PV SYSTEM (${fmt(f.inverterOutputA)} A AT ${f.acVoltageV} V AC THROUGH THE ${f.pvBreakerA} A PV BREAKER)`,
      explanation:
        "The panel stays live from the solar system when the utility is off, and the other way round. The code asks that every source be named, not for set words.",
      values: { inverterOutputA: f.inverterOutputA, acVoltageV: f.acVoltageV, pvBreakerA: f.pvBreakerA },
    });
  }
  if (f.loadSideRule === "120%") {
    add("pv-breaker-position", "Solar breaker position", "loadSide120", {
      placement: "Next to the PV breaker",
      text: DO_NOT_RELOCATE_WORDS[f.edition],
      prescribed: true,
      explanation:
        "The busbar is loaded up to 120 % of its rating only because the PV breaker sits at the end away from the main; moved, the bus could overheat.",
      values: { pvBreakerA: f.pvBreakerA },
    });
  }
  if (f.loadSideRule === "sum") {
    add("breaker-sum", "Breaker total limit", "loadSideSum", {
      placement: "On the panel the solar system feeds",
      text: SUM_RULE_WORDS,
      prescribed: true,
      explanation: `The breakers on this ${f.busbarA} A bus, not counting a main, must never add up to more than ${f.busbarA} A; adding a breaker later can break that.`,
      values: { busbarA: f.busbarA },
    });
  }
  if (f.storage) addStorageLabels(f.edition, f.storage, add, addCited);
  const essLine = f.storage
    ? `\nENERGY STORAGE SYSTEM DISCONNECT: ${(f.storage.disconnectLocation ?? "see the site plan").toUpperCase()}`
    : "";
  add("power-source-directory", "Power sources at this building", "directory", {
    placement: f.storage
      ? "At the service equipment, at each PV system disconnect and at the energy storage system disconnect"
      : "At the service equipment and at each PV system disconnect",
    text: `POWER SOURCES AT THIS BUILDING\nUTILITY SERVICE: ${(f.serviceLocation ?? "see the site plan").toUpperCase()}\nSOLAR PV SYSTEM DISCONNECT: ${(f.pvDisconnectLocation ?? "see the site plan").toUpperCase()}${essLine}`,
    explanation:
      "A permanent plaque or directory showing where every source's disconnect is. The code asks for the locations, not for set words.",
  });
  return labels;
}

/** The labels energy storage adds: its disconnect, where that disconnect is, the power control setting, the backup panel's sources. */
function addStorageLabels(edition: NecEdition, s: StorageLabelFacts, add: AddLabel, addCited: AddCitedLabel): void {
  const fault = s.faultCurrentA === undefined ? "" : `\nAVAILABLE FAULT CURRENT: ${fmt(s.faultCurrentA)} A`;
  add("ess-disconnect", "Energy storage disconnect", "essDisconnectLabel", {
    placement: "On the energy storage system disconnect",
    text: `ENERGY STORAGE SYSTEM DISCONNECT\nNOMINAL ESS VOLTAGE: ${fmt(s.essVoltageV)} V DC${fault}`,
    explanation: `Names the switch that cuts the batteries off from the rest of the wiring, and the batteries' nominal voltage${s.faultCurrentA === undefined ? "" : " and the fault current they can deliver"}. The batteries stay charged when it is off. The code asks for these facts, not for set words.`,
    values: s.faultCurrentA === undefined ? { essVoltageV: s.essVoltageV } : { essVoltageV: s.essVoltageV, faultCurrentA: s.faultCurrentA },
  });
  if (s.disconnectOutOfSight) {
    add("ess-disconnect-location", "Where the storage disconnect is", "essDisconnectLocation", {
      placement: "On or next to the batteries",
      text: `ENERGY STORAGE SYSTEM DISCONNECT LOCATED: ${(s.disconnectLocation ?? "see the site plan").toUpperCase()}`,
      explanation: "The disconnect is out of sight of the batteries, so the batteries say where it is.",
    });
  }
  const pcs = clauseInEdition("powerControl", edition);
  if (pcs !== null && s.powerControlSettingA !== null) {
    addCited("power-control-setting", "Power control system setting", pcs, {
      placement: "At the panel whose busbar the power control system protects, and on the equipment it controls",
      text: `POWER CONTROL SYSTEM IN USE\nOUTPUT CURRENT LIMITED TO ${fmt(s.powerControlSettingA)} A\nDO NOT CHANGE THE SETTING WITHOUT A NEW REVIEW OF THIS PANEL`,
      explanation: `The panel was checked for ${fmt(s.powerControlSettingA)} A from the solar and battery equipment because a listed control holds their output there; raising the setting would overload the bus. The code asks for the setting to be marked, not for set words.`,
      values: { powerControlSettingA: s.powerControlSettingA },
    });
  }
  if (s.backupPanel) {
    add("backup-panel-sources", "Backup panel fed by more than one source", "multipleSourcesMarking", {
      placement: "On the backup loads panel",
      text: `CAUTION: THIS PANEL IS FED BY TWO SOURCES\nUTILITY SERVICE AND THE MULTIMODE INVERTER (${fmt(s.backupPanel.sourceA)} A THROUGH THE ${s.backupPanel.inverterBreakerA} A BREAKER)`,
      explanation:
        "The backup panel stays live from the batteries when the utility is off. The code asks that every source be named, not for set words.",
      values: { sourceA: s.backupPanel.sourceA, inverterBreakerA: s.backupPanel.inverterBreakerA },
    });
  }
  if (s.single120Supply) {
    add("single-120-supply", "Single 120 V backup supply", "singleSupply120", {
      placement: "On the backup loads panel",
      text: SINGLE_120_SUPPLY_WORDS,
      prescribed: true,
      explanation:
        "While the grid is down one 120 V supply feeds both halves of this panel: a multiwire circuit's shared neutral would carry the sum of both halves and overheat.",
    });
  }
}
