import { expect, test, type APIRequestContext } from "@playwright/test";
import Papa from "papaparse";
import { clientFor } from "../support/api";
import { DEMO, pageFor } from "../support/session";

// The reports API checked against a calculation made here from the filings API alone: the median and
// 90th percentile by linear interpolation between neighbours (PostgreSQL 16 manual §9.21, percentile_cont;
// positions (n − 1)p counted from 0), shares and means by hand.
type Filing = {
  authority: { kind: string; id: string };
  status: string;
  submittedAt: string | null;
  decidedAt: string | null;
  rounds: unknown[];
  inspections: { result: string | null; reinspectionOf: string | null }[];
};
type Row = {
  authorityId: string;
  name: string;
  filings: number;
  decided: number;
  medianDays: number | null;
  p90Days: number | null;
  firstPassRate: number | null;
  meanRounds: number | null;
  inspectionPassRate: number | null;
};

const ALL_TIME = "from=2000-01-01&to=2099-12-31";
const days = (from: string, to: string) => (Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000;
function percentile(values: number[], p: number): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const at = (sorted.length - 1) * p;
  const low = Math.floor(at);
  return sorted[low]! + (at - low) * ((sorted[low + 1] ?? sorted[low]!) - sorted[low]!);
}

function byHand(filings: Filing[]) {
  const decided = filings.filter((f) => f.decidedAt && f.submittedAt);
  const spans = decided.map((f) => days(f.submittedAt!, f.decidedAt!));
  const firsts = filings
    .flatMap((f) => f.inspections)
    .filter((i) => !i.reinspectionOf && ["passed", "failed", "partial"].includes(i.result ?? ""));
  return {
    filings: filings.length,
    decided: decided.length,
    medianDays: percentile(spans, 0.5),
    p90Days: percentile(spans, 0.9),
    firstPassRate: decided.length ? decided.filter((f) => f.status === "approved" && f.rounds.length === 0).length / decided.length : null,
    meanRounds: filings.length ? filings.reduce((s, f) => s + f.rounds.length, 0) / filings.length : null,
    inspectionPassRate: firsts.length ? firsts.filter((i) => i.result === "passed").length / firsts.length : null,
  };
}

async function everyFiling(client: APIRequestContext): Promise<Filing[]> {
  const { items } = await (await client.get("/api/v1/projects?pageSize=100")).json();
  const answers = await Promise.all(
    items.map(async (p: { id: string }) => (await (await client.get(`/api/v1/projects/${p.id}/filings`)).json()).filings as Filing[]),
  );
  return answers.flat();
}

const parseCsv = (text: string) => Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });

test("coordinator reads each demo AHJ's and utility's days to a decision, and they agree with a hand calculation", async () => {
  const dana = await clientFor(DEMO.coordinator);
  const filings = (await everyFiling(dana)).filter((f) => f.submittedAt);
  for (const [groupBy, kind] of [
    ["ahj", "ahj"],
    ["utility", "utility"],
  ] as const) {
    const res = await dana.get(`/api/v1/reports/cycle-times?groupBy=${groupBy}&${ALL_TIME}`);
    expect(res.status()).toBe(200);
    const { rows } = (await res.json()) as { rows: Row[] };
    expect(rows.length, `${groupBy} rows`).toBeGreaterThanOrEqual(2);
    for (const row of rows) {
      const expected = byHand(filings.filter((f) => f.authority.kind === kind && f.authority.id === row.authorityId));
      expect(typeof row.medianDays, `${row.name} has a median`).toBe("number");
      expect(row).toMatchObject({ filings: expected.filings, decided: expected.decided });
      for (const key of ["medianDays", "p90Days", "firstPassRate", "meanRounds", "inspectionPassRate"] as const) {
        if (expected[key] === null) expect(row[key], `${row.name} ${key}`).toBeNull();
        else expect(row[key], `${row.name} ${key}`).toBeCloseTo(expected[key]!, 1);
      }
    }
  }
  expect((await dana.get("/api/v1/reports/cycle-times?groupBy=county")).status()).toBe(422);
});

test("installer is refused reports and spreadsheets; the Reports page is not in their menu", async ({ browser }) => {
  const luis = await clientFor(DEMO.installer);
  for (const url of ["/api/v1/reports/cycle-times", "/api/v1/reports/filings", "/api/v1/reports/payments", "/api/v1/projects?format=csv"])
    expect((await luis.get(url)).status(), url).toBe(403);
  expect((await luis.get("/api/v1/projects", { headers: { accept: "text/csv" } })).status()).toBe(403);
  const page = await pageFor(browser, DEMO.installer);
  await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Reports" })).toHaveCount(0);
});

test("coordinator downloads the demo projects as CSV with the list's columns and every project", async ({ browser }) => {
  const page = await pageFor(browser, DEMO.coordinator);
  const { total } = await (await page.request.get("/api/v1/projects?pageSize=1")).json();
  expect(total).toBeGreaterThanOrEqual(28);
  const download = page.waitForEvent("download");
  await page.getByRole("link", { name: "Download CSV" }).click();
  const file = await download;
  const text = await (await import("node:fs/promises")).readFile((await file.path())!, "utf8");
  const parsed = parseCsv(text);
  expect(parsed.errors).toEqual([]);
  expect(parsed.meta.fields?.slice(0, 9)).toEqual([
    "No.",
    "Customer",
    "Customer e-mail",
    "Customer phone",
    "Street",
    "City",
    "State",
    "ZIP",
    "AHJ",
  ]);
  expect(parsed.meta.fields).toEqual(
    expect.arrayContaining([
      "Stage",
      "Days in stage",
      "Waiting on",
      "Waiting since",
      "Permit status",
      "Interconnection status",
      "Utility account",
    ]),
  );
  expect(parsed.data).toHaveLength(total);
  for (const row of parsed.data) expect(row["No."]).toMatch(/^\d+$/);
  // The filters travel with the download: only the projects waiting on the AHJ.
  const ahj = await page.request.get("/api/v1/projects?format=csv&waitingOn=ahj");
  expect(ahj.headers()["content-type"]).toBe("text/csv; charset=utf-8");
  const onlyAhj = parseCsv(await ahj.text()).data;
  expect(onlyAhj.length).toBeGreaterThan(0);
  expect(new Set(onlyAhj.map((r) => r["Waiting on"]))).toEqual(new Set(["AHJ"]));
});

test("coordinator sees the Reports page with a row for each AHJ and utility and the bookkeeping downloads", async ({ browser }) => {
  const page = await pageFor(browser, DEMO.coordinator);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Reports" }).click();
  await expect(page.getByRole("heading", { name: "Reports", level: 1 })).toBeVisible();
  await expect(page.getByTestId("cycle-row")).toHaveCount(5);
  await expect(page.getByRole("figure", { name: "Days to a decision by AHJ" })).toBeVisible();
  const payments = await page.request.get(page.url().replace(/\/reports.*$/, "/api/v1/reports/payments?" + ALL_TIME));
  expect(payments.status()).toBe(200);
  const ledger = parseCsv(await payments.text());
  expect(ledger.meta.fields).toEqual([
    "Date",
    "Entry",
    "Project no.",
    "Customer",
    "Receipt number",
    "Processor reference",
    "Description",
    "Amount",
    "Currency",
    "Status",
  ]);
  for (const row of ledger.data) {
    expect(row.Date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(row.Amount).toMatch(/^-?\d+\.\d{2}$/);
    expect(row.Currency).toBe("USD");
  }
  const filings = parseCsv(await (await page.request.get(`/api/v1/reports/filings?${ALL_TIME}`)).text());
  expect(filings.data.length).toBeGreaterThan(0);
  for (const row of filings.data) expect(row.Submitted).toMatch(/^\d{4}-\d{2}-\d{2}$/);
});

test("coordinator imports a 10-row spreadsheet with two bad rows: eight are imported, both problems named, and a second import adds none", async ({
  browser,
}) => {
  // The second company, so that the first company's 28 demo projects stay as other tests expect them.
  const page = await pageFor(browser, "owen@harrowgate.example");
  const { items } = await (await page.request.get("/api/v1/projects?pageSize=1")).json();
  const ahj = items[0].jurisdiction.name as string;
  const stamp = Date.now().toString(36);
  const rows = Array.from({ length: 10 }, (_, i) => [
    `Import ${stamp} ${i + 1}`,
    `${i + 1} Sedge Court`,
    "Harrow Flats",
    "CO",
    `8120${i}`,
    ahj,
    `IMP-${stamp}-${i + 1}`,
    "200",
    "200",
  ]);
  rows[2]![4] = "812"; // line 4: a ZIP code too short
  rows[6]![5] = "Nowhere Township"; // line 8: an AHJ the company does not have
  const csv = Papa.unparse({
    fields: ["Customer", "Address", "Town", "State", "Zip", "Jurisdiction", "Account number", "Main breaker", "Busbar"],
    data: rows,
  });

  await page.goto("/projects/import");
  await page.getByLabel("Spreadsheet (.csv)").setInputFiles({ name: "projects.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  await expect(page.getByLabel("Customer (required)")).toHaveValue("0");
  await page.getByRole("button", { name: "Check every row" }).click();
  await expect(page.getByTestId("import-counts")).toHaveText(
    "8 ready to import, 2 with a problem (they will not be imported), 0 already in Ohmstead.",
  );
  await page.getByRole("button", { name: "Import 8 projects" }).click();
  await expect(page.getByTestId("import-counts")).toHaveText("8 imported, 2 not imported because of a problem, 0 already in Ohmstead.");
  const refused = page.locator('tr[data-status="problem"]');
  await expect(refused).toHaveCount(2);
  await expect(refused.nth(0)).toContainText("ZIP: Use a 5-digit ZIP code");
  await expect(refused.nth(1)).toContainText("AHJ: “Nowhere Township” is not one of your AHJs");
  const imported = await (await page.request.get(`/api/v1/projects?pageSize=100&q=${encodeURIComponent(`Import ${stamp}`)}`)).json();
  expect(imported.total).toBe(8);

  await page.goto("/projects/import");
  await page.getByLabel("Spreadsheet (.csv)").setInputFiles({ name: "projects.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  await page.getByRole("button", { name: "Check every row" }).click();
  await expect(page.getByTestId("import-counts")).toHaveText(
    "0 ready to import, 2 with a problem (they will not be imported), 8 already in Ohmstead.",
  );
  await expect(page.getByRole("button", { name: /^Import \d/ })).toHaveCount(0);
});
