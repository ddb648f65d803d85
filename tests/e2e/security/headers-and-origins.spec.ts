import { DEMO, listProjectsAs, pageFor, signIn } from "../support/session";
import { query } from "../../support/sql";
import { actionIds, callAction, clientFor, tokenClient } from "../support/api";
import { expect, test } from "./fixtures";

// What the browser is told about each answer, and who may write with a session cookie.

test("pages carry a nonce-based Content-Security-Policy that the app runs under without a violation", async ({ page, targets }) => {
  const violations: string[] = [];
  page.on("console", (message) => {
    if (/Content Security Policy|Refused to (load|execute|apply)/i.test(message.text())) violations.push(message.text());
  });
  const signInPage = await page.goto("/sign-in");
  const policy = signInPage!.headers()["content-security-policy"]!;
  expect(policy).toMatch(/script-src 'self' 'nonce-[\w+/=]+' 'strict-dynamic'/);
  expect(policy).toContain("frame-ancestors 'none'");
  expect(policy).toContain("object-src 'none'");
  expect(policy).not.toContain("unsafe-eval");
  const nonce = /'nonce-([\w+/=]+)'/.exec(policy)![1];
  // Every script the page was sent carries this request's nonce.
  const scripts = await page.locator("script").evaluateAll((nodes) => nodes.map((n) => (n as HTMLScriptElement).nonce));
  expect(scripts.length).toBeGreaterThan(0);
  for (const n of scripts) expect(n).toBe(nonce);
  // A second request gets a different nonce.
  const again = await page.request.get("/sign-in");
  expect(again.headers()["content-security-policy"]).not.toContain(nonce);

  // The app works under it: sign in, open a project, its design and documents.
  await signIn(page, DEMO.coordinator);
  for (const path of [
    `/projects/${targets.projectId}`,
    `/projects/${targets.projectId}/design`,
    `/projects/${targets.projectId}/documents`,
    `/projects/${targets.projectId}/fees`,
  ]) {
    await page.goto(path);
    await expect(page.getByRole("main")).toBeVisible();
  }
  await page.goto(`/projects/${targets.projectId}/design`);
  await page.getByRole("button", { name: /2\. / }).click();
  expect(violations).toEqual([]);
});

test("every answer says nosniff, a referrer policy, no framing, and the camera only on the field page", async ({ targets }) => {
  const coordinator = await clientFor(DEMO.coordinator);
  const answers = {
    page: await coordinator.get("/dashboard"),
    field: await coordinator.get(`/projects/${targets.projectId}/field`),
    json: await coordinator.get("/api/v1/projects"),
    packet: await coordinator.get(`/api/v1/packets/${targets.packetId}/file`),
    receipt: await coordinator.get(`/api/v1/payments/${targets.paymentId}/receipt`),
    notFound: await coordinator.get("/no-such-page"),
  };
  for (const [what, res] of Object.entries(answers)) {
    const headers = res.headers();
    expect(headers["x-content-type-options"], what).toBe("nosniff");
    expect(headers["referrer-policy"], what).toBe("same-origin");
    expect(headers["x-frame-options"], what).toBe("DENY");
    expect(headers["permissions-policy"], what).toMatch(what === "field" ? /camera=\(self\)/ : /camera=\(\)/);
  }
  expect(answers.packet.status()).toBe(200);
  expect(answers.json.headers()["content-security-policy"]).toBe("default-src 'none'; frame-ancestors 'none'");
  await coordinator.dispose();
});

test("a session write needs this app's origin and the route's content type; an API token does not", async ({ targets }) => {
  // Defect: a same-site page moved a project's stage with a plain HTML form (text/plain, no check of Origin).
  const url = `/api/v1/projects/${targets.projectId}/stage`;
  const body = JSON.stringify({ toStage: "closed", note: "from elsewhere" });
  const coordinator = await clientFor(DEMO.coordinator);
  const textPlain = await coordinator.post(url, { headers: { "content-type": "text/plain" }, data: body });
  expect(textPlain.status()).toBe(415);
  const foreign = await clientFor(DEMO.coordinator, { origin: "http://127.0.0.1:1" });
  expect((await foreign.post(url, { headers: { "content-type": "application/json" }, data: body })).status()).toBe(403);
  const none = await clientFor(DEMO.coordinator, { origin: null });
  expect((await none.put(`/api/v1/projects/${targets.projectId}`, { data: targets.bodies.project })).status()).toBe(403);
  // Reads are not writes, and the same write from the app's own origin goes through the usual checks.
  expect((await none.get(`/api/v1/projects/${targets.projectId}`)).status()).toBe(200);
  // An API token carries no cookie to ride on: its review call needs neither header.
  const token = await tokenClient(targets.apiToken);
  const review = await token.post("/api/v1/design-review", {
    headers: { origin: "http://elsewhere.example", "content-type": "text/plain" },
    data: "{}",
  });
  expect(review.status()).toBe(422);
  expect((await (await coordinator.get(`/api/v1/projects/${targets.projectId}`)).json()).stage).toBe("draft");
  for (const c of [coordinator, foreign, none, token]) await c.dispose();
});

test("a plain HTML form on another site of the same host cannot move a project's stage", async ({ browser, targets }) => {
  const page = await pageFor(browser, DEMO.coordinator);
  const before = (await listProjectsAs(page, { q: targets.bodies.project.customerName as string }))[0]!;
  // The payments fake listens on the same host, another port: same-site, so the browser sends the session cookie.
  await page.goto(`${process.env.STRIPE_API_URL}/_fake/events`);
  const answered = page.waitForResponse((r) => r.url().includes("/stage"));
  await page.evaluate(
    ({ action, payload }) => {
      const form = document.createElement("form");
      form.method = "POST";
      form.action = action;
      form.enctype = "text/plain";
      const input = document.createElement("input");
      input.name = payload.slice(0, -2);
      input.value = '"}';
      form.append(input);
      document.body.append(form);
      form.submit();
    },
    {
      action: `${new URL(page.url()).protocol}//${new URL(process.env.BASE_URL ?? "http://127.0.0.1:3100").host}/api/v1/projects/${targets.projectId}/stage`,
      payload: JSON.stringify({ toStage: "closed", note: "x" }),
    },
  );
  expect([403, 415]).toContain((await answered).status());
  const after = await page.request.get(
    `/api/v1/projects/${targets.projectId}`.replace(/^/, process.env.BASE_URL ?? "http://127.0.0.1:3100"),
  );
  expect((await after.json()).stage).toBe(before.stage);
});

test("an X-Forwarded-For written by the client changes neither the sign-in throttle nor the inspector access log", async ({ targets }) => {
  // Defect: the client's own X-Forwarded-For was believed (no trusted proxy is configured here).
  const email = "priya@quillmoor.example";
  for (let i = 0; i < 5; i++) {
    const client = await clientFor(null);
    const { csrfToken } = await (await client.get("/api/auth/csrf")).json();
    await client.post("/api/auth/callback/credentials", {
      headers: { "x-forwarded-for": `203.0.113.${i}` },
      form: { csrfToken, email, password: `wrong-${i}`, json: "true" },
    });
    await client.dispose();
  }
  const last = await clientFor(null);
  const { csrfToken } = await (await last.get("/api/auth/csrf")).json();
  const answer = await last.post("/api/auth/callback/credentials", {
    headers: { "x-forwarded-for": "198.51.100.250" },
    form: { csrfToken, email, password: "ohmstead-demo", json: "true" },
  });
  expect(decodeURIComponent(new URL((await answer.json()).url).searchParams.get("error") ?? "")).toMatch(
    /each new try waits a little longer/,
  );
  await last.dispose();

  // The inspector's visit is logged with the connection's address, not the one the client wrote.
  const coordinator = await clientFor(DEMO.coordinator);
  const created = await callAction(coordinator, {
    id: actionIds().get("app/(app)/projects/[projectId]/documents/share-actions.ts#createShareLinkAction")!,
    page: `/projects/${targets.projectId}/documents`,
    args: [{ projectId: targets.projectId, packetIds: [targets.packetId] }],
  });
  const { url, link } = (created.result as { data: { url: string; link: { id: string } } }).data;
  const inspector = await clientFor(null);
  expect((await inspector.get(new URL(url).pathname, { headers: { "x-forwarded-for": "6.6.6.6" } })).status()).toBe(200);
  const logged = await query<{ address: string }>(
    process.env.DATABASE_URL!,
    "select address from share_link_accesses where share_link_id = $1",
    [link.id],
  );
  expect(logged.map((row) => row.address)).toEqual(["127.0.0.1"]);
  for (const c of [coordinator, inspector]) await c.dispose();
});
