import type { AuthorityKind } from "@/lib/domain/authorities";
import { NEC_EDITIONS } from "@/lib/engineering/types";
import { JurisdictionInput, UtilityInput } from "@/lib/schemas/reference-data";

// The authorities a project answers to, in one place: the AHJ that issues the permit and the utility
// that lets the system connect. Both are kept, listed and edited the same way; what differs (their
// fields, columns and words) is declared here per kind. Pure, so forms and pages both read it.

/** One entry of an authority's form: how it is typed and what the person reads beside it. */
export type AuthorityField = {
  name: string;
  label: string;
  input: "text" | "lines" | "note" | "select";
  hint?: string;
  options?: readonly { value: string; label: string }[];
  /** Grid row the field sits in, so short fields share a line. */
  row: number;
};

/** A column of the list, with how a record shows in it. */
export type AuthorityColumn = { label: string; show: "text" | "measure" | "list"; key: string; unit?: string };

export type AuthorityKindSpec = {
  title: string;
  intro: string;
  noun: string;
  path: string;
  schema: typeof JurisdictionInput | typeof UtilityInput;
  empty: Record<string, string>;
  fields: readonly AuthorityField[];
  columns: readonly AuthorityColumn[];
};

export const AUTHORITY_SPECS: Record<AuthorityKind, AuthorityKindSpec> = {
  jurisdiction: {
    title: "Jurisdictions (AHJ)",
    intro: "Design temperatures feed the string voltage checks: record low is the ASHRAE extreme annual mean minimum design dry-bulb temperature.",
    noun: "jurisdiction",
    path: "/settings/jurisdictions",
    schema: JurisdictionInput,
    empty: { name: "", state: "", necEdition: "2023", recordLowTempC: "", highDesignTempC: "", notes: "" },
    fields: [
      { name: "name", label: "Authority", input: "text", row: 1 },
      { name: "state", label: "State", input: "text", row: 1 },
      { name: "necEdition", label: "Adopted NEC edition", input: "select", options: NEC_EDITIONS.map((e) => ({ value: String(e), label: `NEC ${e}` })), row: 1 },
      { name: "recordLowTempC", label: "Record low (°C)", input: "text", hint: "ASHRAE extreme annual mean minimum design dry-bulb", row: 2 },
      { name: "highDesignTempC", label: "High design temperature (°C)", input: "text", hint: "Hot-day air temperature for the string voltage and ampacity checks", row: 2 },
      { name: "notes", label: "Notes", input: "note", row: 3 },
    ],
    columns: [
      { label: "Authority", show: "text", key: "name" },
      { label: "State", show: "text", key: "state" },
      { label: "NEC edition", show: "measure", key: "necEdition" },
      { label: "Record low", show: "measure", key: "recordLowTempC", unit: "°C" },
      { label: "High design", show: "measure", key: "highDesignTempC", unit: "°C" },
      { label: "Notes", show: "text", key: "notes" },
    ],
  },
  utility: {
    title: "Utilities",
    intro: "Service voltages and the grid profiles each utility accepts; the crew chooses the profile from these on site.",
    noun: "utility",
    path: "/settings/utilities",
    schema: UtilityInput,
    empty: { name: "", serviceVoltages: "", acceptedGridProfiles: "", notes: "" },
    fields: [
      { name: "name", label: "Utility", input: "text", row: 1 },
      { name: "serviceVoltages", label: "Service voltages", input: "lines", hint: "One per line, e.g. 120/240 V split-phase", row: 1 },
      {
        name: "acceptedGridProfiles",
        label: "Accepted grid profiles",
        input: "lines",
        hint: "One per line, as the utility words each, e.g. IEEE 1547-2018 Category B, utility's default settings. The crew chooses from these on site.",
        row: 2,
      },
      { name: "notes", label: "Notes", input: "note", row: 3 },
    ],
    columns: [
      { label: "Utility", show: "text", key: "name" },
      { label: "Service voltages", show: "list", key: "serviceVoltages" },
      { label: "Accepted grid profiles", show: "list", key: "acceptedGridProfiles" },
      { label: "Notes", show: "text", key: "notes" },
    ],
  },
};

/** A stored record as its form edits it: lists one per line, numbers as text. */
export function authorityFormValues(kind: AuthorityKind, record: Record<string, unknown>): Record<string, string> {
  return Object.fromEntries(
    AUTHORITY_SPECS[kind].fields.map((f) => {
      const value = record[f.name];
      return [f.name, Array.isArray(value) ? value.join("\n") : value === null || value === undefined ? "" : String(value)];
    }),
  );
}
