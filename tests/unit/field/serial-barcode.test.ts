import {
  BarcodeFormat,
  BinaryBitmap,
  DecodeHintType,
  HybridBinarizer,
  MultiFormatReader,
  QRCodeWriter,
  RGBLuminanceSource,
} from "@zxing/library";
import { describe, expect, test } from "vitest";
import { SERIAL_BARCODE_FORMATS, serialFromBarcode } from "@/lib/field/serial-barcode";

// Invented serials. GS1 element strings: application identifier 21 is the serial number (GS1 General Specifications).
describe("the serial in a scanned barcode's text", () => {
  test.each([
    ["QN0730411", "QN0730411"], // the serial alone
    ["S/N: QN0730411", "QN0730411"],
    ["SN:QN0730411;PN:QS-7600-US", "QN0730411"],
    ["MODEL QS-7600 SERIAL NO. QN0730411", "QN0730411"],
    ["SN4471A09", "SN4471A09"], // no separator: "SN" is part of this serial
    ["(01)09521234543213(21)QN0730411", "QN0730411"], // GS1, printed form
    ["0109521234543213" + "21QN0730411", "QN0730411"], // GS1, raw form
    ["  QN0730411\r\n", "QN0730411"],
  ])("%j → %j", (text, serial) => {
    expect(serialFromBarcode(text)).toBe(serial);
  });
});

/** A QR code drawn as a grey image, four pixels a module, with a quiet zone: what a camera frame of a label gives. */
function qrLuminance(text: string) {
  const matrix = new QRCodeWriter().encode(text, BarcodeFormat.QR_CODE, 29, 29, new Map());
  const scale = 4;
  const width = matrix.getWidth() * scale;
  const height = matrix.getHeight() * scale;
  const pixels = new Uint8ClampedArray(width * height);
  for (let y = 0; y < height; y++)
    for (let x = 0; x < width; x++) pixels[y * width + x] = matrix.get(Math.floor(x / scale), Math.floor(y / scale)) ? 0 : 255;
  return new RGBLuminanceSource(pixels, width, height);
}

describe("the barcode library reads a serial label with the scanner's formats", () => {
  test("a QR code holding a labelled serial decodes to the serial", () => {
    const reader = new MultiFormatReader();
    reader.setHints(
      new Map<DecodeHintType, unknown>([[DecodeHintType.POSSIBLE_FORMATS, SERIAL_BARCODE_FORMATS.map((name) => BarcodeFormat[name])]]),
    );
    const result = reader.decode(new BinaryBitmap(new HybridBinarizer(qrLuminance("S/N: QN0730411"))));
    expect(result.getBarcodeFormat()).toBe(BarcodeFormat.QR_CODE);
    expect(serialFromBarcode(result.getText())).toBe("QN0730411");
  });

  test("every format the scanner asks for is one the library knows", () => {
    for (const name of SERIAL_BARCODE_FORMATS) expect(typeof BarcodeFormat[name]).toBe("number");
  });
});
