import { FILING_STATUS_LABELS, WAITING_PARTY_LABELS } from "@/lib/domain/filings";
import { localIsoDate } from "@/lib/domain/time-zones";
import type { ProjectDto } from "@/lib/dto/projects";
import type { CsvColumn } from "./write-csv";

/**
 * The project fields a spreadsheet can carry in and out, with the header the export writes and the
 * other headers an import recognizes (compared without case, spaces or punctuation). AHJ, utility,
 * coordinator and installer are written by name; an import also accepts a coordinator's or installer's e-mail.
 */
export const PROJECT_SHEET_FIELDS = [
  { key: "customerName", header: "Customer", aliases: ["customer name", "name", "homeowner", "client"], required: true },
  { key: "customerEmail", header: "Customer e-mail", aliases: ["email", "e-mail", "customer email"] },
  { key: "customerPhone", header: "Customer phone", aliases: ["phone", "telephone"] },
  { key: "street", header: "Street", aliases: ["address", "street address", "site address"], required: true },
  { key: "city", header: "City", aliases: ["town"], required: true },
  { key: "state", header: "State", aliases: ["st"], required: true },
  { key: "postalCode", header: "ZIP", aliases: ["zip code", "postal code", "zipcode"], required: true },
  { key: "jurisdiction", header: "AHJ", aliases: ["jurisdiction", "authority having jurisdiction", "permit office"] },
  { key: "utility", header: "Utility", aliases: ["electric utility", "utility company"] },
  { key: "utilityAccountNumber", header: "Utility account", aliases: ["account", "account number", "utility account number"] },
  { key: "meterNumber", header: "Meter", aliases: ["meter number", "meter no"] },
  { key: "mainBreakerA", header: "Main breaker (A)", aliases: ["main breaker", "main breaker a"] },
  { key: "busbarA", header: "Busbar (A)", aliases: ["busbar", "busbar rating", "bus rating"] },
  { key: "serviceVoltageV", header: "Service voltage (V)", aliases: ["service voltage", "voltage"] },
  { key: "servicePhases", header: "Service phases", aliases: ["phases", "phase"] },
  { key: "coordinator", header: "Coordinator", aliases: ["permit coordinator"] },
  { key: "installer", header: "Installer", aliases: ["crew", "crew lead", "electrician"] },
] as const;
export type ProjectSheetField = (typeof PROJECT_SHEET_FIELDS)[number]["key"];

const SHEET_VALUE: Record<ProjectSheetField, (p: ProjectDto) => string | number | null> = {
  customerName: (p) => p.customerName,
  customerEmail: (p) => p.customerEmail,
  customerPhone: (p) => p.customerPhone,
  street: (p) => p.street,
  city: (p) => p.city,
  state: (p) => p.state,
  postalCode: (p) => p.postalCode,
  jurisdiction: (p) => p.jurisdiction?.name ?? null,
  utility: (p) => p.utility?.name ?? null,
  utilityAccountNumber: (p) => p.utilityAccountNumber,
  meterNumber: (p) => p.meterNumber,
  mainBreakerA: (p) => p.mainBreakerA,
  busbarA: (p) => p.busbarA,
  serviceVoltageV: (p) => p.serviceVoltageV,
  servicePhases: (p) => p.servicePhases,
  coordinator: (p) => p.coordinator?.name ?? null,
  installer: (p) => p.installer?.name ?? null,
};
const NUMERIC = new Set<ProjectSheetField>(["mainBreakerA", "busbarA", "serviceVoltageV", "servicePhases"]);

const HOLD_WORDS = { on_hold: "On hold", cancelled: "Cancelled" } as const;

/**
 * The projects list as a spreadsheet: its own columns (number, stage, days in stage, who it waits on and
 * since when, the filings' statuses) followed by every field an import reads back. Days are ISO dates in
 * the organization's zone.
 */
export function projectCsvColumns(timeZone: string): CsvColumn<ProjectDto>[] {
  return [
    { header: "No.", kind: "number", value: (p) => p.number },
    ...PROJECT_SHEET_FIELDS.map((f): CsvColumn<ProjectDto> => ({
      header: f.header,
      kind: NUMERIC.has(f.key) ? "number" : "text",
      value: SHEET_VALUE[f.key],
    })),
    { header: "Stage", value: (p) => p.stageLabel },
    { header: "Stage since", kind: "date", value: (p) => localIsoDate(p.stageChangedAt, timeZone) },
    { header: "Days in stage", kind: "number", value: (p) => p.daysInStage },
    { header: "Waiting on", value: (p) => (p.waitingOn ? WAITING_PARTY_LABELS[p.waitingOn] : "Nobody") },
    { header: "Waiting since", kind: "date", value: (p) => (p.waitingSince ? localIsoDate(p.waitingSince, timeZone) : null) },
    { header: "Permit status", value: (p) => (p.permitStatus ? FILING_STATUS_LABELS[p.permitStatus] : null) },
    { header: "Interconnection status", value: (p) => (p.interconnectionStatus ? FILING_STATUS_LABELS[p.interconnectionStatus] : null) },
    { header: "Set aside", value: (p) => (p.holdState ? HOLD_WORDS[p.holdState] : null) },
    { header: "Created", kind: "date", value: (p) => localIsoDate(p.createdAt, timeZone) },
  ];
}
