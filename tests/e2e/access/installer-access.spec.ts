import { expect, test } from "@playwright/test";
import { DEMO, listProjectsAs, pageFor } from "../support/session";

test("installer sees only assigned projects and cannot open settings or unassigned projects", async ({ browser }) => {
  const installer = await pageFor(browser, DEMO.installer);
  const coordinator = await pageFor(browser, DEMO.coordinator);

  const mine = await listProjectsAs(installer);
  expect(mine.length).toBeGreaterThan(0);
  const installerId = mine[0].installer?.id;
  expect(mine.every((p) => p.installer?.id === installerId)).toBe(true);

  const notMine = (await listProjectsAs(coordinator)).find((p) => p.installer?.id !== installerId);
  expect(notMine).toBeDefined();

  await expect(installer.getByRole("link", { name: "Settings" })).toHaveCount(0);
  for (const path of ["/settings", "/settings/users", "/projects/new", `/projects/${notMine!.id}`, `/projects/${mine[0].id}/edit`]) {
    const response = await installer.goto(path);
    expect(response?.status(), path).toBe(404);
    await expect(installer.getByRole("heading", { name: "Nothing here" })).toBeVisible();
  }
  expect((await installer.request.get(`/api/v1/projects/${notMine!.id}`)).status()).toBe(404);

  // The assigned project opens, read-only.
  await installer.goto(`/projects/${mine[0].id}`);
  await expect(installer.getByRole("heading", { name: mine[0].customerName })).toBeVisible();
  await expect(installer.getByRole("button", { name: "Change stage" })).toHaveCount(0);
  await expect(installer.getByRole("link", { name: "Edit project" })).toHaveCount(0);
  const stageChange = await installer.request.post(`/api/v1/projects/${mine[0].id}/stage`, { data: { toStage: "closed" } });
  expect(stageChange.status()).toBe(403);
});
