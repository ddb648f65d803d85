import { expect, test } from "@playwright/test";
import { DEMO, listProjectsAs, pageFor } from "../support/session";

test("a user of the second company gets 404 for the first company's project page and API", async ({ browser }) => {
  const coordinator = await pageFor(browser, DEMO.coordinator);
  const rival = await pageFor(browser, DEMO.rivalAdmin);
  const target = (await listProjectsAs(coordinator))[0];

  const rivalNames = (await listProjectsAs(rival)).map((p) => p.customerName);
  expect(rivalNames).not.toContain(target.customerName);

  const page = await rival.goto(`/projects/${target.id}`);
  expect(page?.status()).toBe(404);
  await expect(rival.getByText(target.customerName)).toHaveCount(0);

  expect((await rival.request.get(`/api/v1/projects/${target.id}`)).status()).toBe(404);
  const write = await rival.request.post(`/api/v1/projects/${target.id}/stage`, { data: { toStage: "closed", note: "not mine" } });
  expect(write.status()).toBe(404);

  const after = await coordinator.request.get(`/api/v1/projects/${target.id}`);
  expect((await after.json()).stage).toBe(target.stage);
});
