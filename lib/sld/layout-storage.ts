// The storage row under the PV diagram: the battery banks, the ESS disconnect and the battery circuits
// (tagged B1, B2, … in the design's order) rising to the hybrid inverter (DC coupling), or through the
// battery inverter and its output circuit to a breaker on the service panel's busbar (AC coupling);
// the backup loads panel on the stand-alone output with its transfer note; and the point-of-connection
// note with the power control setting beside the service panel.
import { clause, sizeLabel, totalUnits, type NecEdition, type StorageCircuit, type StoredDesign } from "@/lib/engineering";
import type { ServicePlace } from "./layout-service";
import { textWidthPt } from "./scene";
import type { SceneBuilder } from "./scene-builder";
import { LINE_GAP, SIZE, formatKw, wrapWords } from "./style";
import { LOCATION_WORDS, pointOfConnectionLines } from "./storage-words";
import { breakerV, inverterSymbol, junctionDot, switchH } from "./symbols";

type Body = { left: number; right: number; top: number; bottom: number };

export interface StorageAnchors {
  /** The first free y under the PV diagram. */
  top: number;
  /** The multimode inverter's body (DC coupling), when the diagram drew it. */
  hybrid: Body | null;
  service: ServicePlace | null;
  necEdition?: NecEdition;
}

/** A piece of the row, drawn across the wire from x to x + width. */
interface Piece {
  width: number;
  draw: (b: SceneBuilder, x: number, y: number) => void;
}

const WIRE_DROP = 48; // the row's wire below the top, leaving room for the circuit labels above it
const BOX_ABOVE = 30; // a box's top above the wire
const TAG_R = 7;

export function layoutStorage(b: SceneBuilder, design: StoredDesign, at: StorageAnchors): void {
  const s = design.storage;
  const y = at.top + WIRE_DROP;
  const tags = new Map(s.circuits?.map((c, i) => [c, `B${i + 1}`]) ?? []);
  const circuits = (kind: StorageCircuit["kind"]) => (s.circuits ?? []).filter((c) => c.kind === kind);

  const pieces: Piece[] = [batteryBox(design), essDisconnect(design, at.necEdition)];
  for (const c of circuits("battery-dc")) pieces.push(circuitLabel(c, tags.get(c)!));
  if (s.coupling === "dc" && circuits("battery-dc").length === 0) pieces.push(noCircuit("battery circuit"));
  let inverterRight: number | null = null;
  if (s.coupling === "ac") {
    pieces.push(batteryInverter(design, (right) => (inverterRight = right)));
    const outputs = circuits("battery-inverter-output");
    for (const c of outputs) pieces.push(circuitLabel(c, tags.get(c)!));
    if (outputs.length === 0) pieces.push(noCircuit("output circuit"));
  }

  const width = pieces.reduce((sum, p) => sum + p.width, 0);
  const riserX = s.coupling === "dc" ? (at.hybrid ? at.hybrid.right + 14 : null) : at.service ? at.service.panelX + 82 : null;
  let x = riserX === null ? 0 : riserX - width;
  for (const p of pieces) {
    p.draw(b, x, y);
    x += p.width;
  }
  if (riserX === null) {
    b.text(x + 4, y + 3, s.coupling === "dc" ? "to the hybrid inverter" : "to the service panel", { size: SIZE.label, tone: "soft" });
  } else if (s.coupling === "dc" && at.hybrid) {
    b.polyline([
      [riserX, y],
      [riserX, at.hybrid.bottom - 10],
      [at.hybrid.right, at.hybrid.bottom - 10],
    ]);
  } else if (at.service) {
    essBreaker(b, design, riserX, y, at.service);
  }

  if (s.backupPanel || s.backupOutput) {
    if (s.coupling === "dc" && at.hybrid) {
      const r2 = at.hybrid.right + 32;
      b.polyline([
        [at.hybrid.right, at.hybrid.bottom - 22],
        [r2, at.hybrid.bottom - 22],
        [r2, y],
      ]);
      backupRow(b, design, r2, y);
    } else if (inverterRight !== null) {
      const ry = y + 130;
      b.polyline([
        [inverterRight, y + 12],
        [inverterRight + 10, y + 12],
        [inverterRight + 10, ry],
      ]);
      backupRow(b, design, inverterRight + 10, ry);
    } else {
      backupRow(b, design, x + 140, y);
    }
  }
  if (at.service) pointOfConnectionNote(b, design, at.service, at.necEdition);
}

function boxedText(b: SceneBuilder, x: number, y: number, width: number, title: string, lines: string[], indent = 0): void {
  const height = 20 + lines.length * LINE_GAP;
  b.rect(x, y - BOX_ABOVE, width, Math.max(height, BOX_ABOVE + 16), { strokeWidth: 1.2, fill: "white" });
  b.text(x + 8 + indent, y - BOX_ABOVE + 13, title, { size: SIZE.title, weight: "bold" });
  b.textLines(x + 8 + indent, y - BOX_ABOVE + 13 + LINE_GAP, lines, LINE_GAP, { size: SIZE.label, tone: "soft" });
}

function boxWidth(title: string, lines: string[], indent = 0): number {
  return Math.max(textWidthPt(title, SIZE.title, { weight: "bold" }), ...lines.map((l) => textWidthPt(l, SIZE.label))) + 16 + indent;
}

/** Every bank: units × maker model, its kWh, voltage and where it stands; one box for the system. */
function batteryBox(design: StoredDesign): Piece {
  const s = design.storage;
  const lines = s.banks.flatMap((bank) => {
    const u = bank.unit;
    return [
      `${bank.quantity} × ${u.maker} ${u.model}`,
      `${num(u.nameplateKwh)} kWh each (${num(u.usableKwh)} usable)`,
      `${num(u.nominalVoltageV)} V DC · ${LOCATION_WORDS[bank.location]}`,
      ...(u.listings?.length ? [`Listed ${u.listings.join(", ")}`] : []),
    ];
  });
  const units = totalUnits(s);
  const usable = s.banks.reduce((t, bank) => t + bank.quantity * bank.unit.usableKwh, 0);
  if (s.banks.length > 1) lines.push(`${units} units, ${num(usable)} kWh usable`);
  const title = "ENERGY STORAGE SYSTEM";
  const width = boxWidth(title, lines, 26);
  return {
    width: width + 24,
    draw: (b, x, y) => {
      boxedText(b, x, y, width, title, lines, 26);
      batterySymbol(b, x + 12, y);
      b.line(x + width, y, x + width + 24, y);
    },
  };
}

/** A battery: long and short plates side by side across the wire's height. */
function batterySymbol(b: SceneBuilder, x: number, y: number): void {
  for (let i = 0; i < 3; i++) {
    b.line(x + i * 6, y - 9, x + i * 6, y + 9, { strokeWidth: 1.1 });
    b.line(x + i * 6 + 3, y - 5, x + i * 6 + 3, y + 5, { strokeWidth: 2 });
  }
}

function essDisconnect(design: StoredDesign, edition: NecEdition | undefined): Piece {
  const d = design.storage.disconnect;
  const ref = edition ? clause("essDisconnect", edition) : "Article 706";
  const title = "ESS DISCONNECT";
  const lines = [
    d ? (d.kind === "integral" ? "Integral to the ESS" : "Separate switch") : "Not entered yet",
    d?.lockable ? `Lockable open (${ref})` : ref,
    ...(d?.location ? wrapWords(d.location, 28) : []),
  ];
  const width = Math.max(90, boxWidth(title, lines)) + 8;
  return {
    width,
    draw: (b, x, y) => {
      const cx = x + width / 2;
      b.line(x, y, cx - 18, y);
      switchH(b, cx - 18, cx + 18, y);
      b.line(cx + 18, y, x + width, y);
      b.text(cx, y + 22, title, { size: SIZE.title, weight: "bold", anchor: "middle" });
      b.textLines(cx, y + 22 + LINE_GAP, lines, LINE_GAP, { size: SIZE.label, anchor: "middle", tone: "soft" });
    },
  };
}

function circuitLines(c: StorageCircuit): [string, string] {
  const k = c.conductor;
  const ocpd = c.ocpdA ? `, ${c.ocpdA} A OCPD` : "";
  return [`${c.label}${ocpd}`, `${sizeLabel(k.size)} ${k.material} ${k.insulation ?? `${k.insulationTempC} °C insulation`}`];
}

/** A battery circuit's words above its wire, with its B tag on the wire. */
function circuitLabel(c: StorageCircuit, tag: string): Piece {
  const [title, spec] = circuitLines(c);
  return labelPiece(title, spec, tag);
}

function noCircuit(what: string): Piece {
  return labelPiece(`No ${what} entered`, "add it to the design", null);
}

function labelPiece(title: string, spec: string, tag: string | null): Piece {
  const textW = Math.max(textWidthPt(title, SIZE.label), textWidthPt(spec, SIZE.spec, { mono: true }));
  const width = 2 * TAG_R + 8 + textW + 20;
  return {
    width,
    draw: (b, x, y) => {
      b.line(x, y, x + width, y);
      if (tag) {
        b.circle(x + 6 + TAG_R, y, TAG_R, { fill: "white", strokeWidth: 0.9 });
        b.text(x + 6 + TAG_R, y + 2.2, tag, { size: 5.5, anchor: "middle", weight: "bold" });
      }
      const tx = x + 6 + 2 * TAG_R + 4;
      b.text(tx, y - 19, title, { size: SIZE.label });
      b.text(tx, y - 10, spec, { size: SIZE.spec, mono: true, tone: "soft" });
    },
  };
}

/** The AC-coupled battery inverter: a box with the inverter symbol, its caption under it. */
function batteryInverter(design: StoredDesign, onRight: (right: number) => void): Piece {
  const inv = design.storage.batteryInverter;
  const title = "BATTERY INVERTER";
  const lines = inv
    ? [`${inv.maker} ${inv.model}`, `${formatKw(inv.acPowerW)} kW, ${inv.acVoltageV} V, ${inv.acOutputCurrentA} A out`]
    : ["Not entered yet"];
  const boxW = Math.max(70, boxWidth(title, lines) - 16);
  return {
    width: boxW + 36,
    draw: (b, x, y) => {
      const left = x + 18;
      b.line(x, y, left, y);
      b.rect(left, y - 22, boxW, 44, { dash: [4, 2.5], strokeWidth: 0.8 });
      inverterSymbol(b, left + boxW / 2 - 20, y - 16, 40, 32);
      b.line(left + boxW, y, x + boxW + 36, y);
      b.text(left, y + 36, title, { size: SIZE.title, weight: "bold" });
      b.textLines(left, y + 36 + LINE_GAP, lines, LINE_GAP, { size: SIZE.label, tone: "soft" });
      onRight(left + boxW);
    },
  };
}

/** The battery inverter's breaker on the service panel's busbar, beside the PV breaker. */
function essBreaker(b: SceneBuilder, design: StoredDesign, x: number, y: number, service: ServicePlace): void {
  const tapY = service.y + 16;
  b.line(service.busX, tapY, x, tapY);
  junctionDot(b, service.busX, tapY);
  breakerV(b, x, tapY, service.y + 34);
  b.line(x, service.y + 34, x, y);
  const breakerA = design.storage.batteryInverter?.breakerA;
  if (breakerA) b.text(x - 5, service.y + 32, `${breakerA} A ESS`, { size: SIZE.label, anchor: "end", mono: true, weight: "bold" });
}

/** From the stand-alone output: the backup loads panel, and how the transfer happens. */
function backupRow(b: SceneBuilder, design: StoredDesign, x: number, y: number): void {
  const s = design.storage;
  const out = s.backupOutput;
  const title = "Backup output (710.15)";
  const spec = out
    ? `${num(out.continuousA)} A at ${out.voltageV} V${out.powerW ? `, ${formatKw(out.powerW)} kW` : ""}`
    : "rating not entered";
  const label = labelPiece(title, spec, null);
  label.draw(b, x, y);
  const transfer = [
    "Automatic: the inverter opens from the grid",
    "and carries this panel when the grid fails",
    ...(out?.transferTimeS !== undefined ? [`Transfer time ${num(out.transferTimeS)} s (data sheet)`] : []),
  ];
  b.text(x + 8, y + 22, "TRANSFER", { size: SIZE.title, weight: "bold" });
  b.textLines(x + 8, y + 22 + LINE_GAP, transfer, LINE_GAP, { size: SIZE.label, tone: "soft" });
  const transferW = Math.max(...transfer.map((l) => textWidthPt(l, SIZE.label))) + 16;
  const boxX = x + Math.max(label.width, transferW);
  b.line(x + label.width, y, boxX, y);
  const p = s.backupPanel;
  if (!p) return;
  const loads = p.loads ?? [];
  const lines = [
    `${p.busbarA} A busbar, ${p.mainBreakerA === null ? "main lugs" : `${p.mainBreakerA} A main`}`,
    `${p.inverterBreakerA} A inverter breaker${p.inverterBreakerAtOppositeEnd ? ", far end" : ""}`,
    p.voltageV === 240 ? "120/240 V" : "120 V",
    ...loads.slice(0, 4).map((l) => `${l.name}: ${num(l.currentA)} A at ${l.voltageV} V`),
    ...(loads.length > 4 ? [`and ${loads.length - 4} more loads`] : []),
  ];
  boxedText(b, boxX, y, boxWidth("BACKUP LOADS PANEL", lines), "BACKUP LOADS PANEL", lines);
}

function pointOfConnectionNote(b: SceneBuilder, design: StoredDesign, service: ServicePlace, edition?: NecEdition): void {
  const x = service.panelRight + 14;
  const top = service.y - 66;
  b.text(x, top, "POINT OF CONNECTION", { size: SIZE.title, weight: "bold" });
  b.textLines(x, top + LINE_GAP, pointOfConnectionLines(design, edition), LINE_GAP, { size: SIZE.label, tone: "soft" });
}

function num(n: number): string {
  return String(Math.round(n * 100) / 100);
}
