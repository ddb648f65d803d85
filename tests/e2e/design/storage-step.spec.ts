import { expect, test, type Locator, type Page } from "@playwright/test";
import { byId, enter } from "../support/field-record";
import { generatePacket } from "../support/packets";
import { pdfText } from "../support/signing";
import { DEMO, listProjectsAs, signIn } from "../support/session";

/** The text of a packet revision's PDF, fetched through its download link as the browser would. */
async function packetText(page: Page, card: Locator, revision: number) {
  const href = await card
    .getByTestId("packet-revision")
    .filter({ hasText: `Rev ${revision}` })
    .getByRole("link", { name: "Download PDF" })
    .getAttribute("href");
  return pdfText(new Uint8Array(await (await page.request.get(href!)).body()));
}

test("coordinator adds DC-coupled batteries with a backup loads panel, sees the storage checks, draws both packets with the storage in them and records the storage part of the field record", async ({
  page,
}) => {
  test.setTimeout(300_000);
  await signIn(page, DEMO.coordinator);
  // A new project in Quillan Springs (NEC 2020) with a demo PV design on a multimode inverter and no battery yet.
  const [source] = await listProjectsAs(page, { q: "Desmond Achterberg" });
  const from = await (await page.request.get(`/api/v1/projects/${source.id}`)).json();
  const { draft } = await (await page.request.get(`/api/v1/projects/${source.id}/design`)).json();
  const stamp = Date.now().toString(36);
  const created = await page.request.post("/api/v1/projects", {
    data: {
      customerName: `Battery Walk ${stamp}`,
      customerEmail: "",
      customerPhone: "",
      street: `${stamp} Ridge Road`,
      city: from.city,
      state: from.state,
      postalCode: from.postalCode,
      jurisdictionId: from.jurisdiction.id,
      utilityId: from.utility.id,
      utilityAccountNumber: "",
      meterNumber: "",
      mainBreakerA: 200,
      busbarA: 200,
      serviceVoltageV: 240,
      servicePhases: 1,
    },
  });
  expect(created.status()).toBe(201);
  const { id: projectId } = await created.json();
  const put = await page.request.put(`/api/v1/projects/${projectId}/design`, { data: { ...draft, storage: { coupling: "none" } } });
  expect(put.status()).toBeLessThan(300);

  await page.goto(`/projects/${projectId}/design`);
  await page.getByRole("button", { name: /5\. Storage/ }).click();
  // A PV-only design opens on "No battery".
  await expect(page.getByLabel("Battery", { exact: true })).toHaveValue("none");
  await page.getByLabel("Battery", { exact: true }).selectOption("dc");
  await page.getByLabel("Multimode inverter").selectOption("inv-1");
  await page.getByRole("button", { name: "Add a battery line" }).click();
  await page.getByLabel("Battery line bat-1").selectOption({ label: "Tarnwick TW-135 Cell Stack" });
  await page.getByLabel("Units").fill("2");
  await page.getByLabel("Where they stand").selectOption("garage");
  await page.getByLabel("Operating mode").selectOption("self-consumption");

  await page.getByLabel("The inverter feeds a backup loads panel").check();
  await page.getByLabel("Busbar").fill("125");
  await page.getByLabel("Inverter breaker", { exact: true }).fill("40");
  await page.getByLabel("Other breakers").fill("20, 20, 15, 30");
  await page.getByRole("button", { name: "Add a load" }).click();
  await page.getByLabel("Load", { exact: true }).fill("Well pump");
  await page.getByLabel("Current", { exact: true }).fill("9.8");
  await page.getByLabel("Voltage", { exact: true }).selectOption("240");

  await page.getByLabel("Storage disconnect").selectOption("integral");
  await page.getByLabel("Disconnect location").fill("On the battery cabinet in the garage");
  await page.getByRole("button", { name: "Add a battery circuit" }).click();
  await page.getByLabel("Overcurrent device").last().fill("70");
  await expect(page.getByTestId("storage-caution")).toContainText("A battery stays energized when the array and the grid are off");

  await page.getByRole("button", { name: /6\. Review/ }).click();
  const review = page.getByTestId("review-panel");
  await expect(review).toHaveAttribute("data-review", "pass");
  // Two 13.5 kWh units in a garage: 27 kWh of the 80 kWh IRC 2021 R328.5 allows there (from memory).
  const summary = page.getByTestId("storage-summary");
  await expect(summary).toContainText("25.6 kWh");
  await expect(summary.getByTestId("storage-location")).toContainText("27 kWh of 80 kWh allowed");
  const check = (title: string) => review.getByTestId("check").filter({ hasText: title });
  await expect(check("Energy storage disconnect")).toHaveAttribute("data-status", "pass");
  await expect(check("Energy storage disconnect")).toContainText("NEC 2020 706.15");
  await expect(check("Backup loads panel busbar")).toHaveAttribute("data-status", "pass");
  await expect(check("Batteries in a garage or accessory structure")).toContainText("IRC 2021 R328.5");
  await expect(check("Backup supply against the largest load")).toContainText("NEC 2020 710.15");
  const essLabel = page.getByTestId("warning-label").filter({ hasText: "NEC 2020 706.15(C)" });
  await expect(essLabel.getByTestId("label-text")).toContainText("ENERGY STORAGE SYSTEM DISCONNECT");
  // The power sources placard (705.10) names the storage disconnect's place beside the others.
  await expect(page.getByTestId("warning-label").filter({ hasText: "NEC 2020 705.10" })).toContainText(
    "ON THE BATTERY CABINET IN THE GARAGE",
  );
  // Revision 1 was the PV-only design put through the API; the battery is a later revision.
  await expect(page.getByTestId("save-state")).toHaveText(/Saved, revision ([2-9]|\d{2,})$/, { timeout: 15_000 });

  // The saved design keeps the battery, and the server's review carries the storage summary.
  await page.reload();
  await page.getByRole("button", { name: /5\. Storage/ }).click();
  await expect(page.getByLabel("Battery", { exact: true })).toHaveValue("dc");
  await expect(page.getByLabel("Units")).toHaveValue("2");
  const saved = await (await page.request.get(`/api/v1/projects/${projectId}/review`)).json();
  expect(saved.storage).toMatchObject({ coupling: "dc", totalUsableKwh: 25.6, pointOfConnectionA: 32 });

  // Both packets carry the storage: the permit's summary and labels, the utility's storage fields.
  await page.goto(`/projects/${projectId}/documents`);
  for (const kind of ["permit", "interconnection"] as const) await generatePacket(page, kind, 1);
  const permit = await packetText(page, page.getByTestId("packet-permit"), 1);
  expect(permit).toContain("Tarnwick TW-135");
  expect(permit).toMatch(/25\.6 kWh/);
  expect(permit).toContain("ENERGY STORAGE SYSTEM DISCONNECT");
  expect(permit).toContain("Energy storage");
  expect(permit).not.toContain("No energy storage.");
  const interconnection = await packetText(page, page.getByTestId("packet-interconnection"), 1);
  expect(interconnection).toContain("Photovoltaic with energy storage, inverter-based");
  expect(interconnection).toMatch(/25\.6 kWh, [\d.]+ kW, DC-coupled/);

  // The field record on a phone: the stored-energy cautions above the storage readings, then the readings.
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(`/projects/${projectId}/field`);
  const step = page.getByTestId("step-storage");
  await expect(step.getByTestId("storage-cautions")).toContainText("A battery stays energized when the array and the grid are off");
  await enter(byId(page, "storage.stateOfChargePct"), "76");
  await expect(page.getByTestId("result-storage-charge")).toHaveAttribute("data-status", "pass");
  await step.getByRole("group", { name: "Grid supply opened" }).getByLabel("Yes").check();
  await step.getByRole("group", { name: "Backup loads panel stayed on" }).getByLabel("Yes").check();
  await expect(page.getByTestId("result-storage-backup")).toHaveAttribute("data-status", "pass");
  await enter(byId(page, "storage.transferSeconds"), "0");
  await expect(page.getByTestId("result-storage-transfer-time")).toHaveAttribute("data-status", "pass");
  await page.getByRole("button", { name: "Save readings" }).click();
  await expect(page.getByTestId("save-state")).toContainText("Saved");
  await page.reload();
  await expect(byId(page, "storage.stateOfChargePct")).toHaveValue("76");
  await expect(page.getByTestId("result-storage-backup")).toHaveAttribute("data-status", "pass");
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
