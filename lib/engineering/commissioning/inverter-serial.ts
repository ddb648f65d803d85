// At the inverter, first: the serial number on the unit's label is recorded
// (typed, or read from its barcode), and the activation card that ships with
// the unit must name the same serial. A card from another box activates, or
// registers, the wrong unit.
import type { NecEdition } from "../types";
import { ACTIVATION_BASIS } from "./inverter-activation";
import { build } from "./reading";
import type { CommissioningCheck, InverterUnitReading } from "./types";

/** Shorter than this is not a serial number (a check digit, a model suffix). */
export const MIN_SERIAL_CHARS = 4;

/**
 * A serial as printed or scanned, compared letter for letter: upper case, letters and digits only,
 * without a leading "S/N:" or "Serial No." a label or barcode may carry. Letters and digits that look
 * alike (O and 0) are not merged: they are different serials.
 */
export function normalizeSerial(text: string | null | undefined): string {
  return (
    (text ?? "")
      .normalize("NFKC")
      .trim()
      // "SN" alone needs a separator after it, or the first letters of a serial like "SN4471" would go.
      .replace(/^(?:s\/n\s*[:#.]?\s*|sn\s*[:#]\s*|sn\s+|serial(?:\s*(?:no\.?|number))?\s*[:#.]?\s*)/i, "")
      .toUpperCase()
      .replace(/[^\p{L}\p{N}]+/gu, "")
  );
}

export function checkInverterSerial(unit: InverterUnitReading, edition: NecEdition): CommissioningCheck {
  const base = {
    id: `inverter-serial:${unit.id}`,
    title: `${unit.label} serial against its activation card`,
    unit: "",
    clause: ACTIVATION_BASIS,
    edition,
    value: null,
    limit: null,
  };
  const serial = normalizeSerial(unit.serial);
  const card = normalizeSerial(unit.cardSerial);
  if (serial === "" || card === "") {
    const which =
      serial === "" && card === ""
        ? "the serial on the unit's label and the one on its activation card"
        : serial === ""
          ? "the serial on the unit's label"
          : "the serial printed on the activation card";
    return build("inverter-serial", "missing", {
      ...base,
      status: "warn",
      message: `Not recorded yet: ${which}. Type it or scan its barcode.`,
    });
  }
  const tooShort = [serial, card].find((s) => s.length < MIN_SERIAL_CHARS);
  if (tooShort) {
    return build("inverter-serial", "invalid", {
      ...base,
      status: "fail",
      message: `"${tooShort}" is too short to be a serial number.`,
      fix: "Read the whole serial from the label (it is usually beside a barcode marked S/N) and enter it again.",
    });
  }
  const ok = serial === card;
  return build("inverter-serial", "recorded", {
    ...base,
    status: ok ? "pass" : "fail",
    message: ok
      ? `The activation card names this unit's serial, ${serial}.`
      : `The activation card names serial ${card}, but this unit's label says ${serial}: the card belongs to another unit.`,
    fix: ok
      ? undefined
      : "Do not activate with this card. Find the card that shipped in this unit's box (or ask the maker for this serial's key), and check that the label you read is this unit's.",
  });
}
