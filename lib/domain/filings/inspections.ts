// Inspections of the permit (rough, final) and the utility's own visits (witness test, meter set).

export const INSPECTION_KINDS = ["rough", "final", "witness_test", "meter_set"] as const;
export type InspectionKind = (typeof INSPECTION_KINDS)[number];

export const INSPECTION_KIND_LABELS: Record<InspectionKind, string> = {
  rough: "Rough inspection",
  final: "Final inspection",
  witness_test: "Witness test",
  meter_set: "Meter set",
};

/** Which authority carries out each kind: the AHJ inspects under the permit, the utility under the interconnection. */
export const INSPECTION_KINDS_BY_FILING = {
  permit: ["rough", "final"],
  interconnection: ["witness_test", "meter_set"],
  other: [],
} as const satisfies Record<string, readonly InspectionKind[]>;

export const INSPECTION_RESULTS = ["passed", "failed", "partial", "cancelled"] as const;
export type InspectionResult = (typeof INSPECTION_RESULTS)[number];

export const INSPECTION_RESULT_LABELS: Record<InspectionResult, string> = {
  passed: "Passed",
  failed: "Failed",
  partial: "Partly passed",
  cancelled: "Cancelled",
};

/** A failed or partly passed inspection leaves corrections and calls for a re-inspection. */
export function needsReinspection(result: InspectionResult | null): boolean {
  return result === "failed" || result === "partial";
}

export function isInspectionKind(value: unknown): value is InspectionKind {
  return (INSPECTION_KINDS as readonly unknown[]).includes(value);
}

/** One kind of visit a filing can have, as the booking form and the card show it. */
export type InspectionPlanRow = { kind: InspectionKind; required: boolean; passed: boolean };

/**
 * The visits a filing can book, the authority's required ones first (in the order the work reaches them)
 * with whether each has passed; the first required one not passed is what to book next.
 */
export function inspectionPlan(
  kinds: readonly InspectionKind[],
  required: readonly string[],
  inspections: readonly { kind: InspectionKind; result: InspectionResult | null }[],
): { rows: InspectionPlanRow[]; next: InspectionKind | null } {
  const rows = kinds.map((kind) => ({
    kind,
    required: required.includes(kind),
    passed: inspections.some((i) => i.kind === kind && i.result === "passed"),
  }));
  rows.sort((a, b) => Number(b.required) - Number(a.required));
  const next = rows.find((r) => r.required && !r.passed)?.kind ?? rows.find((r) => !r.passed)?.kind ?? null;
  return { rows, next };
}
