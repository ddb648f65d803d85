import { readdirSync, readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { z } from "zod";
import * as apiToken from "@/lib/schemas/api-token";
import * as commissioning from "@/lib/schemas/commissioning";
import * as design from "@/lib/schemas/design";
import * as equipment from "@/lib/schemas/equipment";
import * as feeSchedule from "@/lib/schemas/fee-schedule";
import * as organization from "@/lib/schemas/organization";
import * as packet from "@/lib/schemas/packet";
import * as payment from "@/lib/schemas/payment";
import * as project from "@/lib/schemas/project";
import * as referenceData from "@/lib/schemas/reference-data";
import * as shareLink from "@/lib/schemas/share-link";
import * as user from "@/lib/schemas/user";
import * as document from "@/lib/design/document";
import { findUnstorableInput, isStorableText, MAX_INPUT_DEPTH, UNSTORABLE_TEXT_MESSAGE } from "@/lib/schemas/fields";

// Every input schema meets hostile input: parsing answers success or a list of issues, never throws.
// A throw inside a schema becomes a 500 in the route or action that parses it.
const MODULES = {
  apiToken,
  commissioning,
  design,
  equipment,
  feeSchedule,
  organization,
  packet,
  payment,
  project,
  referenceData,
  shareLink,
  user,
  document,
};
const SCHEMAS = Object.entries(MODULES).flatMap(([module, exports]) =>
  Object.entries(exports)
    .filter(([, value]) => value instanceof z.ZodType)
    .map(([name, schema]) => ({ name: `${module}.${name}`, schema: schema as z.ZodType })),
);

const PROTOTYPE_KEYS = ["constructor", "__proto__", "toString", "valueOf", "hasOwnProperty", "prototype"];
const hostileString = fc.oneof(
  fc.string(),
  fc.constantFrom(
    "\u0000",
    "a\u0000b",
    "\ud800",
    "x\udfffy",
    "",
    " ",
    "NaN",
    "Infinity",
    "-0",
    "1e400",
    "null",
    "<script>",
    "x".repeat(100_000),
  ),
);
const hostileNumber = fc.oneof(fc.double(), fc.constantFrom(Number.NaN, Infinity, -Infinity, -0, 1e308, Number.MAX_SAFE_INTEGER + 2));
const leaf = fc.oneof(hostileString, hostileNumber, fc.boolean(), fc.constant(null), fc.constant(undefined));
const key = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom(...PROTOTYPE_KEYS));
const { value: hostile } = fc.letrec((tie) => ({
  value: fc.oneof({ depthSize: "small", withCrossShrink: true }, leaf, tie("array"), tie("object")),
  array: fc.array(tie("value"), { maxLength: 4 }),
  object: fc.dictionary(key, tie("value"), { maxKeys: 5 }),
}));

/** Nested arrays a thousand deep: recursion must end in issues, not a stack overflow. */
const deep = (depth: number): unknown => {
  let value: unknown = null;
  for (let i = 0; i < depth; i++) value = [value];
  return value;
};

function parsesWithoutThrowing(schema: z.ZodType, input: unknown) {
  const result = schema.safeParse(input);
  if (!result.success) for (const issue of result.error.issues) expect(typeof issue.message).toBe("string");
}

describe("input schemas answer hostile input with issues, never a throw", () => {
  test("the schema list is not empty", () => expect(SCHEMAS.length).toBeGreaterThan(20));

  test.each(SCHEMAS)("$name: fixed hostile shapes", ({ schema }) => {
    const shapes: unknown[] = [
      null,
      undefined,
      0,
      "",
      [],
      [null],
      {},
      { specs: null },
      { lines: [null] },
      { constructor: 1, __proto__: { polluted: true }, toString: "x" },
      JSON.parse('{"__proto__": {"polluted": true}, "constructor": {"prototype": 1}}'),
      deep(1000),
      { a: deep(1000) },
      Object.fromEntries(Array.from({ length: 2000 }, (_, i) => [`k${i}`, i])),
    ];
    for (const shape of shapes) parsesWithoutThrowing(schema, shape);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  test.each(SCHEMAS)("$name: generated hostile values", ({ schema }) => {
    fc.assert(
      fc.property(hostile, (input) => parsesWithoutThrowing(schema, input)),
      { numRuns: 300, seed: 20261205 },
    );
  });
});

describe("text PostgreSQL cannot store is a field error, not a server error", () => {
  // PostgreSQL docs, "Character Types": the character with code zero cannot be stored in text; JSON's
  // \u0000 is refused in jsonb ("JSON Types"). An unpaired surrogate has no UTF-8 encoding (Unicode §3.9).
  const unstorable = ["a\u0000b", "\u0000", "lone \ud83d high", "lone \ude00 low", "reversed \ude00\ud83d"];
  const storable = ["plain", "emoji 🔌 pair", "accents é ñ", "tab\tand newline\n"];

  test.each(unstorable)("refuses %j", (text) => {
    expect(isStorableText(text)).toBe(false);
    const result = project.ProjectInput.safeParse({
      customerName: text,
      street: "44 Cinder Lane",
      city: "Testville",
      state: "CO",
      postalCode: "80001",
    });
    expect(result.success).toBe(false);
    expect(result.error!.issues.find((i) => i.path[0] === "customerName")?.message).toBe(UNSTORABLE_TEXT_MESSAGE);
  });

  test.each(storable)("keeps %j", (text) => expect(isStorableText(text)).toBe(true));

  test.each([
    [{ note: "ok", list: ["fine", "bad\u0000"] }, "list[1]"],
    [{ deep: { "key\u0000": 1 } }, "deep"],
    [{ a: { b: { c: "\ud800" } } }, "a.b.c"],
    ["\u0000", "_form"],
  ])("finds the unstorable part of %j at %s", (input, path) => {
    expect(findUnstorableInput(input)).toEqual({ path, message: UNSTORABLE_TEXT_MESSAGE });
  });

  test("refuses nesting deeper than any real input, without overflowing the stack", () => {
    expect(findUnstorableInput(deep(100_000))?.message).toMatch(/nested more than/);
    expect(findUnstorableInput(deep(MAX_INPUT_DEPTH - 1))).toBeNull();
  });
});

test("every input schema builds its strings on safeString, so none lets unstorable text through", () => {
  const files = [
    ...readdirSync("lib/schemas")
      .filter((f) => f.endsWith(".ts") && f !== "fields.ts")
      .map((f) => `lib/schemas/${f}`),
    "lib/design/document.ts",
  ];
  const offenders = files.filter((file) => /\bz\s*\.\s*string\s*\(/.test(readFileSync(file, "utf8")));
  expect(offenders).toEqual([]);
});
