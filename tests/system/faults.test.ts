import { chromium } from "@playwright/test";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startCluster } from "../../scripts/services/cluster.mjs";
import { query } from "../support/sql";
import { AppClient, eventually } from "./support/http-client";

// Faults injected under a running app server and worker: the database stopped and started, the
// storage stopped during a packet generation. Requests meanwhile get clear answers, the app recovers
// by itself, and nothing is left half-written.

type Cluster = Awaited<ReturnType<typeof startCluster>>;
let cluster: Cluster;
let office: AppClient;
const report: string[] = [];

const sql = <T = Record<string, unknown>>(text: string, params: unknown[] = []) => query<T>(cluster.env.DATABASE_URL, text, params);

/** What a signed-in browser shows at a path: the page's visible text once it has settled. */
async function shownInBrowser(path: string): Promise<string> {
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking"],
  });
  try {
    const context = await browser.newContext({ baseURL: office.base });
    await context.addCookies(office.cookieList());
    const page = await context.newPage();
    await page.goto(path);
    await page.waitForLoadState("networkidle");
    return await page.locator("body").innerText();
  } finally {
    await browser.close();
  }
}

beforeAll(async () => {
  cluster = await startCluster({ apps: 1, workers: 1 });
  office = new AppClient(cluster.urls[0]!);
  expect(await office.signIn("dana@quillmoor.example")).toBeNull();
});

afterAll(async () => {
  await cluster?.stop();
  console.log(`faults injected: ${report.length}\n${report.map((line) => `  - ${line}`).join("\n")}`);
});

describe("PostgreSQL stopped and started during a run", () => {
  it("answers 503 and a clear page while it is down, recovers by itself, and leaves nothing half-written", async () => {
    const { body: list } = await office.json("/api/v1/projects?stage=design_checked&pageSize=1");
    const project = list.items[0];
    const changesBefore = await sql<{ n: string }>("select count(*) as n from stage_changes where project_id = $1", [project.id]);
    const auditsBefore = await sql<{ n: string }>("select count(*) as n from audit_events where entity_id = $1", [project.id]);

    await cluster.services.postgres.stop();
    try {
      const health = await office.json("/api/health");
      expect(health.status).toBe(503);
      expect(health.body.services.database.status).toBe("down");
      const read = await office.json("/api/v1/projects");
      expect(read.status).toBe(503);
      expect(read.body.error.message).toMatch(/database is not answering/);
      const write = await office.json(`/api/v1/projects/${project.id}/stage`, {
        method: "POST",
        json: { toStage: "permit_filed", note: "during the outage" },
      });
      expect(write.status).toBe(503);
      // A page: the framework answers 500 and the browser shows the app's apology with a reference.
      const page = await office.request(`/projects/${project.id}`);
      expect(page.status).toBe(500);
      expect(await shownInBrowser(`/projects/${project.id}`)).toMatch(/could not be shown[\s\S]*Reference/i);
      report.push("database stopped: health 503, reads and writes 503 with a message, pages the apology with a reference");
    } finally {
      await cluster.services.postgres.start();
    }

    await eventually(async () => expect((await office.json("/api/health")).status).toBe(200), { timeoutMs: 60_000 });
    expect((await office.json("/api/v1/projects")).status).toBe(200);
    // The refused write left no stage change and no audit entry behind.
    expect(await sql("select count(*) as n from stage_changes where project_id = $1", [project.id])).toEqual(changesBefore);
    expect(await sql("select count(*) as n from audit_events where entity_id = $1", [project.id])).toEqual(auditsBefore);
    expect((await office.json(`/api/v1/projects/${project.id}`)).body.stage).toBe("design_checked");
    // And the same write now goes through once.
    const again = await office.json(`/api/v1/projects/${project.id}/stage`, {
      method: "POST",
      json: { toStage: "permit_filed", note: "after the outage" },
    });
    expect(again.status).toBe(200);
    expect(Number((await sql<{ n: string }>("select count(*) as n from stage_changes where project_id = $1", [project.id]))[0]!.n)).toBe(
      Number(changesBefore[0]!.n) + 1,
    );
    // The worker came back too: the stage change's e-mail to the project's people is sent.
    await eventually(
      async () => {
        const pending = await sql<{ n: string }>("select count(*) as n from outbox_messages where status <> 'sent'");
        expect(Number(pending[0]!.n)).toBe(0);
      },
      { timeoutMs: 90_000 },
    );
    report.push("database started again: the app and the worker recovered without a restart; the refused write left nothing");
  });
});

describe("storage down during packet generation", () => {
  it("ends the packet failed and retryable, never ready without its object, and the retry succeeds", async () => {
    const { body: list } = await office.json("/api/v1/projects?stage=permit_filed&pageSize=1");
    const project = list.items[0];
    await cluster.services.storage.stop();
    const queued = await office.json(`/api/v1/projects/${project.id}/packets`, { method: "POST", json: { kind: "interconnection" } });
    expect(queued.status).toBe(202);
    const packetId = queued.body.id;
    const seen = new Set<string>();
    const failed = await eventually(
      async () => {
        const { body } = await office.json(`/api/v1/projects/${project.id}/packets`);
        const packet = body.items.find((p: { id: string }) => p.id === packetId);
        seen.add(packet.status);
        expect(packet.status).toBe("failed");
        return packet;
      },
      { timeoutMs: 120_000 },
    );
    expect(seen.has("ready")).toBe(false);
    expect(failed.error ?? failed.step).toBeTruthy();
    report.push(`storage stopped during a packet: it ended failed (${String(failed.error ?? failed.step).slice(0, 60)}), never ready`);

    await cluster.services.storage.start();
    expect((await office.json(`/api/v1/packets/${packetId}/retry`, { method: "POST" })).status).toBe(202);
    await eventually(
      async () => {
        const { body } = await office.json(`/api/v1/projects/${project.id}/packets`);
        expect(body.items.find((p: { id: string }) => p.id === packetId).status).toBe("ready");
      },
      { timeoutMs: 120_000 },
    );
    const file = await office.request(`/api/v1/packets/${packetId}/file`);
    expect(file.status).toBe(200);
    expect(
      Buffer.from(await file.arrayBuffer())
        .subarray(0, 5)
        .toString(),
    ).toBe("%PDF-");
    report.push("storage started again: the retried packet is ready and its PDF downloads");
  });
});
