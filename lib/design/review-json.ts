import {
  type CheckResult,
  type CheckStatus,
  type ReviewResult,
  type RunFigures,
  type StorageFigures,
  type StorageSummary,
} from "@/lib/engineering";
import { worstStatus } from "@/lib/engineering/check-result";

/** The review as the JSON API answers it; figures are rounded as the checks round theirs (two decimals). */
export type ReviewJson = {
  status: CheckStatus;
  ratings: { dcKw: number; acKw: number; dcAcRatio: number; annualKwh?: number };
  strings: {
    id: string;
    moduleVocColdV: number | null;
    stringVocColdV: number | null;
    maxCircuitCurrentA: number | null;
    minOcpdA: number | null;
    shutdownStringV?: number;
  }[];
  inverterOutputs: { inverterId: string; continuousA: number; minOcpdA: number | null }[];
  pointOfConnection: {
    method: "load-side" | "supply-side";
    rule: "100%" | "120%" | "sum" | "service-rating" | "feeder" | null;
    maxPvBreakerA: number | null;
    status: CheckStatus;
  };
  runs: {
    id: string;
    circuits: number | null; // separate circuits sharing the run's raceway or cable
    currentCarrying: number | null; // current-carrying conductors the ampacity is adjusted for
    terminalC: number | null; // the terminal temperature the conductors are sized at
    designCurrentA: number | null; // per circuit
    requiredAmpacityA: number | null;
    correctedAmpacityA: number | null;
    voltageDropV: number | null;
    voltageDropPct: number | null;
    minEgc: string | null;
    fillPct?: number | null;
    status: CheckStatus;
  }[];
  checks: {
    id: string;
    subject: string;
    codeRef: string;
    status: CheckStatus;
    value: number | null;
    limit: number | null;
    unit: string;
    message: string;
    fix?: string;
    field?: string;
  }[];
  labels: {
    codeRef: string;
    title: string;
    text: string;
    prescribedWording: boolean;
    explanation: string;
    placement: string;
    values: Record<string, number>;
  }[];
  /** Present only for a design with storage: the batteries in brief and the figures of their checks. */
  storage?: Omit<StorageSummary, "backupPanel"> & {
    locations: StorageFigures["locations"];
    circuits: StorageFigures["circuits"];
    backupPanel: StorageFigures["backupPanel"];
  };
};

// Checks that compare against roof planes; a document without roof planes has nothing for them to read.
const ROOF_CHECK = /^(roof-dead-load|roof-attachment-load|input:roof):|^module-count$/;

/**
 * Shapes the engine's result as the API's review: it only maps the figures the review computed beside
 * its checks (ReviewResult.figures), so the answer and the checks cannot drift apart.
 */
export function toReviewJson(result: ReviewResult, { roofPlanesGiven }: { roofPlanesGiven: boolean }): ReviewJson {
  const kept = result.checks.filter((c) => roofPlanesGiven || !ROOF_CHECK.test(c.id));
  const { ratings, annualProductionKwh } = result.summary;
  const { strings, inverterOutputs, pointOfConnection, runs } = result.figures;
  return {
    status: worstStatus(kept.map((c) => c.status)),
    ratings: {
      dcKw: ratings.dcKw,
      acKw: ratings.acKw,
      dcAcRatio: ratings.dcToAcRatio,
      ...(annualProductionKwh === null ? {} : { annualKwh: annualProductionKwh }),
    },
    strings: strings.map(({ shutdownStringV, ...s }) => ({ ...s, ...(shutdownStringV === null ? {} : { shutdownStringV }) })),
    inverterOutputs,
    pointOfConnection: {
      method: pointOfConnection.method,
      rule: pointOfConnection.rule,
      maxPvBreakerA: result.summary.largestPvBreakerA,
      status: pointOfConnection.status,
    },
    runs: runs.map(toRunJson),
    checks: kept.map(toCheckJson),
    labels: result.labels.map((l) => ({
      codeRef: l.clause,
      title: l.title,
      text: l.text,
      prescribedWording: l.prescribed,
      explanation: l.explanation,
      placement: l.placement,
      values: l.values,
    })),
    ...storageJson(result),
  };
}

function storageJson(result: ReviewResult): Pick<ReviewJson, "storage"> {
  const figures = result.figures.storage;
  if (!result.storage || !figures) return {};
  const { backupPanel: _hasPanel, ...summary } = result.storage;
  return { storage: { ...summary, locations: figures.locations, circuits: figures.circuits, backupPanel: figures.backupPanel } };
}

// The API answers the figures it always has; how the terminal rating and the EGC device were chosen is for the calculation sheet.
function toRunJson({
  terminalSource: _source,
  egcDeviceA: _device,
  egcDeviceAssumed: _assumed,
  fillPct,
  ...r
}: RunFigures): ReviewJson["runs"][number] {
  const { status, ...figures } = r;
  return { ...figures, ...(fillPct === null ? {} : { fillPct }), status };
}

function toCheckJson(c: CheckResult): ReviewJson["checks"][number] {
  return {
    id: c.id,
    subject: c.title,
    codeRef: c.clause,
    status: c.status,
    value: c.value,
    limit: c.limit,
    unit: c.unit,
    message: c.message,
    ...(c.fix === undefined ? {} : { fix: c.fix }),
    ...(c.field === undefined ? {} : { field: c.field }),
  };
}
