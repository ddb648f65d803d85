import type { CommissioningCheck, CommissioningCompletion, CommissioningRecord } from "@/lib/engineering/commissioning";

export const COMMISSIONING_DOCUMENT_KINDS = ["certificate", "report"] as const;
export type CommissioningDocumentKind = (typeof COMMISSIONING_DOCUMENT_KINDS)[number];

/**
 * Everything the certificate of completion and the commissioning report print,
 * gathered by the server at download time so both match the saved record.
 */
export type CommissioningDocumentInput = {
  kind: CommissioningDocumentKind;
  generatedAt: string; // ISO date-time
  organization: { name: string; licenseNumber: string | null; phone: string | null; timeZone: string }; // IANA zone the times print in
  project: {
    number: number;
    customerName: string;
    address: string; // one line: street, city, state postal code
    jurisdictionName: string | null;
    utilityName: string | null;
    utilityAccountNumber: string | null;
    meterNumber: string | null;
  };
  system: {
    dcKw: number;
    acKw: number;
    moduleCount: number;
    moduleSummary: string; // e.g. "20 × Larkspur LS-380 (380 W)"
    inverterSummary: string; // e.g. "1 × Quillon QS-7600 (7,600 W AC)"
    shutdownSummary: string | null; // rapid shutdown equipment, if any
  };
  installer: { name: string; email: string } | null;
  /** The installer's readings beside the facts they are checked against. */
  record: CommissioningRecord;
  results: CommissioningCheck[];
  completion: CommissioningCompletion;
  recordUpdatedAt: string | null; // ISO; null when nothing has been recorded yet
  completedAt: string | null; // ISO; set when the installer marked the record complete
};
