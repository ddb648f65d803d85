import type { AuthorityKind } from "@/lib/domain/authorities";
import { INSPECTION_KIND_LABELS, INSPECTION_KINDS_BY_FILING } from "@/lib/domain/filings";
import { DEFAULT_ESS_SITING } from "@/lib/engineering/tables/ess-siting-limits";
import { NEC_EDITIONS } from "@/lib/engineering/types";
import { JurisdictionInput, UtilityInput } from "@/lib/schemas/reference-data";

// The authorities a project answers to, in one place: the AHJ that issues the permit and the utility
// that lets the system connect. Both are kept, listed and edited the same way; what differs (their
// fields, columns and words) is declared here per kind. Pure, so forms and pages both read it.

/** One entry of an authority's form: how it is typed and what the person reads beside it. */
export type AuthorityField = {
  name: string;
  label: string;
  input: "text" | "lines" | "note" | "select" | "checks";
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
  empty: Record<string, string | string[]>;
  fields: readonly AuthorityField[];
  columns: readonly AuthorityColumn[];
};

function inspectionOptions(filing: "permit" | "interconnection") {
  return INSPECTION_KINDS_BY_FILING[filing].map((kind) => ({ value: kind, label: INSPECTION_KIND_LABELS[kind] }));
}

export const AUTHORITY_SPECS: Record<AuthorityKind, AuthorityKindSpec> = {
  jurisdiction: {
    title: "Jurisdictions (AHJ)",
    intro:
      "Design temperatures feed the string voltage checks: record low is the ASHRAE extreme annual mean minimum design dry-bulb temperature.",
    noun: "jurisdiction",
    path: "/settings/jurisdictions",
    schema: JurisdictionInput,
    empty: {
      name: "",
      state: "",
      necEdition: "2023",
      recordLowTempC: "",
      highDesignTempC: "",
      reviewDays: "10",
      permitValidDays: "180",
      requiredInspections: ["final"],
      notes: "",
      essCode: "",
      essPerUnitKwh: "",
      essGarageKwh: "",
      essOutdoorKwh: "",
      essUtilitySpaceKwh: "",
    },
    fields: [
      { name: "name", label: "Authority", input: "text", row: 1 },
      { name: "state", label: "State", input: "text", row: 1 },
      {
        name: "necEdition",
        label: "Adopted NEC edition",
        input: "select",
        options: NEC_EDITIONS.map((e) => ({ value: String(e), label: `NEC ${e}` })),
        row: 1,
      },
      {
        name: "recordLowTempC",
        label: "Record low (°C)",
        input: "text",
        hint: "ASHRAE extreme annual mean minimum design dry-bulb",
        row: 2,
      },
      {
        name: "highDesignTempC",
        label: "High design temperature (°C)",
        input: "text",
        hint: "Hot-day air temperature for the string voltage and ampacity checks",
        row: 2,
      },
      { name: "reviewDays", label: "Usual plan review (days)", input: "text", hint: "Sets a filing's first follow-up date", row: 3 },
      {
        name: "permitValidDays",
        label: "Permit valid for (days)",
        input: "text",
        hint: "Without an inspection, from the day it is issued",
        row: 3,
      },
      { name: "requiredInspections", label: "Inspections it requires", input: "checks", options: inspectionOptions("permit"), row: 4 },
      {
        name: "essCode",
        label: "Residential ESS code adopted",
        input: "text",
        hint: `The residential battery siting limits it enforces. Blank: ${DEFAULT_ESS_SITING.code} as published`,
        row: 5,
      },
      {
        name: "essPerUnitKwh",
        label: "Per battery unit (kWh)",
        input: "text",
        hint: `Blank: ${DEFAULT_ESS_SITING.perUnitKwh} kWh`,
        row: 6,
      },
      {
        name: "essGarageKwh",
        label: "Garage, all units (kWh)",
        input: "text",
        hint: `Blank: ${DEFAULT_ESS_SITING.aggregateKwh.garage} kWh`,
        row: 6,
      },
      {
        name: "essOutdoorKwh",
        label: "Outdoors or exterior wall (kWh)",
        input: "text",
        hint: `Blank: ${DEFAULT_ESS_SITING.aggregateKwh["outdoor-wall"]} kWh`,
        row: 7,
      },
      {
        name: "essUtilitySpaceKwh",
        label: "Utility closet or basement (kWh)",
        input: "text",
        hint: `Blank: ${DEFAULT_ESS_SITING.aggregateKwh["utility-space"]} kWh`,
        row: 7,
      },
      { name: "notes", label: "Notes", input: "note", row: 8 },
    ],
    columns: [
      { label: "Authority", show: "text", key: "name" },
      { label: "State", show: "text", key: "state" },
      { label: "NEC edition", show: "measure", key: "necEdition" },
      { label: "Record low", show: "measure", key: "recordLowTempC", unit: "°C" },
      { label: "High design", show: "measure", key: "highDesignTempC", unit: "°C" },
      { label: "Usual review", show: "measure", key: "reviewDays", unit: "days" },
      { label: "Notes", show: "text", key: "notes" },
    ],
  },
  utility: {
    title: "Utilities",
    intro: "Service voltages and the grid profiles each utility accepts; the crew chooses the profile from these on site.",
    noun: "utility",
    path: "/settings/utilities",
    schema: UtilityInput,
    empty: { name: "", serviceVoltages: "", acceptedGridProfiles: "", reviewDays: "15", requiredInspections: [], notes: "" },
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
      { name: "reviewDays", label: "Usual application review (days)", input: "text", hint: "Sets a filing's first follow-up date", row: 3 },
      { name: "requiredInspections", label: "Visits it requires", input: "checks", options: inspectionOptions("interconnection"), row: 3 },
      { name: "notes", label: "Notes", input: "note", row: 4 },
    ],
    columns: [
      { label: "Utility", show: "text", key: "name" },
      { label: "Service voltages", show: "list", key: "serviceVoltages" },
      { label: "Accepted grid profiles", show: "list", key: "acceptedGridProfiles" },
      { label: "Usual review", show: "measure", key: "reviewDays", unit: "days" },
      { label: "Notes", show: "text", key: "notes" },
    ],
  },
};

/** A stored record as its form edits it: lists one per line (or ticked boxes), numbers as text. */
export function authorityFormValues(kind: AuthorityKind, record: Record<string, unknown>): Record<string, string | string[]> {
  return Object.fromEntries(
    AUTHORITY_SPECS[kind].fields.map((f) => {
      const value = record[f.name];
      if (f.input === "checks") return [f.name, Array.isArray(value) ? value.map(String) : []];
      return [f.name, Array.isArray(value) ? value.join("\n") : value === null || value === undefined ? "" : String(value)];
    }),
  );
}
