import { EXPEDITED_DEAD_LOAD_PSF, type CheckResult, type CheckStatus } from "@/lib/engineering";
import { worstStatus } from "@/lib/engineering/check-result";
import { totalInverterOutputA } from "@/lib/engineering/design-lookup";
import type { ConductorRow } from "@/lib/design/conductor-schedule";
import { layoutSingleLine } from "@/lib/sld";
import { DIAGRAM_BOX } from "@/templates/pdf/packets/sheets/single-line-box";
import { paintScene, type PaintedScene } from "../single-line";
import { documentDate, formatNumber, formatQuantity } from "../text";
import { describeCheck, figuresOfReview } from "./check-methods";
import {
  conductorSchedule,
  disconnectLocation,
  equipmentSchedule,
  generalNotes,
  inverterCounts,
  labelValueLines,
  listingText,
  projectLabel,
  ratingLines,
  revisionLabel,
  scopeOfWork,
  siteAddress,
  structuralRows,
  type EquipmentRow,
  type RatingLine,
  type StructuralRow,
} from "./facts";
import { PACKET_TITLES, type PacketInput } from "./input";
import { storageFacts, type StorageFacts } from "./storage-facts";

// A packet's printed facts gathered once, from the (printable) input, for the sheet layouts in
// templates/pdf/packets: every string and figure as it prints, the check methods and the diagram.

export type PrintedStructuralRow = Omit<StructuralRow, "deadLoad" | "perAttachment"> & {
  deadLoad: string;
  perAttachment: string;
  status: CheckStatus;
};

/** What a calculation row prints beside the check's own words. */
export type PrintedCheck = { inputs: string[]; method: string; result: string; limit: string };

/** Everything the packet's sheets print beyond the input's own text, as printed. */
export type PacketFacts = {
  documentTitle: string;
  documentInfo: { title: string; author: string; creator: string; producer: string };
  projectLabel: string;
  siteAddress: string;
  revisionLabel: string;
  issuedDate: string;
  scopeOfWork: string[];
  generalNotes: string[];
  ratingLines: RatingLine[];
  equipmentSchedule: EquipmentRow[];
  conductorSchedule: ConductorRow[];
  /** The computed values of each label, in the order of the review's labels. */
  labelValues: { name: string; value: string }[][];
  structural: {
    rows: PrintedStructuralRow[];
    moduleWeight: string;
    moduleLength: string;
    moduleWidth: string;
    expeditedDeadLoadPsf: number;
  };
  /** Inverter lines of the same model together, as the application lists them. */
  inverterLines: { quantity: string; makerModel: string; ratedOutput: string; certification: string }[];
  ratings: { dcKw: string; acKw: string; inverterOutputA: string; maxDcVoltage: string };
  disconnectLocation: string;
  /** By check id. */
  checks: Record<string, PrintedCheck>;
  singleLine: PaintedScene;
  /** The batteries' facts; null for a PV-only design. */
  storage: StorageFacts | null;
};

/** A packet's input with its printed facts: what the sheet layouts receive. */
export type PrintedPacket = PacketInput & { facts: PacketFacts };

const printedFigure = (check: CheckResult | null) => formatQuantity(check?.value ?? null, check?.unit ?? "");

/** The packet's printed facts, from its (printable) input. */
export function packetFacts(input: PacketInput): PacketFacts {
  const { summary } = input.review;
  const m = input.equipment.module;
  const figures = figuresOfReview(input);
  const label = projectLabel(input);
  const storage = storageFacts(input);
  return {
    documentTitle: PACKET_TITLES[input.kind],
    documentInfo: {
      title: `${PACKET_TITLES[input.kind]}, ${label}, ${revisionLabel(input.revision)}`,
      author: input.preparedBy.organizationName,
      creator: "Ohmstead",
      producer: "Ohmstead",
    },
    projectLabel: label,
    siteAddress: siteAddress(input),
    revisionLabel: revisionLabel(input.revision),
    issuedDate: documentDate(input.generatedAt, input.preparedBy.timeZone),
    scopeOfWork: scopeOfWork(input),
    generalNotes: generalNotes(input),
    ratingLines: ratingLines(input),
    equipmentSchedule: equipmentSchedule(input),
    conductorSchedule: conductorSchedule(input),
    labelValues: input.review.labels.map(labelValueLines),
    structural: {
      rows: structuralRows(input).map(({ deadLoad, perAttachment, ...row }) => ({
        ...row,
        deadLoad: printedFigure(deadLoad),
        perAttachment: printedFigure(perAttachment),
        status: worstStatus([deadLoad, perAttachment].flatMap((c) => (c ? [c.status] : []))),
      })),
      moduleWeight: formatNumber(m.specs.weightLb),
      moduleLength: formatNumber(m.specs.lengthIn),
      moduleWidth: formatNumber(m.specs.widthIn),
      expeditedDeadLoadPsf: EXPEDITED_DEAD_LOAD_PSF,
    },
    inverterLines: [
      ...inverterCounts(input).map(({ item, quantity }) => ({
        quantity: String(quantity),
        makerModel: `${item.maker} ${item.model}`,
        ratedOutput: `${formatNumber(item.specs.acPowerW)} W, ${item.specs.acOutputCurrentA} A at ${item.specs.acVoltageV} V`,
        certification: listingText(item.specs.certification, item.listing),
      })),
      ...(storage?.inverterLines ?? []),
    ],
    ratings: {
      dcKw: formatQuantity(summary.ratings.dcKw, "kW"),
      acKw: formatQuantity(summary.ratings.acKw, "kW"),
      inverterOutputA: formatQuantity(totalInverterOutputA(input.design), "A"),
      maxDcVoltage: formatQuantity(summary.maxDcVoltageV, "V"),
    },
    disconnectLocation: disconnectLocation(input),
    checks: Object.fromEntries(
      input.review.checks.map((check) => [
        check.id,
        {
          ...describeCheck(check, input.design, input.site, figures),
          result: formatQuantity(check.value, check.unit),
          limit: formatQuantity(check.limit, check.unit),
        },
      ]),
    ),
    singleLine: paintScene(
      layoutSingleLine(input.design, { necEdition: input.jurisdiction.necEdition }),
      DIAGRAM_BOX.widthPt,
      DIAGRAM_BOX.heightPt,
    ),
    storage,
  };
}
