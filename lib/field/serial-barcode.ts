// What a serial-number barcode says, as the field record wants it: labels
// and cards often encode more than the serial ("S/N: 7F2A0041", or GS1 data
// with the serial after application identifier 21), so the serial is taken
// out of the text; anything else is offered as read for the crew to check.

// "SN" alone needs a separator after it, or a serial like "SN4471" would lose its first letters.
const LABELLED =
  /(?:^|[\s;,|])(?:S\/N\s*[:#=]?|SN\s*[:#=]|SN\s+|SERIAL(?:\s*(?:NO\.?|NUMBER))?\s*[:#=]?)\s*([\p{L}\p{N}][\p{L}\p{N}-]{3,})/iu;
// GS1 element string in its printed form: "(21)" then the serial, up to the next "(".
const GS1_SERIAL = /\(21\)([^()\s]{1,20})/;
// GS1 raw form: FNC1 (group separator) or the start, "21", the serial up to the next separator.
const GS1_RAW_SERIAL = /(?:^|\u001d)(?:01\d{14})?21([^\u001d]{1,20})/;

/** The serial number in a scanned barcode's text, or the text itself when it names none. */
export function serialFromBarcode(text: string): string {
  const t = text.normalize("NFKC").trim();
  const labelled = LABELLED.exec(t);
  if (labelled) return labelled[1];
  const gs1 = GS1_SERIAL.exec(t) ?? (t.startsWith("01") || t.includes("\u001d") ? GS1_RAW_SERIAL.exec(t) : null);
  if (gs1) return gs1[1];
  return t.replace(/[\u0000-\u001f]/g, "");
}

/** Symbologies serial labels and activation cards use; the scanner reads only these, so it reads faster and misreads less. */
export const SERIAL_BARCODE_FORMATS = ["CODE_128", "CODE_39", "DATA_MATRIX", "QR_CODE"] as const;
