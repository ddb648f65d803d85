import { readFileSync } from "node:fs";
import path from "node:path";
import { expect, request as playwrightRequest, type APIRequestContext, type APIResponse, type Page } from "@playwright/test";
import { DEMO_SIGN_INS } from "../../../lib/seed/demo-sign-ins.mjs";

export const BASE_URL = process.env.BASE_URL ?? "http://127.0.0.1:3100";

/** A scripted client: its own cookies, and the Origin a page of the app would send. */
export async function clientFor(email: string | null, { origin = BASE_URL }: { origin?: string | null } = {}): Promise<APIRequestContext> {
  const context = await playwrightRequest.newContext({ baseURL: BASE_URL, extraHTTPHeaders: origin ? { origin } : {} });
  if (email) {
    const { csrfToken } = await (await context.get("/api/auth/csrf")).json();
    const res = await context.post("/api/auth/callback/credentials", {
      form: { csrfToken, email, password: DEMO_SIGN_INS.password, json: "true" },
    });
    expect(res.status(), `sign-in of ${email}`).toBeLessThan(400);
    const session = await (await context.get("/api/auth/session")).json();
    expect(session?.user?.email, `session of ${email}`).toBe(email);
  }
  return context;
}

/** A client with a session cookie the app did not sign: past the proxy's convenience redirect, so the app's own checks answer. */
export async function forgedSessionClient(): Promise<APIRequestContext> {
  const { hostname } = new URL(BASE_URL);
  const cookies = [
    {
      name: "next-auth.session-token",
      value: "forged.session.token",
      domain: hostname,
      path: "/",
      expires: -1,
      httpOnly: true,
      secure: false,
      sameSite: "Lax" as const,
    },
  ];
  return playwrightRequest.newContext({
    baseURL: BASE_URL,
    extraHTTPHeaders: { origin: BASE_URL },
    storageState: { cookies, origins: [] },
  });
}

/** A client that carries only an API token. */
export async function tokenClient(token: string): Promise<APIRequestContext> {
  return playwrightRequest.newContext({ baseURL: BASE_URL, extraHTTPHeaders: { authorization: `Bearer ${token}`, origin: BASE_URL } });
}

type ManifestEntry = { exportedName?: string; filename?: string };

/** Server action ids of the running build, by "file#exportName" (the framework's own manifest). */
export function actionIds(): Map<string, string> {
  const file = path.join(process.env.NEXT_DIST_DIR ?? ".next", "server", "server-reference-manifest.json");
  const manifest = JSON.parse(readFileSync(file, "utf8")) as { node: Record<string, ManifestEntry> };
  const ids = new Map<string, string>();
  for (const [id, entry] of Object.entries(manifest.node))
    if (entry.filename && entry.exportedName) ids.set(`${entry.filename}#${entry.exportedName}`, id);
  return ids;
}

export type ActionAnswer = {
  status: number;
  result: { ok: boolean; code?: string; message?: string; data?: unknown } | null;
  text: string;
};

/** Calls a server action the way the client library does: POST to a page with its id and the arguments as JSON. */
export async function callAction(
  client: APIRequestContext,
  { id, page, args, headers = {} }: { id: string; page: string; args: unknown[] | string | Buffer; headers?: Record<string, string> },
): Promise<ActionAnswer> {
  const res = await client.post(page, {
    headers: { "next-action": id, "content-type": "text/plain;charset=UTF-8", accept: "text/x-component", ...headers },
    // Strings beginning with "$" are escaped as "$$", as the client library's reply encoding does.
    data:
      typeof args === "string" || Buffer.isBuffer(args)
        ? args
        : JSON.stringify(args, (_key, value) => (typeof value === "string" && value.startsWith("$") ? `$${value}` : value)),
    maxRedirects: 0,
  });
  const text = await res.text();
  // The answer is a React flight stream; the action's return value is the row the first row points at.
  const row = text.split("\n").find((line) => line.startsWith("1:"));
  let result: ActionAnswer["result"] = null;
  try {
    result = row ? JSON.parse(row.slice(2)) : null;
  } catch {
    result = null;
  }
  return { status: res.status(), result, text };
}

export async function json(res: APIResponse): Promise<unknown> {
  try {
    return await res.json();
  } catch {
    return null;
  }
}

/** The local test-mode payments page: the SDK's hosted checkout, served by payments-fake/. */
export async function payByCard(page: Page, card: string) {
  await expect(page.getByRole("region", { name: "Test mode" })).toBeVisible();
  await page.getByLabel("Card number").fill(card);
  await page.getByLabel("Expiry date").fill("12 / 34");
  await page.getByLabel("CVC").fill("123");
  await page.getByRole("button", { name: /^Pay / }).click();
}
