// One-page data sheets for the invented demo equipment, so demo packets show
// data sheets appended the way real ones are. Marked as demo documents.
import { PDFDocument, StandardFonts, rgb } from "pdf-lib";
import type { EquipmentDto } from "@/lib/schemas/equipment";

const LABELS: Record<string, string> = {
  powerW: "Rated power Pmax (W, STC)",
  vocV: "Open-circuit voltage Voc (V)",
  vmpV: "Voltage at Pmax Vmp (V)",
  iscA: "Short-circuit current Isc (A)",
  impA: "Current at Pmax Imp (A)",
  vocTempCoeff: "Voc temperature coefficient",
  pmaxTempCoeffPctPerC: "Pmax temperature coefficient (%/°C)",
  maxSeriesFuseA: "Maximum series fuse (A)",
  lengthIn: "Length (in)",
  widthIn: "Width (in)",
  weightLb: "Weight (lb)",
  inverterKind: "Type",
  acPowerW: "Rated AC power (W)",
  acOutputCurrentA: "Maximum continuous output current (A)",
  acVoltageV: "Nominal AC voltage (V)",
  phase: "Phases",
  maxDcInputV: "Maximum DC input voltage (V)",
  mpptMinV: "MPPT window minimum (V)",
  mpptMaxV: "MPPT window maximum (V)",
  maxInputIscA: "Maximum input current per MPPT (A)",
  mpptCount: "Number of MPPTs",
  regulatedStringV: "Regulated string voltage (V)",
  maxStringPowerW: "Maximum power per string (W)",
  certification: "Certification",
  meetsRapidShutdownWithDevices: "Rapid shutdown with matching devices",
  reportsPerModule: "Module-level monitoring",
  deviceKind: "Type",
  ratedInputPowerW: "Rated input power (W)",
  maxInputV: "Maximum input voltage (V)",
  maxOutputCurrentA: "Maximum output current (A)",
  shutdownOutputV: "Output while shut down (V)",
  storageRole: "Battery role",
  backupContinuousA: "Backup output, continuous (A)",
  backupVoltageV: "Backup output voltage (V)",
  backupPowerW: "Backup output power (W)",
  transferTimeS: "Transfer time (s)",
  pcsListed: "Listed power control system",
  pcsCurrentLimitSettable: "Settable current limit",
  usableKwh: "Usable energy (kWh)",
  nameplateKwh: "Nameplate energy (kWh)",
  maxContinuousChargeA: "Maximum continuous charge current (A)",
  maxContinuousDischargeA: "Maximum continuous discharge current (A)",
  maxChargeKw: "Maximum charge power (kW)",
  maxDischargeKw: "Maximum discharge power (kW)",
  nominalVoltageV: "Nominal voltage (V DC)",
  maxUnitsInParallel: "Units allowed in parallel",
};

const text = (value: unknown): string => {
  if (value && typeof value === "object" && "value" in value) {
    const coefficient = value as unknown as { value: number; unit: string };
    return `${coefficient.value} ${coefficient.unit.replace("/C", "/°C")}`;
  }
  if (typeof value === "boolean") return value ? "Yes" : "No";
  return String(value);
};

/** A plain one-page PDF listing the item's figures, for the demo catalog only. */
export async function demoDatasheetPdf(item: Pick<EquipmentDto, "kind" | "maker" | "model" | "listing" | "specs">): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  pdf.setTitle(`${item.maker} ${item.model} data sheet (demo)`);
  const page = pdf.addPage([612, 792]);
  const regular = await pdf.embedFont(StandardFonts.Helvetica);
  const bold = await pdf.embedFont(StandardFonts.HelveticaBold);
  const ink = rgb(0.12, 0.11, 0.09);
  page.drawRectangle({ x: 0, y: 712, width: 612, height: 80, color: rgb(0.23, 0.29, 0.36) });
  page.drawText(item.maker.toUpperCase(), { x: 48, y: 752, size: 22, font: bold, color: rgb(1, 1, 1) });
  page.drawText(`${item.model} · data sheet`, { x: 48, y: 728, size: 13, font: regular, color: rgb(1, 1, 1) });
  page.drawText("Invented equipment for the Ohmstead demo. Not a real product.", {
    x: 48,
    y: 680,
    size: 10,
    font: regular,
    color: rgb(0.6, 0.2, 0.1),
  });
  let y = 640;
  const row = (label: string, value: string) => {
    page.drawText(label, { x: 48, y, size: 11, font: regular, color: ink });
    page.drawText(value, { x: 360, y, size: 11, font: bold, color: ink });
    page.drawLine({ start: { x: 48, y: y - 6 }, end: { x: 564, y: y - 6 }, thickness: 0.5, color: rgb(0.85, 0.82, 0.75) });
    y -= 24;
  };
  // In the order a data sheet reads, whatever order the stored specs come back in.
  const specs = item.specs as Record<string, unknown>;
  for (const key of Object.keys(LABELS)) if (specs[key] !== undefined && specs[key] !== "") row(LABELS[key], text(specs[key]));
  if (item.listing) row("Listing", item.listing);
  return pdf.save();
}
