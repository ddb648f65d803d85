import { describe, expect, test } from "vitest";
import { DesignInputError, checkDevicePairing, type DevicePairingReading } from "@/lib/engineering";

// Basis: the design's device count (one device per module). Devices join the inverter one by one
// over minutes, so fewer found than installed waits (not a pass, not a fault); more than installed
// fails: the inverter found another system's devices or the count is wrong (our rule).
const pairing = (found: number | null, strings: DevicePairingReading["strings"] = []): DevicePairingReading => ({
  word: "optimizers",
  installed: 30,
  found,
  strings,
});

describe("module-level devices found against installed", () => {
  test.each([
    [30, "pass", false],
    [26, "warn", true], // the example: 26 of 30 found means wait or scan again, not a pass
    [29, "warn", true],
    [0, "warn", true],
    [31, "fail", false],
  ])("30 installed, %d found → %s (waiting: %s)", (found, status, waiting) => {
    const [r] = checkDevicePairing(pairing(found), 2023);
    expect(r).toMatchObject({
      status,
      value: found,
      limit: 30,
      kind: "device-pairing",
      id: "device-pairing",
      reading: "recorded",
      clause: "the design's device count",
    });
    expect(Boolean(r!.waiting)).toBe(waiting);
  });

  test("a shortfall tells the crew to wait or scan again", () => {
    const [r] = checkDevicePairing(pairing(26), 2023);
    expect(r!.message).toContain("26 of 30 optimizers in the system found");
    expect(r!.message).toMatch(/Not a pass: wait a few minutes/);
  });

  test.each([
    [null, "warn", "missing"],
    [26.5, "fail", "invalid"],
    [-1, "fail", "invalid"],
  ])("found %j → %s (%s)", (found, status, state) => {
    expect(checkDevicePairing(pairing(found), 2023)[0]).toMatchObject({ status, reading: state });
  });

  test("per string where the inverter shows it; a string left blank is not asked for", () => {
    const results = checkDevicePairing(
      pairing(28, [
        { id: "S1", installed: 15, found: 15 },
        { id: "S2", installed: 15, found: 13 },
        { id: "S3", installed: 15, found: null },
      ]),
      2023,
    );
    expect(results.map((r) => [r.id, r.status])).toEqual([
      ["device-pairing", "warn"],
      ["device-pairing:S1", "pass"],
      ["device-pairing:S2", "warn"],
    ]);
    expect(results[2]!.message).toContain("13 of 15 optimizers on string S2 found");
  });

  test("installed must be a whole number of at least one", () => {
    expect(() => checkDevicePairing({ ...pairing(1), installed: 0 }, 2023)).toThrow(DesignInputError);
  });
});
