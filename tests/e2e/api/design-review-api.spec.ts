import { expect, test, type APIRequestContext } from "@playwright/test";
import { DEMO, signIn } from "../support/session";

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

async function json(request: APIRequestContext, method: "get" | "post" | "put", url: string, token: string | null, data?: unknown) {
  const res = await request[method](url, { headers: token ? bearer(token) : {}, data });
  return { status: res.status(), body: await res.json() };
}

test("admin's API token reviews an exported design exactly as the project's review, until it is revoked", async ({ page, request }) => {
  // An admin makes a token in settings; it is shown once.
  await signIn(page, DEMO.admin);
  await page.goto("/settings/api-tokens");
  const name = `Quote tool ${Date.now()}`;
  await page.getByLabel("Token name").fill(name);
  await page.getByRole("button", { name: "Create token" }).click();
  await expect(page.getByTestId("new-token")).toContainText("shown only this once");
  const token = await page.getByLabel("New API token").inputValue();
  expect(token).toMatch(/^ohm_[\w-]{40,}$/);
  const row = page.getByTestId("api-token-row").filter({ hasText: name });
  await expect(row).toContainText("Active");

  // With the token alone (no session cookie): a demo project past Draft, exported and posted back.
  const projects = await json(request, "get", "/api/v1/projects?pageSize=100", token);
  expect(projects.status).toBe(200);
  const project = (projects.body.items as { id: string; stage: string }[]).find((p) => p.stage !== "draft")!;
  const exported = await json(request, "get", `/api/v1/projects/${project.id}/design-document`, token);
  expect(exported.status).toBe(200);
  const posted = await json(request, "post", "/api/v1/design-review", token, exported.body);
  expect(posted.status).toBe(200);
  const saved = await json(request, "get", `/api/v1/projects/${project.id}/review`, token);
  expect(saved.status).toBe(200);
  expect(posted.body).toEqual(saved.body);
  expect(posted.body.status).toBe("pass");
  expect(posted.body.checks.length).toBeGreaterThan(5);
  await page.reload();
  await expect(row).not.toContainText("Never");

  // An invalid document: 422 with every problem's JSON path (the format first, then references between ids).
  const broken = structuredClone(exported.body);
  broken.runs[0].size = "9 AWG";
  delete broken.modules[0].vocV;
  const invalid = await json(request, "post", "/api/v1/design-review", token, broken);
  expect(invalid.status).toBe(422);
  expect(Object.keys(invalid.body.error.fieldErrors).sort()).toEqual(["modules[0].vocV", "runs[0].size"]);
  const unknownRef = await json(request, "post", "/api/v1/design-review", token, {
    ...exported.body,
    strings: [{ ...exported.body.strings[0], inverterId: "no-such-inverter" }],
  });
  expect(unknownRef.status).toBe(422);
  expect(unknownRef.body.error.fieldErrors["strings[0].inverterId"][0]).toContain("no-such-inverter");

  // Odd bodies are refused, never a server error: JSON that is not a design is 422, text that is not JSON 400.
  for (const body of [null, [], "design", 42, {}, { codeEdition: "2020", modules: "x" }]) {
    const res = await request.post("/api/v1/design-review", {
      headers: { ...bearer(token), "content-type": "application/json" },
      data: Buffer.from(JSON.stringify(body)),
    });
    expect(res.status(), JSON.stringify(body)).toBe(422);
  }
  const notJson = await request.post("/api/v1/design-review", {
    headers: { ...bearer(token), "content-type": "application/json" },
    data: Buffer.from("design"),
  });
  expect(notJson.status()).toBe(400);

  // The token only reads.
  expect((await json(request, "put", `/api/v1/projects/${project.id}/design`, token, {})).status).toBe(403);

  // No token, or a made-up one: 401.
  expect((await json(request, "post", "/api/v1/design-review", null, exported.body)).status).toBe(401);
  expect((await json(request, "post", "/api/v1/design-review", `${token}x`, exported.body)).status).toBe(401);

  // Revoked in settings: refused at once.
  page.once("dialog", (dialog) => dialog.accept());
  await row.getByRole("button", { name: "Revoke" }).click();
  await expect(row).toContainText("Revoked");
  const afterRevoke = await json(request, "post", "/api/v1/design-review", token, exported.body);
  expect(afterRevoke.status).toBe(401);
  expect(afterRevoke.body.error.message).toMatch(/revoked/);
});

test("installer's session may review a design document but not manage tokens", async ({ page }) => {
  await signIn(page, DEMO.installer);
  const mine = (await (await page.request.get("/api/v1/projects?pageSize=100")).json()).items.find(
    (p: { stage: string }) => p.stage !== "draft",
  );
  const exported = await page.request.get(`/api/v1/projects/${mine.id}/design-document`);
  expect(exported.status()).toBe(200);
  const posted = await page.request.post("/api/v1/design-review", { data: await exported.json() });
  expect(posted.status()).toBe(200);
  const response = await page.goto("/settings/api-tokens");
  expect(response?.status()).toBe(404);
});
