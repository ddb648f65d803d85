import { describe, expect, test } from "vitest";
import { article, atLeast, atMost, countAgrees, fmt, makeCheck, plural, withArticle, worstStatus } from "@/lib/engineering/check-result";

const base = { id: "x", title: "X", status: "pass" as const, unit: "V", clause: "NEC 2020 690.7(A)", edition: 2020 as const, message: "m" };

describe("check results", () => {
  test("values and limits are rounded to 2 decimals; an undefined fix is left out", () => {
    const r = makeCheck({ ...base, value: 450.40000000000003, limit: 19.0625, fix: undefined });
    expect(r.value).toBe(450.4);
    expect(r.limit).toBe(19.06);
    expect("fix" in r).toBe(false);
  });

  test.each([NaN, Infinity])("a %d value never reaches a result", (bad) => {
    expect(() => makeCheck({ ...base, value: bad, limit: 1 })).toThrow(/non-finite/);
  });

  test("floating-point products count as exactly at the limit", () => {
    expect(atMost(1.25 * 32 + 200, (200 * 12) / 10)).toBe(true);
    expect(atMost(0.1 + 0.2, 0.3)).toBe(true);
    expect(atMost(240.01, 240)).toBe(false);
    expect(atLeast(39.99, 40)).toBe(false);
  });

  test.each([
    [["pass", "pass"], "pass"],
    [["pass", "warn"], "warn"],
    [["warn", "fail", "pass"], "fail"],
    [[], "pass"],
  ] as const)("worst of %j is %s", (statuses, worst) => {
    expect(worstStatus([...statuses])).toBe(worst);
  });

  test("numbers and counts read as sentences", () => {
    expect(fmt(45.04)).toBe("45.04");
    expect(fmt(600)).toBe("600");
    expect(plural(1, "string")).toBe("1 string");
    expect(plural(3, "string")).toBe("3 strings");
  });
});

// Messages read as English: articles by sound, plurals and verbs that agree (issue 13 item 6).
describe("wording helpers", () => {
  test.each([
    ["inverter", "an"],
    ["unit", "a"],
    ["8 AWG", "an"],
    ["10 AWG", "a"],
    ["11 A", "an"],
    ["18 A", "an"],
    ["110 A", "a"],
    ["80 V", "an"],
    ["800 A", "an"],
    ["EMT raceway", "an"],
    ["MC cable", "an"],
    ["PV breaker", "a"],
    ["USE-2 conductor", "a"],
    ["XHHW-2 conductor", "an"],
    ["hour", "an"],
  ])("%s takes %j", (word, a) => {
    expect(article(word)).toBe(a);
    expect(withArticle(word)).toBe(`${a} ${word}`);
  });

  test.each([
    [1, "1 string feeds"],
    [2, "2 strings feed"],
    [0, "0 strings feed"],
  ])("%d → %j", (n, text) => {
    expect(countAgrees(n, "string", "feeds", "feed")).toBe(text);
  });

  test("irregular plurals are named", () => {
    expect(plural(2, "busbar")).toBe("2 busbars");
    expect(plural(3, "branch", "branches")).toBe("3 branches");
    expect(plural(1, "branch", "branches")).toBe("1 branch");
  });
});
