import { describe, expect, test } from "vitest";
import { checkRapidShutdown, rapidShutdownMethod } from "@/lib/engineering";
import { coldSite, microDesign, quillonShutdown, stringDesign } from "../fixtures";

const strings = (n: number) => [{ id: "S1", inverterId: "inv-1", modulesInSeries: n }];

describe("690.12 rapid shutdown (REFERENCE.md)", () => {
  // Common practice: about 1 V per device in shutdown → 10 devices ≈ 10 V ≤ 30 V outside the array boundary
  test("10 shutdown devices in series hold about 10 V: within 30 V", () => {
    const [r] = checkRapidShutdown(stringDesign({ strings: strings(10) }), coldSite);
    expect(r).toMatchObject({ status: "pass", value: 10, limit: 30 });
    expect(r!.clause).toBe("NEC 2020 690.12(B)(1), 690.12(B)(2); 1 V per device in shutdown" /* about 1 V per device: common practice */);
  });

  test.each([
    [30, "pass"], // exactly 30 V
    [31, "warn"], // inside-boundary 80 V only
    [80, "warn"],
    [81, "fail"],
  ])("%d devices → %s", (n, status) => {
    expect(checkRapidShutdown(stringDesign({ strings: strings(n) }), coldSite)[0]!.status).toBe(status);
  });

  test("a device holding 0.6 V: 10 × 0.6 = 6 V", () => {
    const design = stringDesign({ strings: strings(10), moduleLevelDevice: { ...quillonShutdown, shutdownOutputV: 0.6 } });
    expect(checkRapidShutdown(design, coldSite)[0]!.value).toBe(6);
  });

  test.each([
    [2017, false],
    [2020, true],
    [2023, true],
  ] as const)("no shutdown means fails; NEC %d fix mentions UL 3741: %s", (edition, mentions) => {
    const [r] = checkRapidShutdown(stringDesign({ moduleLevelDevice: undefined }), { ...coldSite, necEdition: edition });
    expect(r!.status).toBe("fail");
    expect(r!.fix!.includes("UL 3741")).toBe(mentions);
  });

  test.each([
    ["micro-inverters", microDesign()],
    ["listed-system", stringDesign({ moduleLevelDevice: undefined, listedRapidShutdownSystem: true })],
  ] as const)("%s meets it", (method, design) => {
    expect(rapidShutdownMethod(design)).toBe(method);
    expect(checkRapidShutdown(design, coldSite)[0]!.status).toBe("pass");
  });

  test("a ground-mounted array is not on a building", () => {
    const [r] = checkRapidShutdown(stringDesign({ mount: "ground", moduleLevelDevice: undefined }), coldSite);
    expect(r).toMatchObject({ status: "pass" });
    expect(r!.message).toMatch(/ground-mounted/);
  });
});
