import { describe, expect, test } from "vitest";
import { checkInverterSerial, normalizeSerial } from "@/lib/engineering";
import { inverterUnit } from "./fixtures";

// Basis: the activation card that ships with an inverter names the serial of that unit; the two must
// match before activation (our rule; invented serials).
describe("inverter serial against its activation card", () => {
  test.each([
    ["QN0730411", "QN0730411", "pass"],
    ["QN0730411", "qn-0730-411", "pass"], // case, dashes and spaces as printed do not matter
    ["S/N: QN0730411", "QN0730411", "pass"], // a label's "S/N:" is not part of the serial
    ["Serial No. 7F2A 0041", "7f2a0041", "pass"],
    ["SN 4471A09", "sn4471a09", "fail"], // "SN" with a space is a label; glued on, it is part of the serial
    ["QN0730411", "QN0730412", "fail"], // the card belongs to another unit
    ["QN07304I1", "QN0730411", "fail"], // I and 1 look alike but are different serials
  ])("unit %j, card %j → %s", (serial, card, status) => {
    const r = checkInverterSerial(inverterUnit(serial, card), 2023);
    expect(r).toMatchObject({
      status,
      reading: "recorded",
      kind: "inverter-serial",
      id: "inverter-serial:inv-1",
      clause: "inverter maker's activation card",
    });
  });

  test("a mismatch names both serials and says not to activate", () => {
    const r = checkInverterSerial(inverterUnit("QN0730411", "QN0730412"), 2023);
    expect(r.message).toContain("QN0730412");
    expect(r.message).toContain("QN0730411");
    expect(r.fix).toMatch(/Do not activate with this card/);
  });

  test.each([
    [null, null, /the serial on the unit's label and the one on its activation card/],
    ["QN0730411", "", /the serial printed on the activation card/],
    ["  ", "QN0730411", /the serial on the unit's label/],
  ])("unit %j, card %j → not recorded yet (warn)", (serial, card, message) => {
    const r = checkInverterSerial(inverterUnit(serial, card), 2023);
    expect(r).toMatchObject({ status: "warn", reading: "missing" });
    expect(r.message).toMatch(message);
  });

  test("a serial of fewer than 4 letters and digits is not a serial", () => {
    expect(checkInverterSerial(inverterUnit("Q1", "Q1"), 2023)).toMatchObject({ status: "fail", reading: "invalid" });
  });

  test.each([
    [" s/n:qn-0730 411 ", "QN0730411"],
    ["SN: 12345", "12345"],
    ["SN12345", "SN12345"],
    ["Serial number 7F2A", "7F2A"],
  ])("normalizeSerial(%j) = %j", (text, expected) => {
    expect(normalizeSerial(text)).toBe(expected);
  });
});
