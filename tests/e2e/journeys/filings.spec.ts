import { expect, test, type Locator, type Page } from "@playwright/test";
import { clientFor } from "../support/api";
import { completeFieldRecord } from "../support/field-record";
import { DEMO, listProjectsAs, signIn } from "../support/session";

// A coordinator files the permit and the interconnection application the same day, answers a round of
// corrections with a design change and a new revision, and the stage follows the facts: issued with its number,
// a failed final inspection re-inspected, the utility's approval, the field record completed, PTO.

/** A PV-only demo project whose field record has string tests and no module-level devices to find: its design is copied. */
async function sourceProject(page: Page) {
  for (const project of (await listProjectsAs(page)).filter((p) => p.stage === "permit_filed" || p.stage === "permit_issued")) {
    await page.goto(`/projects/${project.id}/field`);
    await expect(page.getByTestId("commissioning-status")).toBeVisible();
    // PV only: batteries add a storage step the walk does not fill.
    const pvOnly = (await page.getByTestId("step-storage").count()) === 0;
    if (pvOnly && (await page.getByTestId("step-pairing").count()) === 0 && (await page.getByTestId("step-before-energizing").count()) > 0)
      return project.id;
  }
  throw new Error("No demo project with string tests and no module-level devices that report");
}

async function newProjectWithDesign(sourceId: string, stamp: string) {
  const api = await clientFor(DEMO.coordinator);
  const source = await (await api.get(`/api/v1/projects/${sourceId}`)).json();
  const { draft } = await (await api.get(`/api/v1/projects/${source.id}/design`)).json();
  const created = await api.post("/api/v1/projects", {
    data: {
      customerName: `Filing Walk ${stamp}`,
      customerEmail: "",
      customerPhone: "",
      street: `${stamp} Ledger Row`,
      city: source.city,
      state: source.state,
      postalCode: source.postalCode,
      jurisdictionId: source.jurisdiction.id,
      utilityId: source.utility.id,
      utilityAccountNumber: source.utilityAccountNumber,
      meterNumber: source.meterNumber,
      mainBreakerA: source.mainBreakerA,
      busbarA: source.busbarA,
      serviceVoltageV: source.serviceVoltageV,
      servicePhases: source.servicePhases,
      coordinatorId: source.coordinator.id,
      installerId: "",
    },
  });
  expect(created.status()).toBe(201);
  const { id } = await created.json();
  expect((await api.put(`/api/v1/projects/${id}/design`, { data: draft })).status()).toBe(200);
  await api.dispose();
  return { id: id as string, draft };
}

/** Generates a packet revision on the Documents page and waits for it (its progress is another test's concern). */
async function generatePacket(page: Page, kind: "permit" | "interconnection", revision: number) {
  const card = page.getByTestId(`packet-${kind}`);
  await card.getByRole("button", { name: `Generate Rev ${revision}` }).click();
  await expect(card.getByTestId("packet-revision").filter({ hasText: `Rev ${revision}` })).toBeVisible({ timeout: 90_000 });
}

const task = (card: Locator, title: string | RegExp) =>
  card.locator("details").filter({ has: card.page().locator("summary", { hasText: title }) });

async function open(card: Locator, title: string | RegExp) {
  const details = task(card, title);
  // A part opened earlier stays open across the page's refresh.
  if (!(await details.evaluate((el) => (el as HTMLDetailsElement).open))) await details.locator("summary").click();
  return details;
}

async function changeStatus(card: Locator, status: string, fill: (form: Locator) => Promise<unknown> = async () => {}) {
  const form = await open(card, "Change the status");
  await form.getByLabel("New status").selectOption({ label: status });
  await fill(form);
  await form.getByRole("button", { name: "Save the status" }).click();
  await expect(card.getByTestId("filing-status")).toHaveText(status);
}

async function stageShown(page: Page, projectId: string) {
  await page.goto(`/projects/${projectId}`);
  return page.getByRole("region", { name: "Current stage" }).innerText();
}

test("a permit and an interconnection application run side by side, and the stage follows the facts", async ({ page }) => {
  test.setTimeout(480_000);
  await signIn(page, DEMO.coordinator);
  const { id: projectId, draft } = await newProjectWithDesign(await sourceProject(page), Date.now().toString(36));

  await page.goto(`/projects/${projectId}/documents`);
  await generatePacket(page, "permit", 1);
  await generatePacket(page, "interconnection", 1);

  await page.goto(`/projects/${projectId}/filings`);
  const permit = page.getByTestId("filing-permit");
  const interconnection = page.getByTestId("filing-interconnection");
  await expect(page.getByTestId("waiting-on")).toContainText("Waiting on Office");

  // Both go in the same day.
  await changeStatus(permit, "Submitted", async (form) => {
    await form.getByLabel("Packet revision sent").selectOption({ label: "Rev 1" });
    await form.getByLabel("Sent to").fill("Plan review counter");
  });
  await changeStatus(interconnection, "Submitted", async (form) => {
    await form.getByLabel("Packet revision sent").selectOption({ label: "Rev 1" });
    // Nobody signed Rev 1's application by link here: the coordinator says why it goes anyway.
    await form.getByLabel("If the customer has not signed it here: why it goes anyway").fill("Signed on the utility's paper form");
  });
  await expect(page.getByTestId("waiting-on")).toContainText("Waiting on AHJ");

  // Approving without the number is refused, and nothing moves.
  const approve = await open(interconnection, "Change the status");
  await approve.getByLabel("New status").selectOption({ label: "Approved" });
  await approve.getByRole("button", { name: "Save the status" }).click();
  await expect(approve.getByRole("alert").first()).toContainText("reference number");
  await expect(interconnection.getByTestId("filing-status")).toHaveText("Submitted");
  await page.reload();

  // A round of two corrections from the AHJ.
  const round = await open(permit, "Record corrections (round 1)");
  await round.getByLabel("Comment letter (optional: PDF, JPEG or PNG)").setInputFiles({
    name: "plan-review-comments.pdf",
    mimeType: "application/pdf",
    buffer: Buffer.from("%PDF-1.4\n1 0 obj<<>>endobj\n%%EOF\n"),
  });
  await round.getByLabel("Comment 1", { exact: true }).fill("Show the rapid shutdown initiator on the site plan.");
  await round.getByLabel("Sheet or clause").first().fill("PV-1");
  await round.getByRole("button", { name: "Add a comment" }).click();
  await round.getByLabel("Comment 2", { exact: true }).fill("Label the AC disconnect with its ratings.");
  await round.getByRole("button", { name: "Record round 1" }).click();
  await expect(permit.getByTestId("filing-status")).toHaveText("Corrections requested");
  await expect(permit.getByTestId("round-letter")).toHaveText("plan-review-comments.pdf");
  await expect(page.getByTestId("waiting-on")).toContainText("Waiting on Office");

  // The design page says who holds a packet of this design; a change answers the first comment.
  await page.goto(`/projects/${projectId}/design`);
  await expect(page.getByTestId("submitted-banner")).toContainText("Rev 1 of the permit packet is with");
  const api = await clientFor(DEMO.coordinator);
  const changed = structuredClone(draft);
  changed.array.roofPlanes[0].label = "South roof, initiator shown at the service";
  const saved = await (await api.put(`/api/v1/projects/${projectId}/design`, { data: changed })).json();
  await page.reload();
  await expect(page.getByTestId("submitted-banner")).toContainText("a new revision is due");
  await page.goto(`/projects/${projectId}/documents`);
  const permitRev1 = page.getByTestId("packet-permit").getByTestId("packet-revision").filter({ hasText: "Rev 1" });
  await expect(permitRev1.getByTestId("revision-sent")).toContainText("Submitted to");
  await expect(permitRev1.getByTestId("revision-stale")).toContainText("No longer matches the design");

  await page.goto(`/projects/${projectId}/filings`);
  const items = permit.getByTestId("filing-item");
  await items.nth(0).getByLabel("Response").fill("Initiator shown beside the service on PV-1.");
  await items.nth(0).getByLabel("Design revision").fill(String(saved.revision));
  await items.nth(0).getByRole("button", { name: "Save the answer" }).click();
  await expect(items.nth(0)).toContainText("Answered: Initiator shown");
  await items.nth(1).getByLabel("Response").fill("Label sheet lists the inverter output ratings.");
  await items.nth(1).getByRole("button", { name: "Save the answer" }).click();
  await expect(items.nth(1)).toContainText("Answered: Label sheet");

  // Rev 2 names the comments it answers, and matches the design again; the utility gets the new revision unasked.
  await page.goto(`/projects/${projectId}/documents`);
  await generatePacket(page, "permit", 2);
  await generatePacket(page, "interconnection", 2);
  const permitRev2 = page.getByTestId("packet-permit").getByTestId("packet-revision").filter({ hasText: "Rev 2" });
  await expect(permitRev2.getByTestId("packet-changes")).toContainText(
    "Answers round 1, comment 1 (PV-1): Show the rapid shutdown initiator",
  );
  await expect(permitRev2.getByTestId("revision-stale")).toHaveCount(0);
  await page.goto(`/projects/${projectId}/filings`);
  await changeStatus(permit, "Resubmitted", async (form) => form.getByLabel("Packet revision sent").selectOption({ label: "Rev 2" }));
  await expect(permit.getByTestId("correction-round")).toContainText("resubmitted as Rev 2");
  await expect(interconnection).toContainText("The design changed after Rev 1 went in");
  await changeStatus(interconnection, "Resubmitted", async (form) =>
    form.getByLabel("Packet revision sent").selectOption({ label: "Rev 2" }),
  );
  await expect(interconnection).not.toContainText("The design changed after");

  // Issued with its number: the stage moves by itself.
  await changeStatus(permit, "Approved", async (form) => form.getByLabel("Reference number").fill("BP-26-77120"));
  await expect(permit).toContainText("BP-26-77120");
  await expect(page.getByTestId("waiting-on")).toContainText("Waiting on Crew");
  expect(await stageShown(page, projectId)).toContain("Permit issued");

  // A failed final inspection, then a passed re-inspection.
  await page.goto(`/projects/${projectId}/filings`);
  let book = await open(permit, "Book an inspection");
  await book.getByLabel("Kind").selectOption("final");
  await book.getByRole("button", { name: "Book it" }).click();
  const firstVisit = permit.getByTestId("inspection").first();
  await expect(firstVisit).toContainText("Booked, no result yet");
  const result = await open(firstVisit, "Record the result");
  await result.getByLabel("Result", { exact: true }).selectOption({ label: "Failed" });
  await result.getByRole("button", { name: "Add a correction" }).click();
  await result.getByLabel("Correction 1", { exact: true }).fill("Conduit strap missing at the roof edge.");
  await result.getByRole("button", { name: "Save the result" }).click();
  await expect(firstVisit.getByTestId("inspection-result")).toHaveText("Failed");
  book = await open(permit, "Book an inspection");
  await book.getByLabel("Kind").selectOption("final");
  await expect(book.getByLabel("Re-inspects")).toBeVisible();
  await book.getByRole("button", { name: "Book it" }).click();
  const second = permit.getByTestId("inspection").nth(1);
  await expect(second).toContainText("re-inspects the final inspection");
  const passed = await open(second, "Record the result");
  await passed.getByRole("button", { name: "Save the result" }).click();
  await expect(second.getByTestId("inspection-result")).toHaveText("Passed");
  expect(await stageShown(page, projectId)).toContain("Utility filed");
  // The crew sees the inspections and what was corrected on the field page.
  await page.goto(`/projects/${projectId}/field`);
  await expect(page.getByTestId("field-inspections")).toContainText("Failed");
  await expect(page.getByTestId("field-inspections")).toContainText("Conduit strap missing");
  await expect(page.getByTestId("field-inspections")).toContainText("Passed");

  // The utility approves with its number, then grants PTO.
  await page.goto(`/projects/${projectId}/filings`);
  await changeStatus(interconnection, "Approved", async (form) => form.getByLabel("Reference number").fill("IA-88120"));
  expect(await stageShown(page, projectId)).toContain("Utility approved");

  // The field record is completed on site: commissioned by itself.
  await page.goto(`/projects/${projectId}/field`);
  await completeFieldRecord(page);
  expect(await stageShown(page, projectId)).toContain("Commissioned");
  await page.goto(`/projects/${projectId}/filings`);
  const pto = await open(interconnection, "Record permission to operate");
  await pto.getByRole("button", { name: "Record PTO" }).click();
  await expect(page.getByTestId("waiting-on")).toContainText("Nobody is holding this project");
  expect(await stageShown(page, projectId)).toContain("PTO received");

  // The API tells the same story.
  const filings = await (await api.get(`/api/v1/projects/${projectId}/filings`)).json();
  expect(filings.waitingOn).toBeNull();
  expect(
    filings.filings.map((f: { kind: string; status: string; referenceNumber: string }) => [f.kind, f.status, f.referenceNumber]),
  ).toEqual([
    ["permit", "approved", "BP-26-77120"],
    ["interconnection", "approved", "IA-88120"],
  ]);
  expect(filings.filings.map((f: { packetRevision: number }) => f.packetRevision)).toEqual([2, 2]);
  expect(filings.filings[0].rounds[0].items.map((i: { resolved: boolean }) => i.resolved)).toEqual([true, true]);
  expect(filings.filings[0].inspections.map((i: { result: string }) => i.result)).toEqual(["failed", "passed"]);
  await api.dispose();
});
