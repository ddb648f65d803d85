import fc from "fast-check";
import type { APIRequestContext } from "@playwright/test";
import { DEMO } from "../support/session";
import { actionIds, callAction, clientFor } from "../support/api";
import { expect, test } from "./fixtures";
import { ACTIONS, ROUTES, type Entry } from "./route-matrix";

// Hostile bodies sent, by someone who may use it, to every JSON route and every server action: wrong
// types, null, huge strings, NUL and unpaired surrogates, prototype keys, deep nesting, NaN and
// Infinity, bodies past the size limit. Every answer is a readable 400/413/415/422 (or, for an action,
// a refusal the form can show); a 5xx or an action's INTERNAL fails the test.

const PROTOTYPE_KEYS = ["constructor", "__proto__", "toString", "valueOf", "hasOwnProperty"];
const hostileString = fc.oneof(
  fc.string(),
  fc.constantFrom("\u0000", "a\u0000b", "\ud800", "x\udfffy", "", "NaN", "1e400", "<script>alert(1)</script>", "x".repeat(70_000)),
);
const leaf = fc.oneof(hostileString, fc.double(), fc.integer(), fc.boolean(), fc.constant(null));
const key = fc.oneof(fc.string({ maxLength: 10 }), fc.constantFrom(...PROTOTYPE_KEYS, "projectId", "kind", "draft", "values", "lines"));
const { value: hostile } = fc.letrec((tie) => ({
  value: fc.oneof({ depthSize: "small" }, leaf, tie("array"), tie("object")),
  array: fc.array(tie("value"), { maxLength: 4 }),
  object: fc.dictionary(key, tie("value"), { maxKeys: 6 }),
}));

const nested = (depth: number) => "[".repeat(depth) + "]".repeat(depth);
/** Raw bodies that are not what any client sends. */
const RAW = [
  "",
  "not json",
  "{",
  '{"a": NaN}',
  '{"a": Infinity}',
  '{"a": -Infinity}',
  nested(5_000),
  JSON.stringify({ note: "x".repeat(200_000) }),
  '{"__proto__": {"admin": true}, "constructor": {"prototype": {"admin": true}}}',
  '"just a string"',
  "null",
  "[]",
  "\u0000",
  '{"text": "\\u0000"}',
  '{"text": "\\ud800"}',
];

const RUNS_PER_WAY_IN = 24;
const samples = (seed: number) => fc.sample(hostile, { seed, numRuns: RUNS_PER_WAY_IN });

/** Someone of the first company who may use the entry. */
function ownerOf(entry: Entry): "coordinator" | "admin" {
  return entry.roles.includes("coordinator") ? "coordinator" : "admin";
}

test.describe.configure({ mode: "serial" });

const clients = new Map<string, APIRequestContext>();
const tally = { sent: 0, serverErrors: [] as string[] };

test.beforeAll(async () => {
  clients.set("coordinator", await clientFor(DEMO.coordinator));
  clients.set("admin", await clientFor(DEMO.admin));
});

test.afterAll(async () => {
  for (const client of clients.values()) await client.dispose();
  console.log(`malformed input: ${tally.sent} hostile requests, ${tally.serverErrors.length} server errors`);
});

function record(what: string, status: number, detail = "") {
  tally.sent++;
  if (status >= 500) tally.serverErrors.push(`${what}: ${status} ${detail.slice(0, 200)}`);
}

test("JSON routes answer hostile bodies with a readable 4xx", async ({ targets }) => {
  test.setTimeout(300_000);
  let seed = 1;
  for (const [key, entry] of Object.entries(ROUTES)) {
    const method = key.split(" ")[0]!;
    if (entry.exempt || entry.upload || method === "GET" || !entry.body) continue;
    const client = clients.get(ownerOf(entry))!;
    const url = entry.url!(targets);
    const bodies = [...RAW.map((raw) => Buffer.from(raw)), ...samples(seed++).map((value) => Buffer.from(JSON.stringify(value) ?? "null"))];
    for (const data of bodies) {
      const res = await client.fetch(url, { method, headers: { "content-type": "application/json" }, data });
      const text = await res.text();
      record(`${key} ${data.subarray(0, 60).toString()}`, res.status(), text);
      expect(res.status(), `${key} with ${data.subarray(0, 80).toString()}: ${text.slice(0, 200)}`).toBeLessThan(500);
      if (res.status() >= 400) expect(JSON.parse(text).error.message, `${key}: a message the caller can read`).toMatch(/\w/);
    }
  }
  expect(tally.serverErrors).toEqual([]);
});

test("query strings of list routes answer hostile values with a readable 4xx", async () => {
  const client = clients.get("coordinator")!;
  const values = [
    "",
    "-1",
    "0",
    "1e400",
    "NaN",
    "Infinity",
    "%00",
    "\u0000",
    "x".repeat(5_000),
    "constructor",
    "__proto__",
    "[]",
    "{}",
    "2026-02-30",
  ];
  const reports = ["/api/v1/reports/cycle-times", "/api/v1/reports/filings", "/api/v1/reports/payments"];
  for (const path of ["/api/v1/projects", "/api/v1/equipment", ...reports]) {
    for (const name of [
      "page",
      "pageSize",
      "sort",
      "direction",
      "q",
      "stage",
      "kind",
      "groupBy",
      "from",
      "to",
      "format",
      "constructor",
      "__proto__",
    ]) {
      for (const value of values) {
        const res = await client.get(`${path}?${name}=${encodeURIComponent(value)}`);
        record(`${path}?${name}`, res.status(), await res.text());
        expect(res.status(), `${path}?${name}=${value.slice(0, 20)}`).toBeLessThan(500);
      }
    }
  }
});

test("every project sort, both ways, answers", async () => {
  // Defect: sorting by stage was a 500.
  const client = clients.get("coordinator")!;
  for (const sort of ["number", "customerName", "city", "stage", "daysInStage", "createdAt"]) {
    for (const direction of ["asc", "desc"]) {
      const res = await client.get(`/api/v1/projects?sort=${sort}&direction=${direction}&pageSize=5`);
      expect(res.status(), `sort=${sort}&direction=${direction}`).toBe(200);
    }
  }
  const stages = (await (await client.get("/api/v1/projects?sort=stage&direction=asc&pageSize=100")).json()).items.map(
    (p: { stage: string }) => p.stage,
  );
  expect(stages.indexOf("draft")).toBeLessThan(stages.lastIndexOf("closed"));
});

test("server actions answer hostile arguments with a refusal the form can show, never a server error", async ({ targets }) => {
  test.setTimeout(300_000);
  const ids = actionIds();
  let seed = 1000;
  for (const [key, entry] of Object.entries(ACTIONS)) {
    if (entry.exempt) continue;
    const client = clients.get(ownerOf(entry))!;
    const page = entry.page!(targets);
    const id = ids.get(key)!;
    for (const value of samples(seed++)) {
      const answer = await callAction(client, { id, page, args: [value] });
      record(`${key} ${JSON.stringify(value)?.slice(0, 60)}`, answer.status, answer.text);
      expect(answer.status, `${key}: ${answer.text.slice(0, 200)}`).toBeLessThan(500);
      expect(answer.result?.code, `${key} with ${JSON.stringify(value)?.slice(0, 80)}`).not.toBe("INTERNAL");
    }
  }
  expect(tally.serverErrors).toEqual([]);
});

test("the framework's own parsing of actions is screened: foreign origin 403, oversize 413, unreadable 400, odd type 415", async ({
  targets,
}) => {
  // Defect: each of these was a 500 from inside the framework.
  const ids = actionIds();
  const id = ids.get("app/(app)/projects/actions.ts#changeStageAction")!;
  const client = clients.get("coordinator")!;
  const page = `/projects/${targets.projectId}`;
  const cases: { what: string; args: string | Buffer; headers?: Record<string, string>; status: number }[] = [
    { what: "foreign origin", args: "[{}]", headers: { origin: "http://evil.example" }, status: 403 },
    { what: "same-site but other origin", args: "[{}]", headers: { origin: "http://127.0.0.1:1" }, status: 403 },
    { what: "no origin", args: "[{}]", headers: { origin: "" }, status: 403 },
    { what: "oversize, declared", args: Buffer.alloc(1_100_000, "a"), status: 413 },
    { what: "not JSON", args: "not json", status: 400 },
    { what: "a reference to a part that is not there", args: '[{"projectId":"$@7","toStage":"$Q1"}]', status: 400 },
    {
      what: "multipart, which no action takes",
      args: "garbage",
      headers: { "content-type": "multipart/form-data; boundary=zz" },
      status: 415,
    },
    { what: "unknown content type", args: "[{}]", headers: { "content-type": "application/x-made-up" }, status: 415 },
  ];
  for (const c of cases) {
    const answer = await callAction(client, { id, page, args: c.args, headers: c.headers });
    record(`action ${c.what}`, answer.status, answer.text);
    expect(answer.status, `${c.what}: ${answer.text.slice(0, 200)}`).toBe(c.status);
  }
});

test("addresses with a broken percent-escape answer 400", async ({ targets }) => {
  // Defect: a broken escape in an API path was a 500.
  const client = clients.get("coordinator")!;
  for (const path of [
    "/api/v1/projects/%E0%A4%A",
    `/api/v1/projects/${targets.projectId}/files/%zz`,
    "/projects/%E0%A4%A",
    "/settings/equipment/%",
    "/share/%E0%A4%A",
  ]) {
    const res = await client.get(path, { maxRedirects: 0 });
    record(`GET ${path}`, res.status());
    expect(res.status(), path).toBe(400);
  }
});
