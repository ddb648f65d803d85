import type { NecEdition } from "./types";

type ByEdition = Readonly<Record<NecEdition, string>>;

const same = (ref: string): ByEdition => ({ 2017: ref, 2020: ref, 2023: ref });

// Clause numbers move between editions; every result cites the one its edition uses.
export const CLAUSES = {
  maxVoltage: same("690.7(A)"), // REFERENCE.md, NEC 2017/2020/2023
  maxVoltageConverter: same("690.7(B)"), // DC-to-DC converter circuits; from memory
  maxCurrent: same("690.8(A)"), // REFERENCE.md, from memory
  conductorSizing: same("690.8(B)"), // REFERENCE.md, from memory
  dcOcpd: same("690.9(B)"), // device rating; from memory
  dcOcpdNotRequired: same("690.9(A)"), // no external fault source; from memory
  rapidShutdown: same("690.12"), // REFERENCE.md
  rapidShutdownOutside: same("690.12(B)(1)"), // from memory
  rapidShutdownInside: same("690.12(B)(2)"), // from memory
  pvEgc: same("690.45"), // assumed OCPD where none is installed; from memory
  egcTable: same("Table 250.122"), // REFERENCE.md, confirmed
  egcIncrease: same("250.122(B)"), // proportional increase, REFERENCE.md
  terminals: same("110.14(C)"), // REFERENCE.md
  terminals60: same("110.14(C)(1)(a)"), // 100 A or less, or 14–1 AWG: 60 °C unless marked; from memory
  listing: same("110.3(B)"), // follow the listing and instructions
  conductorProtection: same("240.4(B)"), // REFERENCE.md
  smallConductors: same("240.4(D)"), // REFERENCE.md
  // 2023 turned the list into Table 240.6(A) (trade-press summaries of the 2023 changes).
  standardRatings: { 2017: "240.6(A)", 2020: "240.6(A)", 2023: "Table 240.6(A)" },
  // 2017 kept the table inside 310.15; 2020 renumbered it 310.16 (from memory for 2017).
  ampacityTable: { 2017: "Table 310.15(B)(16)", 2020: "Table 310.16", 2023: "Table 310.16" },
  // 2023 numbered the 30 °C table 310.15(B)(1)(1), beside a 40 °C table (B)(1)(2) (from memory).
  tempCorrection: { 2017: "Table 310.15(B)(2)(a)", 2020: "Table 310.15(B)(1)", 2023: "Table 310.15(B)(1)(1)" },
  rooftopAdder: { 2017: "310.15(B)(3)(c)", 2020: "310.15(B)(2)", 2023: "310.15(B)(2)" },
  cccAdjustment: { 2017: "Table 310.15(B)(3)(a)", 2020: "Table 310.15(C)(1)", 2023: "Table 310.15(C)(1)" },
  // Inverter output circuits moved from Article 690 to 705.28/705.30 in 2020; from memory.
  acCurrent: { 2017: "690.8(A)", 2020: "705.28(A)", 2023: "705.28(A)" },
  acConductorSizing: { 2017: "690.8(B)", 2020: "705.28(B)", 2023: "705.28(B)" },
  acOcpd: { 2017: "690.9(B)", 2020: "705.30(B)", 2023: "705.30(B)" },
  // Point of connection: REFERENCE.md; 2023 numbering from memory.
  supplySide: { 2017: "705.12(A)", 2020: "705.11", 2023: "705.11" },
  loadSide100: { 2017: "705.12(B)(2)(3)(a)", 2020: "705.12(B)(3)(1)", 2023: "705.12(B)(1)" },
  loadSide120: { 2017: "705.12(B)(2)(3)(b)", 2020: "705.12(B)(3)(2)", 2023: "705.12(B)(2)" },
  loadSideSum: { 2017: "705.12(B)(2)(3)(c)", 2020: "705.12(B)(3)(3)", 2023: "705.12(B)(3)" },
  multipleSourcesMarking: { 2017: "705.12(B)(3)", 2020: "705.12(C)", 2023: "705.12(C)" }, // from memory
  // Feeders, taps and center-fed panels on the load side (from memory).
  feederConnection: { 2017: "705.12(B)(2)(1)", 2020: "705.12(B)(1)", 2023: "705.12(A)" },
  tapConnection: { 2017: "705.12(B)(2)(2)", 2020: "705.12(B)(2)", 2023: "705.12(A)" },
  centerFed: { 2017: "705.12(B)(2)(3)(d)", 2020: "705.12(B)(3)(4)", 2023: "705.12(B)(4)" },
  supplySideAllowed: same("230.82(6)"), // a power source may connect ahead of the service disconnect (from memory)
  // Disconnecting means (from memory): 690.13 PV system disconnect, its ratings (2017 (E), 2020 on (D)); 690.15 equipment.
  pvDisconnect: same("690.13"),
  pvDisconnectLocation: same("690.13(A)"),
  pvDisconnectRatings: { 2017: "690.13(E)", 2020: "690.13(D)", 2023: "690.13(D)" },
  equipmentDisconnect: same("690.15(A)"),
  rapidShutdownInitiator: same("690.12(C)"), // 2020 on: outside and readily accessible at dwellings (from memory)
  arcFault: same("690.11"), // DC circuits of 80 V or more (from memory)
  groundFault: same("690.41(B)"), // from memory
  // Wiring methods (from memory): exposed array wiring, DC circuits inside a building, their marking.
  exposedWiring: same("690.31(C)(1)"),
  dcInsideBuilding: { 2017: "690.31(G)", 2020: "690.31(D)", 2023: "690.31(D)" },
  dcCircuitMarking: { 2017: "690.31(G)(3)", 2020: "690.31(D)(2)", 2023: "690.31(D)(2)" },
  arrayEgc: same("690.46"), // EGCs smaller than 6 AWG per 250.120(C); from memory
  egcProtection: same("250.120(C)"),
  pvGrounding: same("690.47"), // grounding electrode system; from memory
  gecTable: same("Table 250.66"), // REFERENCE.md
  gecRodCap: same("250.66(A)"), // REFERENCE.md
  gecProtection: same("250.64(B)"), // from memory
  voltageDrop: same("Chapter 9 Table 8"), // REFERENCE.md
  conduitFill: same("Chapter 9 Table 1"), // REFERENCE.md
  dcVoltageLabel: same("690.53"),
  disconnectLabel: same("690.13(B)"),
  // The building's rapid shutdown label and the switch label; 2023 moved both into 690.12(D) (from memory,
  // agreeing with a trade summary of the 2023 changes).
  rapidShutdownLabel: { 2017: "690.56(C)(1)(a)", 2020: "690.56(C)(1)(a)", 2023: "690.12(D)" },
  rapidShutdownSwitchLabel: { 2017: "690.56(C)(3)", 2020: "690.56(C)(3)", 2023: "690.12(D)" },
  directory: same("705.10"),
  // Energy storage (Article 706). 2017 numbered the disconnect 706.7; 2020 moved it to 706.15 (from memory).
  // 2023 706.15(B) location and (C) marking: trade summaries of the 2023 changes; 2017 and 2020 items from memory.
  essDisconnect: { 2017: "706.7", 2020: "706.15", 2023: "706.15" },
  essDisconnectLocation: { 2017: "706.7(A)", 2020: "706.15(A)", 2023: "706.15(B)" },
  essDisconnectLabel: { 2017: "706.7(D)", 2020: "706.15(C)", 2023: "706.15(C)" },
  // Battery circuits at 125 % of the maximum current: 706.30 in the three editions (2023 per a trade summary,
  // earlier from memory); the overcurrent device 706.21 in 2017, 706.31 from 2020 (from memory, 2023 per the summary).
  essCircuitCurrent: same("706.30(A)"),
  essCircuitSizing: same("706.30(B)"),
  essOcpd: { 2017: "706.21", 2020: "706.31", 2023: "706.31" },
  // Stand-alone (backup) supply: output may be below the calculated load but covers the largest single load
  // (710.15(A)); a single 120 V supply may feed a 120/240 V panel with no multiwire branch circuits (710.15(C)). From memory.
  standAloneSupply: same("710.15(A)"),
  singleSupply120: same("710.15(C)"),
} as const satisfies Record<string, ByEdition>;

export type ClauseId = keyof typeof CLAUSES;

export function clause(id: ClauseId, edition: NecEdition): string {
  return `NEC ${edition} ${CLAUSES[id][edition]}`;
}

// Clauses that only some editions have: null where the edition has no such clause, so a
// label or check tied to one appears only for the editions that require it.
type SomeEditions = Readonly<Record<NecEdition, string | null>>;

export const EDITION_ONLY_CLAUSES = {
  // Marking at the point of interconnection: a power source, with its rated AC output current and
  // nominal operating AC voltage (690.54). A trade-press summary of the 2023 changes reports 690.54
  // deleted in 2023 as redundant with the equipment's listing marks, so 2020 still has it.
  interactivePointLabel: { 2017: "690.54", 2020: "690.54", 2023: null },
  // Busbars feeding feed-through lugs: 2020 705.12(B)(3)(6), 2023 705.12(B)(6); 2017 has no such item (from memory).
  feedThrough: { 2017: null, 2020: "705.12(B)(3)(6)", 2023: "705.12(B)(6)" },
  // Power control systems limiting the current on busbars and conductors: new in 2020 (from memory; REFERENCE.md).
  powerControl: { 2017: null, 2020: "705.13", 2023: "705.13" },
} as const satisfies Record<string, SomeEditions>;

export type EditionOnlyClauseId = keyof typeof EDITION_ONLY_CLAUSES;

/** "NEC 2017 690.54", or null where the edition has no such clause. */
export function clauseInEdition(id: EditionOnlyClauseId, edition: NecEdition): string | null {
  const ref: string | null = EDITION_ONLY_CLAUSES[id][edition];
  return ref === null ? null : `NEC ${edition} ${ref}`;
}

/** Several clauses of one edition in one citation: "NEC 2020 690.8(B), 110.14(C)". */
export function clauses(edition: NecEdition, ...ids: ClauseId[]): string {
  return `NEC ${edition} ${ids.map((id) => CLAUSES[id][edition]).join(", ")}`;
}

// Not NEC clauses: named so the result still says where its limit comes from. A trade rule of
// thumb with no published source (common practice) is shown to users as a design guideline.
export const DESIGN_GUIDELINE = "design guideline";
export const STRUCTURAL_REVIEW = "IRC R324.4 (structural review by the AHJ)"; // from memory
export const DESIGN_CONSISTENCY = "design consistency"; // the design's own entries disagree
export const INVERTER_DATA_SHEET = "inverter data sheet"; // a limit the maker states, not the code

/** Every basis a result may cite instead of an NEC clause of the site's edition. */
export const NON_CODE_BASES: readonly string[] = [DESIGN_GUIDELINE, STRUCTURAL_REVIEW, DESIGN_CONSISTENCY, INVERTER_DATA_SHEET];
