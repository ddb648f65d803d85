import { expect, test } from "@playwright/test";
import { DEMO, pageFor } from "../support/session";

// A tiny but well-formed start of a PDF: the server checks the marker, not the layout.
const DATASHEET = {
  name: "mv-415-datasheet.pdf",
  mimeType: "application/pdf",
  buffer: Buffer.from("%PDF-1.4\n% invented data sheet\n1 0 obj << >> endobj\n%%EOF\n"),
};

test("admin adds a module with a data sheet and a coordinator sees it", async ({ browser }) => {
  const model = `MV-415 Duo ${Date.now().toString(36)}`;
  const admin = await pageFor(browser, DEMO.admin);
  await admin.goto("/settings");
  await admin.getByRole("link", { name: "Equipment catalog" }).click();
  await admin.getByRole("link", { name: "Add a PV module" }).click();

  // A bad submit keeps every typed value and puts each error next to its field.
  await admin.getByLabel("Maker").fill("Merrowvale");
  await admin.getByLabel("Model").fill(model);
  await admin.getByLabel("Listing").fill("UL 61730");
  for (const [label, value] of [
    ["Pmax (W)", "415"],
    ["Voc (V)", "38.1"],
    ["Vmp (V)", "39.0"],
    ["Isc (A)", "13.92"],
    ["Imp (A)", "13.11"],
    ["Voc temperature coefficient", "-0.26"],
    ["Length (in)", "67.8"],
    ["Width (in)", "44.6"],
  ] as const) {
    await admin.getByLabel(label, { exact: true }).fill(value);
  }
  await admin.getByRole("button", { name: "Add to catalog" }).click();
  await expect(admin.getByText("Vmp must be lower than Voc")).toBeVisible();
  await expect(admin.getByText("Weight is required")).toBeVisible();
  await expect(admin.getByLabel("Model")).toHaveValue(model);
  await expect(admin.getByLabel("Isc (A)")).toHaveValue("13.92");

  await admin.getByLabel("Vmp (V)").fill("31.7");
  await admin.getByLabel("Weight (lb)").fill("46.9");
  await admin.getByRole("button", { name: "Add to catalog" }).click();
  await expect(admin.getByText("Added to the catalog. Attach the data sheet below.")).toBeVisible();

  await admin.getByLabel("Data sheet (PDF)").setInputFiles(DATASHEET);
  await admin.getByRole("button", { name: "Upload" }).click();
  await expect(admin.getByText(`${DATASHEET.name} is stored as the data sheet.`)).toBeVisible();
  await expect(admin.getByRole("link", { name: DATASHEET.name })).toBeVisible();

  const coordinator = await pageFor(browser, DEMO.coordinator);
  await coordinator.goto("/settings");
  await coordinator.getByRole("link", { name: "Equipment catalog" }).click();
  const row = coordinator.getByRole("row", { name: new RegExp(`Merrowvale ${model}`) });
  await expect(row).toContainText("415 W");
  await expect(row).toContainText("38.1 V");
  await expect(row).toContainText("13.92 A");
  await expect(coordinator.getByRole("link", { name: "Add a PV module" })).toHaveCount(0);
  await expect(row.getByRole("link", { name: `Edit Merrowvale ${model}` })).toHaveCount(0);

  // The link goes through the authorized route, which hands out a short-lived storage link.
  const href = await row.getByRole("link", { name: `Data sheet of Merrowvale ${model}` }).getAttribute("href");
  const download = await coordinator.request.get(href!);
  expect(download.status()).toBe(200);
  expect((await download.body()).subarray(0, 5).toString()).toBe("%PDF-");

  // A coordinator reads the catalog but cannot change it.
  const itemId = href!.split("/")[4];
  expect((await coordinator.request.put(`/api/v1/equipment/${itemId}/archive`, { data: { isArchived: true } })).status()).toBe(403);
  expect((await coordinator.goto(`/settings/equipment/${itemId}`))?.status()).toBe(404);
});

test("installer cannot open the catalog", async ({ browser }) => {
  const installer = await pageFor(browser, DEMO.installer);
  const admin = await pageFor(browser, DEMO.admin);
  const items = (await (await admin.request.get("/api/v1/equipment?kind=module")).json()).items as { id: string }[];
  expect(items.length).toBeGreaterThan(0);

  for (const path of ["/settings/equipment", "/settings/equipment/new", `/settings/equipment/${items[0].id}`]) {
    const response = await installer.goto(path);
    expect(response?.status(), path).toBe(404);
    await expect(installer.getByRole("heading", { name: "Nothing here" })).toBeVisible();
  }
  expect((await installer.request.get("/api/v1/equipment")).status()).toBe(403);
  expect((await installer.request.get(`/api/v1/equipment/${items[0].id}/datasheet`, { maxRedirects: 0 })).status()).toBe(403);

  // Another company's admin does not see this catalog's items either.
  const rival = await pageFor(browser, DEMO.rivalAdmin);
  expect((await rival.request.get(`/api/v1/equipment/${items[0].id}`)).status()).toBe(404);
});
