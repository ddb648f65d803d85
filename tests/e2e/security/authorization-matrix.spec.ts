import type { APIRequestContext } from "@playwright/test";
import { DEMO } from "../support/session";
import { actionIds, callAction, clientFor, forgedSessionClient, tokenClient } from "../support/api";
import { actionKeys, pageKeys, routeKeys } from "./inventory";
import { expect, test } from "./fixtures";
import { ACTIONS, PAGES, PDF, PNG, ROUTES, type Entry, type Persona } from "./route-matrix";
import type { Targets } from "./targets";

// Every route handler, server action and page, tried by everyone who must not get through: no session
// (and a forged session cookie, which gets past the proxy's convenience redirect to the app's own checks);
// an installer on a project not assigned to them; a coordinator and an admin of the other company
// against this company's ids; a coordinator on admin-only things; an API token on writes. Each answer
// must refuse (401/403/404, a redirect to sign-in, or an action's UNAUTHORIZED/FORBIDDEN/NOT_FOUND)
// and must not contain any of the target's marker texts. Reads are also tried by someone who may,
// so a refusal cannot come from a broken fixture.

const WRITE = /^(POST|PUT|PATCH|DELETE) /;
const REFUSED_CODES = ["UNAUTHORIZED", "FORBIDDEN", "NOT_FOUND"];

/** Who must be refused for an entry, by its scope and the roles that may use it. */
function attackersOf(entry: Entry, { write, isAction }: { write: boolean; isAction: boolean }): Persona[] {
  const out: Persona[] = ["anonymous", "forgedCookie"];
  // Installers reach projects only when assigned (the target is not theirs) and other things only by role.
  if (entry.scope === "project" || !entry.roles.includes("installer")) out.push("installer");
  if (!entry.roles.includes("coordinator")) out.push("coordinator");
  if (entry.scope !== "org") out.push("rivalCoordinator", "rivalAdmin");
  else if (!entry.roles.includes("coordinator")) out.push("rivalCoordinator");
  // API tokens only read; actions do not accept them at all.
  if ((write && !entry.readsOnly) || isAction) out.push("token");
  return out;
}

/** Someone who may: the check that the fixture works and a refusal means what it says. */
function allowedPersona(entry: Entry): Persona {
  return entry.roles.includes("coordinator") ? "coordinator" : "admin";
}

// Words that must never reach a reader: a value interpolated as an object, and source marks that
// belong in tests and code comments.
const NEVER_SHOWN = ["[object Object]", "(from memory)", "(common practice)", "undefined", "NaN"];

test.describe.configure({ mode: "serial" });

let targets: Targets;
const clients = new Map<Persona, APIRequestContext>();
const tally = { tried: 0, leaks: [] as string[], refusedWrongly: [] as string[] };

test.beforeAll(async ({ targets: made }) => {
  targets = made;
  clients.set("anonymous", await clientFor(null));
  clients.set("forgedCookie", await forgedSessionClient());
  clients.set("installer", await clientFor(DEMO.installer));
  clients.set("coordinator", await clientFor(DEMO.coordinator));
  clients.set("admin", await clientFor(DEMO.admin));
  clients.set("rivalCoordinator", await clientFor("owen@harrowgate.example"));
  clients.set("rivalAdmin", await clientFor(DEMO.rivalAdmin));
  clients.set("token", await tokenClient(targets.apiToken));
});

test.afterAll(async () => {
  for (const client of clients.values()) await client.dispose();
  console.log(`authorization matrix: ${tally.tried} attempts by people who must be refused, ${tally.leaks.length} leaks`);
});

/** The text of a server-rendered page as a reader sees it: no tags, scripts or styles. */
function visibleText(html: string): string {
  return html
    .replace(/<script[\s\S]*?<\/script>/g, " ")
    .replace(/<style[\s\S]*?<\/style>/g, " ")
    .replace(/<[^>]+>/g, " ")
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ");
}

function expectNoMarkers(text: string, what: string) {
  for (const marker of targets.markers) {
    if (text.includes(marker)) tally.leaks.push(`${what} showed "${marker}"`);
    expect(text, `${what} must not show "${marker}"`).not.toContain(marker);
  }
}

test("every route handler, server action and page has an entry in the matrix", () => {
  // A route added without an entry here fails this test until someone decides who may use it.
  expect(routeKeys()).toEqual(Object.keys(ROUTES).sort());
  expect(actionKeys()).toEqual(Object.keys(ACTIONS).sort());
  expect(pageKeys()).toEqual(Object.keys(PAGES).sort());
});

test("route handlers refuse everyone who may not use them and show nothing of the target", async () => {
  test.setTimeout(180_000);
  for (const [key, entry] of Object.entries(ROUTES)) {
    if (entry.exempt) continue;
    const method = key.split(" ")[0]!.toLowerCase() as "get" | "post" | "put";
    const write = WRITE.test(key);
    const url = entry.url!(targets);
    const upload = entry.upload;
    const payload = upload
      ? {
          multipart: {
            ...(upload.kind ? { kind: upload.kind } : {}),
            file: { name: upload.name, mimeType: upload.mimeType, buffer: upload.mimeType === "image/png" ? PNG : PDF },
          },
        }
      : entry.body
        ? { data: entry.body(targets) }
        : {};
    const send = (client: APIRequestContext) => client[method](url, { ...payload, maxRedirects: 0 });
    if (!write) {
      const res = await send(clients.get(allowedPersona(entry))!);
      expect([200, 302], `${key} as ${allowedPersona(entry)} (control)`).toContain(res.status());
    }
    for (const persona of attackersOf(entry, { write, isAction: false })) {
      const res = await send(clients.get(persona)!);
      const body = await res.text();
      tally.tried++;
      if (entry.scope === "org" && (persona === "rivalCoordinator" || persona === "rivalAdmin") && res.status() < 300) {
        expectNoMarkers(body, `${key} as ${persona}`);
        continue;
      }
      expect([401, 403, 404], `${key} as ${persona}: ${res.status()} ${body.slice(0, 200)}`).toContain(res.status());
      if (persona === "token" && write) expect(res.status(), `${key} with an API token`).toBe(403);
      expectNoMarkers(body, `${key} as ${persona}`);
    }
  }
});

test("server actions refuse everyone who may not use them and change nothing", async () => {
  test.setTimeout(180_000);
  const ids = actionIds();
  for (const [key, entry] of Object.entries(ACTIONS)) {
    if (entry.exempt) continue;
    const id = ids.get(key);
    expect(id, `${key} is in the build`).toBeTruthy();
    for (const persona of attackersOf(entry, { write: true, isAction: true })) {
      const answer = await callAction(clients.get(persona)!, { id: id!, page: entry.page!(targets), args: entry.args!(targets) });
      tally.tried++;
      if ((persona === "anonymous" || persona === "token") && answer.status === 307) {
        // Without a session cookie the proxy sends the caller to sign-in before the action runs
        // (the forged cookie gets past it, to the action's own check).
        expectNoMarkers(answer.text, `${key} as ${persona}`);
        continue;
      }
      expect(answer.status, `${key} as ${persona}`).toBeLessThan(500);
      expect(answer.result?.ok, `${key} as ${persona}: ${answer.text.slice(0, 300)}`).toBe(false);
      expect(REFUSED_CODES, `${key} as ${persona}: ${answer.result?.code} ${answer.result?.message}`).toContain(answer.result?.code);
      expectNoMarkers(answer.text, `${key} as ${persona}`);
    }
  }
  // Nothing the attempts named changed.
  const coordinator = clients.get("coordinator")!;
  const after = await (await coordinator.get(`/api/v1/projects/${targets.projectId}`)).json();
  expect(after).toMatchObject({ customerName: targets.bodies.project.customerName, stage: "draft" });
});

test("pages refuse everyone who may not see them and show nothing of the target", async () => {
  test.setTimeout(180_000);
  for (const [key, entry] of Object.entries(PAGES)) {
    if (entry.exempt) continue;
    const url = entry.url!(targets);
    const control = await clients.get(allowedPersona(entry))!.get(url, { maxRedirects: 0 });
    expect(control.status(), `${key} as ${allowedPersona(entry)} (control)`).toBe(200);
    const shown = visibleText(await control.text());
    for (const word of NEVER_SHOWN) expect(shown, `${key} as ${allowedPersona(entry)} shows "${word}"`).not.toContain(word);
    for (const persona of attackersOf(entry, { write: false, isAction: false })) {
      if (persona === "token") continue;
      const res = await clients.get(persona)!.get(url, { maxRedirects: 0 });
      const body = await res.text();
      tally.tried++;
      if (entry.scope === "org" && persona === "rivalCoordinator" && res.status() === 200) {
        expectNoMarkers(body, `${key} as ${persona}`);
        continue;
      }
      if (persona === "anonymous" || persona === "forgedCookie") {
        expect(res.status(), `${key} as ${persona}`).toBe(307);
        expect(res.headers()["location"], `${key} as ${persona}`).toMatch(/\/sign-in/);
      } else {
        expect(res.status(), `${key} as ${persona}`).toBe(404);
      }
      expectNoMarkers(body, `${key} as ${persona}`);
    }
  }
});
