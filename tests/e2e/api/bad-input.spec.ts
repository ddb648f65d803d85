import { expect, test } from "@playwright/test";
import { DEMO, listProjectsAs, signIn } from "../support/session";

test("API refuses bad input with a readable 4xx and changes nothing", async ({ page }) => {
  await signIn(page, DEMO.coordinator);
  const target = (await listProjectsAs(page, { sort: "number", direction: "asc" }))[0];
  const before = await (await page.request.get(`/api/v1/projects/${target.id}`)).json();

  const cases: { what: string; send: () => ReturnType<typeof page.request.post>; status: number; message: RegExp }[] = [
    {
      what: "malformed JSON",
      send: () =>
        page.request.post(`/api/v1/projects/${target.id}/stage`, {
          headers: { "content-type": "application/json" },
          data: Buffer.from("{not json"),
        }),
      status: 400,
      message: /not valid JSON/,
    },
    {
      what: "unknown stage",
      send: () => page.request.post(`/api/v1/projects/${target.id}/stage`, { data: { toStage: "approved" } }),
      status: 422,
      message: /invalid fields/,
    },
    {
      what: "wrong type",
      send: () => page.request.post(`/api/v1/projects/${target.id}/stage`, { data: { toStage: 7, note: ["x"] } }),
      status: 422,
      message: /invalid fields/,
    },
    {
      what: "oversize note",
      send: () => page.request.post(`/api/v1/projects/${target.id}/stage`, { data: { toStage: "closed", note: "n".repeat(2001) } }),
      status: 422,
      message: /invalid fields/,
    },
    {
      what: "oversize body",
      send: () => page.request.put(`/api/v1/projects/${target.id}`, { data: { customerName: "x".repeat(70_000) } }),
      status: 413,
      message: /larger than 64 KiB/,
    },
    {
      what: "wrong field types on update",
      send: () => page.request.put(`/api/v1/projects/${target.id}`, { data: { ...before, customerName: 42, mainBreakerA: "lots" } }),
      status: 422,
      message: /invalid fields/,
    },
    {
      what: "unknown stage filter",
      send: () => page.request.get(`/api/v1/projects?stage=approved`),
      status: 422,
      message: /invalid fields/,
    },
  ];
  for (const c of cases) {
    const res = await c.send();
    expect(res.status(), c.what).toBe(c.status);
    const body = (await res.json()) as { error: { message: string } };
    expect(body.error.message, c.what).toMatch(c.message);
  }

  const unknownStage = await (await page.request.post(`/api/v1/projects/${target.id}/stage`, { data: { toStage: "approved" } })).json();
  expect(unknownStage.error.fieldErrors.toStage[0]).toContain("permit_filed");

  const after = await (await page.request.get(`/api/v1/projects/${target.id}`)).json();
  expect(after).toEqual(before);
});

test("API without a session answers 401", async ({ request }) => {
  const res = await request.get("/api/v1/projects");
  expect(res.status()).toBe(401);
  expect((await res.json()).error.code).toBe("UNAUTHORIZED");
});

test("health reports every service up", async ({ request }) => {
  const res = await request.get("/api/health");
  const body = await res.json();
  expect(res.status(), JSON.stringify(body)).toBe(200);
  for (const name of ["database", "storage", "mail"]) {
    expect(body.services[name].status, name).toBe("up");
    expect(typeof body.services[name].latencyMs).toBe("number");
  }
});
