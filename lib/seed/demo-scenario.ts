// The invented demo scenario: two installer companies in invented towns,
// invented authorities and utilities. No real company, place or person.
import type { NecEdition } from "@/lib/engineering/types";

export const ORGANIZATIONS = {
  main: { name: "Quillmoor Solar Electric", licenseNumber: "EC-40718 (demo)", phone: "(555) 014-2210", timeZone: "America/Denver" },
  other: { name: "Harrowgate Sunworks", licenseNumber: "EC-51302 (demo)", phone: "(555) 019-8834", timeZone: "America/Denver" },
} as const;

export const JURISDICTIONS: {
  key: string;
  name: string;
  state: string;
  necEdition: NecEdition;
  recordLowTempC: number;
  highDesignTempC: number;
  notes: string;
}[] = [
  {
    key: "brackenford",
    name: "City of Brackenford Building Division",
    state: "CO",
    necEdition: 2023,
    recordLowTempC: -24,
    highDesignTempC: 34,
    notes: "Plan sets as one PDF. Inspections booked two business days ahead.",
  },
  {
    key: "quillan",
    name: "Town of Quillan Springs Permits Office",
    state: "CO",
    necEdition: 2020,
    recordLowTempC: -21,
    highDesignTempC: 33,
    notes: "Wants the structural summary stamped for roofs older than 1980.",
  },
  {
    key: "wendle",
    name: "Wendle County Building Services",
    state: "CO",
    necEdition: 2017,
    recordLowTempC: -28,
    highDesignTempC: 32,
    notes: "Rural county; inspector visits on Tuesdays and Thursdays.",
  },
];

export const UTILITIES = [
  {
    key: "bmlp",
    name: "Brackenford Municipal Light & Power",
    serviceVoltages: ["120/240 V split-phase", "120/208 V three-phase"],
    acceptedGridProfiles: ["IEEE 1547-2018 Category B, utility's default settings", "IEEE 1547-2018 Category B, volt-watt on"],
    notes: "Requires a visible, lockable AC disconnect within 10 ft of the meter.",
  },
  {
    key: "highmesa",
    name: "High Mesa Rural Electric Cooperative",
    serviceVoltages: ["120/240 V split-phase", "277/480 V three-phase"],
    acceptedGridProfiles: ["IEEE 1547-2018 Category B, abnormal performance Category II; volt-var on, power factor 1.0 by default"],
    notes: "Witness test may be requested for systems above 25 kW AC.",
  },
];

export const STREETS = [
  "Larkin Mill Rd",
  "Cobble Fen Ln",
  "Ashgrove Ct",
  "Tinder Ridge Dr",
  "Fallow Brook Way",
  "Kettle Hollow Rd",
  "Marlow Pass",
  "Sedgefield Ave",
  "Wrenfield St",
  "Ouzel Creek Rd",
  "Hearthstone Loop",
  "Pennycress Ln",
  "Granary Row",
  "Thistledown Dr",
];

export const TOWNS = [
  { city: "Brackenford", postalCode: "80913", jurisdiction: "brackenford", utility: "bmlp" },
  { city: "Quillan Springs", postalCode: "80927", jurisdiction: "quillan", utility: "bmlp" },
  { city: "Wendle", postalCode: "80941", jurisdiction: "wendle", utility: "highmesa" },
  { city: "Dorrit Flats", postalCode: "80946", jurisdiction: "wendle", utility: "highmesa" },
];

export const CUSTOMERS = [
  "Imogen Halvorsen",
  "Rafael Quintero-Bask",
  "Beatrix Lindqvist",
  "Kwame Osei-Tutu",
  "Noor Haddadin",
  "Elias Fenwright",
  "Saoirse Kettleby",
  "Mateo Arrowsmith",
  "Yuki Tanabe-Rowe",
  "Gideon Marsh-Pell",
  "Ottilie Brandvold",
  "Hamid Rostami",
  "Clementine Ashdown",
  "Desmond Achterberg",
  "Ingrid Solvang",
  "Tobias Wrenhall",
  "Amara Nwachukwu",
  "Florian Devereaux",
  "Léa Montclair",
  "Casimir Nowacki",
  "Priscilla Tamburlaine",
  "Bashir Al-Khatib",
  "Wilhelmina Coe",
  "Ezra Blackthorne",
  "Marisol Ybarra",
  "Oskar Lindgren-Hale",
  "Thea Ravensworth",
  "Jonah Pritchard",
  "Annika Vosberg",
  "Rosalind Hatherley",
];

/** What the office writes when a project reaches each stage. */
export const STAGE_NOTES: Record<string, string> = {
  design_checked: "Design review clean; equipment confirmed with the customer.",
  permit_filed: "Permit set delivered to the building division with the fee.",
  permit_issued: "Permit card received; crew can be scheduled.",
  installed: "Array, inverter and AC disconnect installed; site photos on file.",
  inspection_passed: "Final electrical inspection signed off.",
  utility_filed: "Interconnection application sent with the single-line diagram.",
  utility_approved: "Utility approved the application; meter exchange booked.",
  commissioned: "Grid profile set, rapid shutdown tested, all modules reporting.",
  pto_received: "Permission to operate received; customer notified.",
  closed: "Project handed over; warranty documents sent.",
};
