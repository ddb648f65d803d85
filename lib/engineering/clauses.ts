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
  terminals: same("110.14(C)"), // REFERENCE.md
  listing: same("110.3(B)"), // follow the listing and instructions
  conductorProtection: same("240.4(B)"), // REFERENCE.md
  smallConductors: same("240.4(D)"), // REFERENCE.md
  standardRatings: same("240.6(A)"), // REFERENCE.md, confirmed for 2017
  // 2017 kept the table inside 310.15; 2020 renumbered it 310.16 (from memory for 2017).
  ampacityTable: { 2017: "Table 310.15(B)(16)", 2020: "Table 310.16", 2023: "Table 310.16" },
  tempCorrection: { 2017: "Table 310.15(B)(2)(a)", 2020: "Table 310.15(B)(1)", 2023: "Table 310.15(B)(1)" },
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
  voltageDrop: same("Chapter 9 Table 8"), // REFERENCE.md
  conduitFill: same("Chapter 9 Table 1"), // REFERENCE.md
  dcVoltageLabel: same("690.53"),
  disconnectLabel: same("690.13(B)"),
  rapidShutdownLabel: same("690.56(C)"),
  directory: same("705.10"),
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
  // nominal operating AC voltage. 2017 690.54. From memory, not confirmed: 2020 dropped 690.54 when
  // the interactive-system rules moved to Article 705, leaving the values on the 705.12(C) marking.
  interactivePointLabel: { 2017: "690.54", 2020: null, 2023: null },
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

// Not NEC clauses: named so the result still says where its limit comes from.
export const COMMON_PRACTICE = "common practice";
export const STRUCTURAL_REVIEW = "IRC R324.4 (structural review by the AHJ)"; // from memory
export const DESIGN_CONSISTENCY = "design consistency"; // the design's own entries disagree

/** Every basis a result may cite instead of an NEC clause of the site's edition. */
export const NON_CODE_BASES: readonly string[] = [COMMON_PRACTICE, STRUCTURAL_REVIEW, DESIGN_CONSISTENCY];
