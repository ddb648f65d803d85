import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startCluster } from "../../scripts/services/cluster.mjs";
import { query } from "../support/sql";
import { AppClient, eventually } from "./support/http-client";

// Two app servers and two workers against one database and one storage, as behind a load balancer:
// each packet is generated once, each message sent once, each webhook event applied once, and the
// sign-in throttle counts failures made on either server.

type Cluster = Awaited<ReturnType<typeof startCluster>>;
let cluster: Cluster;
let servers: AppClient[];
const report: string[] = [];

const sql = <T = Record<string, unknown>>(text: string, params: unknown[] = []) => query<T>(cluster.env.DATABASE_URL, text, params);

beforeAll(async () => {
  cluster = await startCluster({ apps: 2, workers: 2 });
  servers = cluster.urls.map((url) => new AppClient(url));
  for (const server of servers) expect(await server.signIn("dana@quillmoor.example")).toBeNull();
});

afterAll(async () => {
  await cluster?.stop();
  console.log(`two servers, two workers:\n${report.map((line) => `  - ${line}`).join("\n")}`);
});

describe("two app servers and two workers", () => {
  it("generates each packet once", async () => {
    const { body } = await servers[0]!.json("/api/v1/projects?pageSize=100&sort=number&direction=asc");
    // Demo projects past design whose designs pass the review.
    const projects: { id: string }[] = body.items
      .filter((p: { stage: string }) => ["permit_filed", "permit_issued", "installed"].includes(p.stage))
      .slice(0, 4);
    expect(projects.length).toBe(4);
    const queued = await Promise.all(
      projects.map((p, i) => servers[i % 2]!.json(`/api/v1/projects/${p.id}/packets`, { method: "POST", json: { kind: "permit" } })),
    );
    for (const q of queued) expect(q.status).toBe(202);
    const ids = queued.map((q) => q.body.id as string);
    await eventually(
      async () => {
        const rows = await sql<{ status: string }>("select status from packets where id = any($1)", [ids]);
        expect(rows.map((r) => r.status)).toEqual(ids.map(() => "ready"));
      },
      { timeoutMs: 240_000, intervalMs: 1_000 },
    );
    const attempts = await sql<{ attempts: number }>("select attempts from packets where id = any($1)", [ids]);
    expect(attempts.every((r) => r.attempts === 1)).toBe(true);
    const generated = await sql<{ entity_id: string; n: string }>(
      "select entity_id, count(*) as n from audit_events where action = 'packet.generated' and entity_id = any($1) group by entity_id",
      [projects.map((p) => p.id)],
    );
    expect(generated.map((g) => Number(g.n))).toEqual(projects.map(() => 1));
    report.push(`${ids.length} packets requested through both servers: each generated once (one attempt, one audit entry)`);
  });

  it("sends each message once", async () => {
    // Stage changes on projects with an installer e-mail that installer; made through both servers at once.
    const { body } = await servers[1]!.json("/api/v1/projects?stage=installed&pageSize=10");
    const projects: { id: string; installer: { id: string } | null }[] = body.items.filter((p: { installer: unknown }) => p.installer);
    expect(projects.length).toBeGreaterThanOrEqual(2);
    await Promise.all(
      projects.map((p, i) =>
        servers[i % 2]!.json(`/api/v1/projects/${p.id}/stage`, {
          method: "POST",
          json: { toStage: "inspection_passed", note: "two servers" },
        }),
      ),
    );
    const rows = await eventually(
      async () => {
        const all = await sql<{ id: string; status: string }>("select id, status from outbox_messages");
        expect(all.length).toBeGreaterThanOrEqual(projects.length);
        expect(all.filter((r) => r.status !== "sent")).toEqual([]);
        return all;
      },
      { timeoutMs: 120_000, intervalMs: 1_000 },
    );
    const caught: { messageId?: string }[] = await (await fetch(`${cluster.env.MAILBOX_URL}/messages`)).json();
    const perRow = new Map<string, number>();
    for (const m of caught) {
      const id = /^<(.+)@outbox\.ohmstead>$/.exec(m.messageId ?? "")?.[1];
      if (id) perRow.set(id, (perRow.get(id) ?? 0) + 1);
    }
    for (const row of rows) expect(perRow.get(row.id), `message of outbox row ${row.id}`).toBe(1);
    report.push(`${rows.length} outbox messages sent by two workers: each caught exactly once`);
  });

  it("applies each webhook event once, however often and wherever it arrives", async () => {
    // The session is started in-process with the app's own code (same database and processor).
    Object.assign(process.env, cluster.env);
    const { getProjectFees } = await import("@/lib/server/data/project-fees");
    const { startPayment } = await import("@/lib/server/use-cases/payments");
    const [admin] = await sql<{ id: string; organization_id: string; name: string; email: string }>(
      "select id, organization_id, name, email from users where email = 'dana@quillmoor.example'",
    );
    const viewer = {
      id: admin!.id,
      organizationId: admin!.organization_id,
      role: "coordinator" as const,
      name: admin!.name,
      email: admin!.email,
    };
    const { body } = await servers[0]!.json("/api/v1/projects?stage=permit_filed&pageSize=10");
    let started: { paymentId: string } | null = null;
    for (const project of body.items as { id: string }[]) {
      const fees = await getProjectFees({ viewer, projectId: project.id });
      const keys = fees.lines.filter((l) => l.state === "unpaid" && !l.problem && l.amountCents > 0).map((l) => l.feeKey);
      if (keys.length) {
        started = await startPayment({ viewer, projectId: project.id, feeKeys: keys });
        break;
      }
    }
    expect(started).not.toBeNull();
    const [payment] = await sql<{ checkout_session_id: string }>("select checkout_session_id from payments where id = $1", [
      started!.paymentId,
    ]);
    const fake = cluster.env.STRIPE_API_URL!;
    await fetch(`${fake}/_fake/checkout/sessions/${payment!.checkout_session_id}/pay`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ card: "4242424242424242" }),
    });
    const session = await fetch(`${fake}/v1/checkout/sessions/${payment!.checkout_session_id}`, {
      headers: { authorization: `Bearer ${cluster.env.STRIPE_SECRET_KEY}` },
    }).then((r) => r.json());
    const all: { event: Stripe.Event }[] = (await fetch(`${fake}/_fake/events`).then((r) => r.json())).data;
    const events = all
      .map((e) => e.event)
      .filter((e) => {
        const o = e.data.object as { id: string; payment_intent?: string | null };
        return o.id === session.id || o.id === session.payment_intent || o.payment_intent === session.payment_intent;
      });
    expect(events.length).toBeGreaterThanOrEqual(3);

    // Every event three times to each server, all at once (the fake also delivers each to the first).
    const signer = new Stripe("sk_test_unused", { telemetry: false });
    const deliveries = events.flatMap((event) =>
      cluster.urls.flatMap((url) =>
        [0, 1, 2].map(async () => {
          const payload = JSON.stringify(event);
          const res = await fetch(`${url}/api/webhooks/stripe`, {
            method: "POST",
            body: payload,
            headers: {
              "content-type": "application/json",
              "stripe-signature": signer.webhooks.generateTestHeaderString({ payload, secret: cluster.env.STRIPE_WEBHOOK_SECRET! }),
            },
          });
          return res.status;
        }),
      ),
    );
    const statuses = await Promise.all(deliveries);
    expect(statuses.every((s) => s === 200)).toBe(true);
    const recorded = await sql<{ n: string }>("select count(*) as n from processor_events where id = any($1)", [events.map((e) => e.id)]);
    expect(Number(recorded[0]!.n)).toBe(events.length);
    await eventually(
      async () => {
        const [row] = await sql<{ status: string; receipt_number: string | null }>(
          "select status, receipt_number from payments where id = $1",
          [started!.paymentId],
        );
        expect(row).toMatchObject({ status: "paid" });
        expect(row!.receipt_number).toBeTruthy();
      },
      { timeoutMs: 60_000 },
    );
    const [paid] = await sql<{ receipt_number: string }>("select receipt_number from payments where id = $1", [started!.paymentId]);
    await eventually(async () => {
      const mails = await sql<{ n: string }>("select count(*) as n from outbox_messages where subject like $1", [
        `Receipt ${paid!.receipt_number}%`,
      ]);
      expect(Number(mails[0]!.n)).toBe(1);
    });
    expect(await sql("select count(*)::int as n from payments where checkout_session_id = $1", [payment!.checkout_session_id])).toEqual([
      { n: 1 },
    ]);
    report.push(
      `${events.length} webhook events delivered ${statuses.length} times to both servers at once: each recorded once, one paid payment, one receipt, one receipt e-mail`,
    );
  });

  it("counts sign-in failures made on either server", async () => {
    const email = "priya@quillmoor.example";
    const clients = cluster.urls.map((url) => new AppClient(url));
    for (let i = 0; i < 5; i++) expect(await clients[i % 2]!.signIn(email, `wrong-${i}`)).toMatch(/do not match/);
    for (const client of clients) expect(await client.signIn(email)).toMatch(/each new try waits a little longer/);
    report.push("five wrong passwords alternating between the servers: the next try on either waits");
  });
});
